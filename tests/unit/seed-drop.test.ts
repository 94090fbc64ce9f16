import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { seedDropSummary, seedsOnGroundPerAcre } from '../../shared/utils/seed-drop'

const base = { rowSpacingIn: 30, wheelCircumferenceIn: 86.4, setupSeedsPerAcre: 34_000, setupSlipPercent: 0, targetSeedsPerAcre: 34_000, planterSlipPercent: 0 }

describe('seed-drop check', () => {
  it('rates each row over 1/1000 acre and the planter as their mean (University of Tennessee Extension 2011: 17 ft 5 in at 30 in)', () => {
    const s = seedDropSummary({ ...base, rows: [{ row: 1, seedsCounted: 32 }, { row: 2, seedsCounted: 33 }], lengthFt: 17.424 })
    expect(s.rows.map((r) => Math.round(r.seedsPerAcre))).toEqual([32_000, 33_000])
    expect(s.seedsPerAcre).toBeCloseTo(32_500, 8)
    expect(s.errorVsSetupPercent).toBeCloseTo((32_500 / 34_000 - 1) * 100, 10)
  })

  it('reads the slip from a dig behind the planter with the meter formula (computed by hand)', () => {
    // Setup 34,033 at 3 % slip → 35,085.6 at 0 %; 33,000 found → (1 − 33,000 ÷ 35,085.6) × 100 = 5.944 %.
    const s = seedDropSummary({ ...base, setupSeedsPerAcre: 34_033, setupSlipPercent: 3, planterSlipPercent: 3, rows: [{ row: 1, seedsCounted: 33 }], lengthFt: 17.424 })
    expect(s.impliedSlipPercent).toBeCloseTo((1 - 33_000 / (34_033 / 0.97)) * 100, 8)
    expect(s.slipStorable).toBe(true)
    // The solver, at the planter's 3 %, is asked for 34,000 × 0.97 ÷ (0.97 × 33,000 ÷ 34,033) = 35,064.
    expect(s.solverTargetSeedsPerAcre).toBeCloseTo(34_000 * 34_033 / 33_000, 6)
  })

  it('over wheel turns measures the drive at 0 % slip and implies no slip (86.4 in × 10 = 72 ft; computed)', () => {
    const s = seedDropSummary({ ...base, setupSlipPercent: 4, rows: [{ row: 3, seedsCounted: 140 }], wheelRevolutions: 10 })
    expect(s.basis).toBe('revolutions')
    expect(s.lengthFt).toBeCloseTo(72, 10)
    // 140 × 43,560 ÷ (72 × 2.5) = 33,880 at 0 % slip; 33,880 × 0.96 = 32,524.8 on the ground.
    expect(s.seedsPerAcre).toBeCloseTo(33_880, 8)
    expect(s.errorVsTargetPercent).toBeCloseTo((32_524.8 / 34_000 - 1) * 100, 8)
    expect(s.impliedSlipPercent).toBeNull()
    expect(s.slipStorable).toBe(false)
  })

  it('more seed than predicted is a negative slip that cannot be stored; nothing counted asks the solver nothing', () => {
    expect(seedDropSummary({ ...base, rows: [{ row: 1, seedsCounted: 36 }], lengthFt: 17.424 }).slipStorable).toBe(false)
    expect(seedDropSummary({ ...base, rows: [{ row: 1, seedsCounted: 0 }], lengthFt: 17.424 }).solverTargetSeedsPerAcre).toBe(0)
  })

  it('a count that matches the setup exactly is a storable slip of 0, not a floating-point hair below it (computed)', () => {
    // 20 seeds over 17.42 ft of 30 in rows = 20 × 43,560 ÷ 43.55 ft² at 0 % slip; the setup stored that rate at 3 %.
    const atZero = 20 * 43_560 / (17.42 * 2.5)
    const s = seedDropSummary({ ...base, setupSeedsPerAcre: atZero * 0.97, setupSlipPercent: 3, planterSlipPercent: 3, rows: [{ row: 1, seedsCounted: 20 }], lengthFt: 17.42 })
    expect(Math.abs(s.impliedSlipPercent!)).toBeLessThan(1e-9)
    expect(s.slipStorable).toBe(true)
  })

  it('seed on the ground from a stored check: a length count as counted, a wheel-turn count less the setup slip (36,000 at 5 % → 34,200; computed)', () => {
    expect(seedsOnGroundPerAcre({ basis: 'length', seedsPerAcre: 33_000, setupSlipPercent: 5 })).toBe(33_000)
    expect(seedsOnGroundPerAcre({ basis: 'revolutions', seedsPerAcre: 36_000, setupSlipPercent: 5 })).toBe(34_200)
    // Over wheel turns the summary's own on-the-ground figure agrees: 33,880 × 0.96 = 32,524.8.
    const s = seedDropSummary({ ...base, setupSlipPercent: 4, rows: [{ row: 3, seedsCounted: 140 }], wheelRevolutions: 10 })
    expect(seedsOnGroundPerAcre({ ...s, setupSlipPercent: 4 })).toBeCloseTo(32_524.8, 8)
  })

  it('the solver target times what the check found lands on the target (property)', () => {
    fc.assert(fc.property(fc.integer({ min: 1, max: 80 }), fc.double({ min: 0, max: 20, noNaN: true }), fc.double({ min: 0, max: 20, noNaN: true }), (seeds, setupSlip, planterSlip) => {
      const s = seedDropSummary({ ...base, setupSlipPercent: setupSlip, planterSlipPercent: planterSlip, rows: [{ row: 1, seedsCounted: seeds }], lengthFt: 17.424 })
      // A choice the solver rates at R (planter slip) gives R × (1 − setup slip) ÷ (1 − planter slip) × found ÷ setup on the ground.
      const onGround = s.solverTargetSeedsPerAcre * (1 - setupSlip / 100) / (1 - planterSlip / 100) * (s.seedsPerAcre / base.setupSeedsPerAcre)
      expect(onGround).toBeCloseTo(base.targetSeedsPerAcre, 4)
    }))
  })
})
