import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { computeMeter } from '../../shared/utils/meter'
import { rateChart, SOLVER_MAX_WORK, solveDrive, solverWork, type SolverInput, type SolverStage } from '../../shared/utils/solver'

// Every combination, tried one by one: the reference the solver must match.
function bruteForceBestError(input: SolverInput): number {
  let best = Infinity
  const options = input.stages.map((s) => {
    const d = [...new Set([s.driverTeeth, ...s.driverOptions])]
    const n = [...new Set([s.drivenTeeth, ...s.drivenOptions])]
    return d.flatMap((x) => n.map((y) => ({ driverTeeth: x, drivenTeeth: y })))
  })
  const walk = (i: number, picked: { driverTeeth: number, drivenTeeth: number }[]) => {
    if (i === options.length) {
      for (const p of input.plates) {
        const m = computeMeter({ wheelCircumferenceIn: input.wheelCircumferenceIn, slipPercent: input.slipPercent, stages: picked, meterRatio: input.meterRatio, cellsPerPlate: p.cellsPerPlate, rowSpacingIn: input.rowSpacingIn })
        best = Math.min(best, Math.abs(m.seedsPerAcre / input.targetSeedsPerAcre! - 1) * 100)
      }
      return
    }
    for (const o of options[i]!) walk(i + 1, [...picked, o])
  }
  walk(0, [])
  return best
}

const base: Omit<SolverInput, 'targetSeedsPerAcre'> = {
  rowSpacingIn: 30,
  wheelCircumferenceIn: 86.4,
  slipPercent: 3,
  meterRatio: 1,
  installedPlateId: 1,
  stages: [
    { position: 1, driverTeeth: 21, drivenTeeth: 19, driverOptions: [15, 17, 19, 21, 23, 25], drivenOptions: [15, 17, 19, 21, 23] },
    { position: 2, driverTeeth: 17, drivenTeeth: 26, driverOptions: [17, 19], drivenOptions: [20, 24, 26] },
  ],
  plates: [{ id: 1, code: 'CF-30', cellsPerPlate: 30 }, { id: 2, code: 'CF-24', cellsPerPlate: 24 }, { id: 3, code: 'CF-16', cellsPerPlate: 16 }],
}

describe('sprocket and plate solver', () => {
  it('finds the installed setup with no parts to change when it already hits the target', () => {
    const installed = computeMeter({ wheelCircumferenceIn: 86.4, slipPercent: 3, stages: [{ driverTeeth: 21, drivenTeeth: 19 }, { driverTeeth: 17, drivenTeeth: 26 }], meterRatio: 1, cellsPerPlate: 30, rowSpacingIn: 30 })
    const [best] = solveDrive({ ...base, targetSeedsPerAcre: installed.seedsPerAcre })
    expect(best!.errorPercent).toBeCloseTo(0, 9)
    expect(best!.partsToChange).toBe(0)
    expect(best!.swaps).toEqual([])
  })

  it('ranks by the size of the error, then by the fewest parts to change', () => {
    const out = solveDrive({ ...base, targetSeedsPerAcre: 31_000, limit: 10 })
    expect(out).toHaveLength(10)
    for (let i = 1; i < out.length; i++) {
      const a = Math.abs(out[i - 1]!.errorPercent)
      const b = Math.abs(out[i]!.errorPercent)
      expect(a <= b + 1e-9).toBe(true)
      if (Math.abs(a - b) < 1e-9) expect(out[i - 1]!.partsToChange <= out[i]!.partsToChange).toBe(true)
    }
    expect(out[0]!.swaps.length).toBe(out[0]!.partsToChange)
  })

  it('accepts a spacing target', () => {
    const [best] = solveDrive({ ...base, targetSeedsPerAcre: undefined, targetSpacingIn: 6.5 })
    expect(Math.abs(best!.seedSpacingIn - 6.5) / 6.5).toBeLessThan(0.02)
  })

  it('the best answer is never worse than any combination it was given (property)', () => {
    const teeth = fc.integer({ min: 10, max: 40 })
    const stage = (position: number) => fc.record({
      position: fc.constant(position), driverTeeth: teeth, drivenTeeth: teeth,
      driverOptions: fc.array(teeth, { maxLength: 4 }), drivenOptions: fc.array(teeth, { maxLength: 4 }),
    }) as fc.Arbitrary<SolverStage>
    fc.assert(fc.property(
      fc.array(fc.integer({ min: 8, max: 60 }), { minLength: 1, maxLength: 3 }),
      fc.integer({ min: 1, max: 3 }).chain((n) => fc.tuple(...Array.from({ length: n }, (_, i) => stage(i + 1)))),
      fc.integer({ min: 15_000, max: 200_000 }),
      (cells, stages, target) => {
        const input: SolverInput = { ...base, stages, plates: cells.map((c, i) => ({ id: i + 1, code: `P${i}`, cellsPerPlate: c })), targetSeedsPerAcre: target }
        const [best] = solveDrive(input)
        expect(Math.abs(best!.errorPercent)).toBeLessThanOrEqual(bruteForceBestError(input) + 1e-9)
      },
    ), { numRuns: 60 })
  })
})

describe('solver inventory and limits', () => {
  it('leaves out plates with none on hand, except the installed one', () => {
    const plates = [{ id: 1, code: 'CF-30', cellsPerPlate: 30, quantityOnHand: 0 }, { id: 2, code: 'CF-24', cellsPerPlate: 24, quantityOnHand: 0 }]
    const out = solveDrive({ ...base, plates, targetSeedsPerAcre: 20_000, limit: 50 })
    expect(out.length).toBeGreaterThan(0)
    expect(out.every((c) => c.plateId === 1)).toBe(true)
  })

  it('names every swap from the installed part to the new one', () => {
    const [best] = solveDrive({ ...base, targetSeedsPerAcre: 20_000 })
    for (const s of best!.swaps) expect(s.from).not.toBe(s.to)
    expect(best!.swaps.length).toBe(best!.partsToChange)
  })

  it('refuses a drive too large to search, with the size in the message', () => {
    const teeth = Array.from({ length: 15 }, (_, i) => 11 + i * 3)
    const stages = Array.from({ length: 6 }, (_, i) => ({ position: i + 1, driverTeeth: 20, drivenTeeth: 20, driverOptions: teeth, drivenOptions: teeth }))
    expect(solverWork({ stages, plates: base.plates }).work).toBeGreaterThan(SOLVER_MAX_WORK)
    expect(() => solveDrive({ ...base, stages, targetSeedsPerAcre: 34_000 })).toThrow(/too many sprocket combinations/)
  })

  it('splits three full stages after the first, the cheapest place', () => {
    const teeth = Array.from({ length: 15 }, (_, i) => 12 + i * 2)
    const stages = [1, 2, 3].map((position) => ({ position, driverTeeth: 20, drivenTeeth: 20, driverOptions: teeth, drivenOptions: teeth }))
    // 225 pairs a stage: 225 × 30 plates + 225² = 57,375 steps (computed).
    expect(solverWork({ stages, plates: Array.from({ length: 30 }, (_, i) => ({ id: i, code: `P${i}`, cellsPerPlate: 20 })) })).toEqual({ work: 57_375, split: 1 })
  })
})

describe('rate chart', () => {
  it('lists every distinct on-hand combination, lowest population first, at each row spacing', () => {
    const chart = rateChart({ wheelCircumferenceIn: 86.4, slipPercent: 3, meterRatio: 1, stages: base.stages, cellsPerPlate: 30, rowSpacingsIn: [30, 20] })
    expect(chart.total).toBe(chart.rows.length)
    expect(chart.rows.filter((r) => r.installed)).toHaveLength(1)
    for (let i = 1; i < chart.rows.length; i++) expect(chart.rows[i]!.plateRevsPerWheelRev).toBeGreaterThan(chart.rows[i - 1]!.plateRevsPerWheelRev)
    const row = chart.rows[0]!
    // 20 in rows carry 30/20 of the 30 in population at the same spacing (computed).
    expect(row.byRowSpacing[1]!.seedsPerAcre / row.byRowSpacing[0]!.seedsPerAcre).toBeCloseTo(1.5, 9)
  })
})
