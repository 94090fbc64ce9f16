// The solver on a large inventory: 30 plates and 3 stages with 15 on-hand teeth counts on every
// driver and driven position. Prints figures only.
import { solveDrive, type SolverInput } from '../../shared/utils/solver'

const teeth = Array.from({ length: 15 }, (_, i) => 12 + i * 2)
const input: SolverInput = {
  targetSeedsPerAcre: 34_500,
  rowSpacingIn: 30,
  wheelCircumferenceIn: 86.4,
  slipPercent: 3,
  meterRatio: 1,
  installedPlateId: 1,
  stages: [1, 2, 3].map((position) => ({ position, driverTeeth: 20, drivenTeeth: 20, driverOptions: teeth, drivenOptions: teeth })),
  plates: Array.from({ length: 30 }, (_, i) => ({ id: i + 1, code: `BP-${i + 1}`, cellsPerPlate: 12 + i * 2 })),
  limit: 10,
}

const runs: number[] = []
let best = solveDrive(input)
for (let i = 0; i < 7; i++) {
  const t = performance.now()
  best = solveDrive(input)
  runs.push(performance.now() - t)
}
runs.sort((a, b) => a - b)
const combos = 30 * (15 * 15) ** 3
console.log('\nSolver, 30 plates × 3 stages × 15 driver × 15 driven options')
console.log(`combinations covered  ${combos.toLocaleString('en-US')}`)
console.log(`median of 7 runs      ${runs[3]!.toFixed(1)} ms (fastest ${runs[0]!.toFixed(1)} ms, slowest ${runs[6]!.toFixed(1)} ms)`)
console.log(`best choice           ${best[0]!.plateCode}, error ${best[0]!.errorPercent.toFixed(4)} %, ${best[0]!.partsToChange} parts to change`)
