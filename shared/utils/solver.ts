import { computeMeter, SQ_IN_PER_ACRE } from './meter'

export interface SolverStage {
  position: number
  driverTeeth: number
  drivenTeeth: number
  driverOptions: number[]
  drivenOptions: number[]
}

// quantityOnHand 0 leaves a plate out unless it is the one installed.
export interface SolverPlate { id: number, code: string, label?: string, cellsPerPlate: number, quantityOnHand?: number }

export interface SolverInput {
  targetSeedsPerAcre?: number
  targetSpacingIn?: number
  rowSpacingIn: number
  wheelCircumferenceIn: number
  slipPercent: number
  meterRatio: number
  stages: SolverStage[]
  plates: SolverPlate[]
  installedPlateId: number | null
  limit?: number
}

export interface SolverSwap { part: 'plate' | 'driver' | 'driven', stage?: number, from: string, to: string }

export interface SolverChoice {
  plateId: number
  plateCode: string
  cellsPerPlate: number
  stages: { position: number, driverTeeth: number, drivenTeeth: number }[]
  seedsPerAcre: number
  seedSpacingIn: number
  errorPercent: number
  partsToChange: number
  swaps: SolverSwap[]
}

interface Combo { ratio: number, changes: number, picks: [number, number][] }

const key = (ratio: number) => Math.round(ratio * 1e9)

// Every driver × driven pair a stage can take, with the parts changed from what is installed.
function stagePairs(s: SolverStage): Combo[] {
  const drivers = [...new Set([s.driverTeeth, ...s.driverOptions])]
  const drivens = [...new Set([s.drivenTeeth, ...s.drivenOptions])]
  const out: Combo[] = []
  for (const d of drivers) for (const n of drivens) out.push({ ratio: d / n, changes: (d !== s.driverTeeth ? 1 : 0) + (n !== s.drivenTeeth ? 1 : 0), picks: [[d, n]] })
  return out
}

// Products over several stages, one entry per distinct ratio, keeping the fewest changes.
function combine(stages: SolverStage[]): Combo[] {
  let acc: Combo[] = [{ ratio: 1, changes: 0, picks: [] }]
  for (const s of stages) {
    const pairs = stagePairs(s)
    const next = new Map<number, Combo>()
    for (const a of acc) {
      for (const p of pairs) {
        const ratio = a.ratio * p.ratio
        const k = key(ratio)
        const changes = a.changes + p.changes
        const have = next.get(k)
        if (!have || changes < have.changes) next.set(k, { ratio, changes, picks: [...a.picks, p.picks[0]!] })
      }
    }
    acc = [...next.values()]
  }
  return acc
}

interface Candidate { err: number, changes: number, plate: SolverPlate, ratio: number, picks: [number, number][] }

// Keeps the best N by |error| then fewest parts changed; one entry per plate and overall ratio.
class TopN {
  items: Candidate[] = []
  constructor(private n: number) {}
  worst() {
    return this.items.length < this.n ? Infinity : this.items[this.items.length - 1]!.err
  }
  offer(c: Candidate) {
    const same = this.items.findIndex((i) => i.plate.id === c.plate.id && key(i.ratio) === key(c.ratio))
    if (same >= 0) {
      if (this.items[same]!.changes <= c.changes) return
      this.items.splice(same, 1)
    }
    const better = (a: Candidate, b: Candidate) => a.err < b.err - 1e-12 || (Math.abs(a.err - b.err) <= 1e-12 && a.changes < b.changes)
    let i = this.items.length
    while (i > 0 && better(c, this.items[i - 1]!)) i--
    if (i >= this.n) return
    this.items.splice(i, 0, c)
    if (this.items.length > this.n) this.items.pop()
  }
}

function lowerBound(sorted: Float64Array, value: number) {
  let lo = 0
  let hi = sorted.length
  while (lo < hi) {
    const mid = (lo + hi) >> 1
    if (sorted[mid]! < value) lo = mid + 1
    else hi = mid
  }
  return lo
}

const pairCount = (s: SolverStage) => new Set([s.driverTeeth, ...s.driverOptions]).size * new Set([s.drivenTeeth, ...s.drivenOptions]).size

// Work of the search split after stage k: first-half products are walked once per plate, the
// second half is built and sorted once. Counts before de-duplication, so an upper bound.
function splitCost(counts: number[], k: number, plates: number) {
  const product = (xs: number[]) => xs.reduce((a, b) => a * b, 1)
  return product(counts.slice(0, k)) * plates + product(counts.slice(k))
}

// Above this the search would take seconds (about 0.3 s at 1.6 M on a laptop core); real drives
// with one to three quick-change stages stay far below it.
export const SOLVER_MAX_WORK = 4_000_000

// The search's size for an input, to compare with SOLVER_MAX_WORK before calling solveDrive.
export function solverWork(input: Pick<SolverInput, 'stages' | 'plates'>): { work: number, split: number } {
  const counts = input.stages.map(pairCount)
  let best = { work: Infinity, split: 0 }
  for (let k = 0; k <= counts.length; k++) {
    const work = splitCost(counts, k, Math.max(1, input.plates.length))
    if (work < best.work) best = { work, split: k }
  }
  return best
}

// Tries every plate with every on-hand sprocket of every stage and returns the best N choices.
// Meet in the middle: the stages are split where the work is least; for each plate and first-half
// product the sorted second-half products are searched outward from the ratio that would hit the
// target exactly, and the walk stops once the error can only grow past the current N-th best.
// Floating point in the search; the returned choices are recomputed with the decimal meter formula.
export function solveDrive(input: SolverInput): SolverChoice[] {
  const limit = input.limit ?? 10
  if (!(input.slipPercent < 100)) throw new RangeError('Slip must be below 100 %: at 100 % the drive wheel does not turn the meter')
  const plates = input.plates.filter((p) => p.quantityOnHand === undefined || p.quantityOnHand > 0 || p.id === input.installedPlateId)
  const { work, split } = solverWork({ stages: input.stages, plates })
  if (work > SOLVER_MAX_WORK) throw new RangeError(`The drive has too many sprocket combinations to search (${Math.round(work).toLocaleString('en-US')} steps, limit ${SOLVER_MAX_WORK.toLocaleString('en-US')}): leave out some on-hand options or stages`)
  const rolling = 1 - input.slipPercent / 100
  // seeds/acre = perRatio × cells × R
  const perRatio = (SQ_IN_PER_ACRE * rolling * input.meterRatio) / (input.rowSpacingIn * input.wheelCircumferenceIn)
  const target = input.targetSeedsPerAcre ?? SQ_IN_PER_ACRE / (input.rowSpacingIn * input.targetSpacingIn!)
  if (!(target > 0 && Number.isFinite(target))) throw new RangeError('Give a target population or spacing above 0')
  if (!(limit >= 1)) return []
  const first = combine(input.stages.slice(0, split))
  const second = combine(input.stages.slice(split)).sort((a, b) => a.ratio - b.ratio)
  const ratios = Float64Array.from(second, (b) => b.ratio)
  const top = new TopN(limit)

  for (const plate of plates) {
    const plateChange = plate.id !== input.installedPlateId ? 1 : 0
    for (const a of first) {
      const factor = perRatio * plate.cellsPerPlate * a.ratio
      const start = lowerBound(ratios, target / factor)
      // Outward from the exact ratio the error only grows, so each direction stops at the first miss.
      for (let step = 1; step >= -1; step -= 2) {
        for (let i = step > 0 ? start : start - 1; i >= 0 && i < ratios.length; i += step) {
          const err = Math.abs((factor * ratios[i]!) / target - 1)
          if (err > top.worst() + 1e-12) break
          const b = second[i]!
          top.offer({ err, changes: plateChange + a.changes + b.changes, plate, ratio: a.ratio * b.ratio, picks: [...a.picks, ...b.picks] })
        }
      }
    }
  }
  return top.items.map((c) => describe(input, c, target))
}

function describe(input: SolverInput, c: Candidate, target: number): SolverChoice {
  const stages = input.stages.map((s, i) => ({ position: s.position, driverTeeth: c.picks[i]![0], drivenTeeth: c.picks[i]![1] }))
  const m = computeMeter({ wheelCircumferenceIn: input.wheelCircumferenceIn, slipPercent: input.slipPercent, stages, meterRatio: input.meterRatio, cellsPerPlate: c.plate.cellsPerPlate, rowSpacingIn: input.rowSpacingIn })
  const swaps: SolverSwap[] = []
  if (c.plate.id !== input.installedPlateId) {
    const installed = input.plates.find((p) => p.id === input.installedPlateId)
    swaps.push({ part: 'plate', from: installed?.code ?? 'none', to: c.plate.code })
  }
  input.stages.forEach((s, i) => {
    if (stages[i]!.driverTeeth !== s.driverTeeth) swaps.push({ part: 'driver', stage: s.position, from: `${s.driverTeeth}T`, to: `${stages[i]!.driverTeeth}T` })
    if (stages[i]!.drivenTeeth !== s.drivenTeeth) swaps.push({ part: 'driven', stage: s.position, from: `${s.drivenTeeth}T`, to: `${stages[i]!.drivenTeeth}T` })
  })
  return {
    plateId: c.plate.id,
    plateCode: c.plate.code,
    cellsPerPlate: c.plate.cellsPerPlate,
    stages,
    seedsPerAcre: m.seedsPerAcre,
    seedSpacingIn: m.seedSpacingIn,
    errorPercent: (m.seedsPerAcre / target - 1) * 100,
    partsToChange: c.changes,
    swaps,
  }
}

export interface RateChartRow {
  stages: { position: number, driverTeeth: number, drivenTeeth: number }[]
  plateRevsPerWheelRev: number
  seedSpacingIn: number
  byRowSpacing: { rowSpacingIn: number, seedsPerAcre: number }[]
  installed: boolean
}

export const RATE_CHART_MAX_ROWS = 2000

// Every distinct on-hand sprocket combination for one plate, lowest population first.
export function rateChart(input: {
  wheelCircumferenceIn: number
  slipPercent: number
  meterRatio: number
  stages: SolverStage[]
  cellsPerPlate: number
  rowSpacingsIn: number[]
}): { rows: RateChartRow[], total: number } {
  const combos = combine(input.stages).sort((a, b) => a.ratio - b.ratio)
  const rows = combos.slice(0, RATE_CHART_MAX_ROWS).map((c) => {
    const stages = input.stages.map((s, i) => ({ position: s.position, driverTeeth: c.picks[i]![0], drivenTeeth: c.picks[i]![1] }))
    const byRowSpacing = input.rowSpacingsIn.map((rowSpacingIn) => ({
      rowSpacingIn,
      seedsPerAcre: computeMeter({ wheelCircumferenceIn: input.wheelCircumferenceIn, slipPercent: input.slipPercent, stages, meterRatio: input.meterRatio, cellsPerPlate: input.cellsPerPlate, rowSpacingIn }).seedsPerAcre,
    }))
    const m = computeMeter({ wheelCircumferenceIn: input.wheelCircumferenceIn, slipPercent: input.slipPercent, stages, meterRatio: input.meterRatio, cellsPerPlate: input.cellsPerPlate, rowSpacingIn: input.rowSpacingsIn[0] ?? 30 })
    return { stages, plateRevsPerWheelRev: m.plateRevsPerWheelRev, seedSpacingIn: m.seedSpacingIn, byRowSpacing, installed: c.changes === 0 }
  })
  return { rows, total: combos.length }
}
