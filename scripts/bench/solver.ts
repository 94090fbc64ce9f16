// The sprocket and plate solver on growing inventories, up to 30 plates and 3 stages with 15
// on-hand teeth counts on every driver and driven position. Run with `npx jiti scripts/bench/solver.ts`
// (Node 20 cannot strip types itself). Prints figures only.
import { solveDrive, solverWork, type SolverInput } from '../../shared/utils/solver'

function inventory(plates: number, stages: number, options: number): SolverInput {
  const teeth = Array.from({ length: options }, (_, i) => 12 + i * 2)
  return {
    targetSeedsPerAcre: 34_500,
    rowSpacingIn: 30,
    wheelCircumferenceIn: 86.4,
    slipPercent: 3,
    meterRatio: 1,
    installedPlateId: 1,
    stages: Array.from({ length: stages }, (_, i) => ({ position: i + 1, driverTeeth: 20, drivenTeeth: 20, driverOptions: teeth, drivenOptions: teeth })),
    plates: Array.from({ length: plates }, (_, i) => ({ id: i + 1, code: `BP-${i + 1}`, cellsPerPlate: 12 + i * 2 })),
    limit: 10,
  }
}

const RUNS = 9
const sizes: [number, number, number][] = [[5, 1, 8], [10, 2, 10], [30, 2, 15], [30, 3, 10], [30, 3, 15], [30, 4, 8]]
console.log('\nSolver: best 10 choices; time is the median of 9 runs after one warm-up')
console.log('plates stages options  combinations        search steps  median ms  fastest ms  best error %')
for (const [plates, stages, options] of sizes) {
  const input = inventory(plates, stages, options)
  let best = solveDrive(input)
  const runs: number[] = []
  for (let i = 0; i < RUNS; i++) {
    const t = performance.now()
    best = solveDrive(input)
    runs.push(performance.now() - t)
  }
  runs.sort((a, b) => a - b)
  const combos = plates * (options * options) ** stages
  console.log([
    String(plates).padStart(6), String(stages).padStart(6), `${options}×${options}`.padStart(7),
    combos.toLocaleString('en-US').padStart(20), solverWork(input).work.toLocaleString('en-US').padStart(11),
    runs[RUNS >> 1]!.toFixed(1).padStart(10), runs[0]!.toFixed(1).padStart(11), best[0]!.errorPercent.toExponential(2).padStart(13),
  ].join(' '))
}
