import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { computeMeter, DEFAULT_PLATE_RPM_LIMIT, driveRatio, impliedSlipPercent, rollingCircumferenceFromRun, rowLengthForFraction, seedingRateForStand, seedsPerAcreFromFoot, seedsPerFootFromRate, roundTo, SQ_IN_PER_ACRE, toMetricPopulation } from '../../shared/utils/meter'

describe('row length for 1/1000 acre', () => {
  // University of Tennessee Extension, UT Crops News, "Checking corn populations" (2011);
  // 30 in also UNL CropWatch, "Timely field stand counts".
  it.each([
    [15, 34, 10], [20, 26, 2], [30, 17, 5], [36, 14, 6], [38, 13, 9],
  ])('%s in rows → %s ft %s in', (rowSpacingIn, feet, inches) => {
    const r = rowLengthForFraction({ rowSpacingIn })
    expect({ feet: r.feet, inches: r.inches }).toEqual({ feet, inches })
  })

  it('scales with the fraction: 1/100 acre is ten times 1/1000 (computed)', () => {
    expect(rowLengthForFraction({ rowSpacingIn: 30, fractionOfAcre: 0.01 }).lengthFt).toBeCloseTo(174.24, 6)
  })
})

describe('seeds per foot of row', () => {
  // Iowa State University, Agron 212 (Gibson, rev. 2003), "Seeds per foot of row".
  it('200,000 seeds/acre in 15 in rows → 5.74 seeds/ft', () => {
    expect(seedsPerFootFromRate({ seedsPerAcre: 200_000, rowSpacingIn: 15 })).toBeCloseTo(5.74, 2)
  })
  it('5 seeds/ft in 15 in rows → 174,240 seeds/acre', () => {
    expect(seedsPerAcreFromFoot({ seedsPerFoot: 5, rowSpacingIn: 15 })).toBeCloseTo(174_240, 6)
  })
})

describe('the meter formula', () => {
  it('6,272,640 plants per acre at 1 in × 1 in (L. H. Bailey, Farm and Garden Rule-Book)', () => {
    expect(SQ_IN_PER_ACRE).toBe(6_272_640)
    // One cell, ratio 1, a 1 in circumference and no slip gives 1 in spacing.
    const m = computeMeter({ wheelCircumferenceIn: 1, slipPercent: 0, stages: [{ driverTeeth: 10, drivenTeeth: 10 }], meterRatio: 1, cellsPerPlate: 1, rowSpacingIn: 1 })
    expect(m.seedsPerAcre).toBeCloseTo(6_272_640, 6)
  })

  it('computes a worked two-stage drive (computed by hand from the formula)', () => {
    // R = 21/19 × 17/26 × 1 = 0.722672…; 30 cells → 21.6802 seeds/rev; 86.4 in wheel, 3 % slip.
    const m = computeMeter({ wheelCircumferenceIn: 86.4, slipPercent: 3, stages: [{ driverTeeth: 21, drivenTeeth: 19 }, { driverTeeth: 17, drivenTeeth: 26 }], meterRatio: 1, cellsPerPlate: 30, rowSpacingIn: 30, speedMph: 5 })
    expect(m.plateRevsPerWheelRev).toBeCloseTo((21 / 19) * (17 / 26), 12)
    expect(m.seedSpacingIn).toBeCloseTo(86.4 / (30 * (21 / 19) * (17 / 26) * 0.97), 10)
    expect(m.seedsPerAcre).toBeCloseTo(6_272_640 / (30 * m.seedSpacingIn), 6)
    expect(m.seedsPerFoot).toBeCloseTo(12 / m.seedSpacingIn, 10)
    expect(m.seedsPerSecond).toBeCloseTo((5 * 17.6) / m.seedSpacingIn, 10)
    expect(m.plateRpm).toBeCloseTo((m.seedsPerSecond! * 60) / 30, 10)
    // 42.8 rpm is above the 35 rpm default (a rule of thumb, no source).
    expect(m.plateRpmWarning).toMatch(/42\.8 rpm/)
  })

  it('warns when the plate turns faster than the limit (a rule of thumb, no source)', () => {
    const m = computeMeter({ wheelCircumferenceIn: 86.4, slipPercent: 0, stages: [{ driverTeeth: 30, drivenTeeth: 10 }], meterRatio: 1, cellsPerPlate: 16, rowSpacingIn: 30, speedMph: 8, plateRpmLimit: 20 })
    expect(m.plateRpmWarning).toMatch(/20 rpm/)
  })

  it('drive-wheel circumference from a measured run: 10 revolutions in 50 ft → 60 in (University of Kentucky, Bitzer & Herbek)', () => {
    expect(rollingCircumferenceFromRun({ revolutions: 10, distanceFt: 50 })).toBe(60)
  })

  it('seeding rate = stand ÷ (germination × survival) (Ohio State University, Thomison); 32,000 at 95 % and 90 % → 37,427 (computed)', () => {
    expect(seedingRateForStand({ targetStand: 32_000, germinationPercent: 95, survivalPercent: 90 }).seedsPerAcre).toBeCloseTo(37_426.9, 1)
  })

  it('implied slip reverses the slip in the formula (computed)', () => {
    const base = { wheelCircumferenceIn: 86.4, stages: [{ driverTeeth: 20, drivenTeeth: 20 }], meterRatio: 1, cellsPerPlate: 30, rowSpacingIn: 30 }
    const noSlip = computeMeter({ ...base, slipPercent: 0 }).seedsPerAcre
    const withSlip = computeMeter({ ...base, slipPercent: 4.5 }).seedsPerAcre
    expect(impliedSlipPercent({ expectedSeedsPerAcre: noSlip, countedSeedsPerAcre: withSlip })).toBeCloseTo(4.5, 9)
  })

  it('converts to metric within 10 ppm of the exact definitions (1 in = 2.54 cm, 1 acre = 43,560 ft² = 0.40468564224 ha by the 1959 international foot; computed)', () => {
    const m = toMetricPopulation({ seedsPerAcre: 34_000, seedSpacingIn: 6 })
    expect(Math.abs(m.seedsPerHectare / (34_000 / 0.40468564224) - 1)).toBeLessThan(1e-5)
    expect(Math.abs(m.seedSpacingCm / 15.24 - 1)).toBeLessThan(1e-5)
  })

  it('warns above the default plate speed of 35 rpm (a rule of thumb, no source)', () => {
    const base = { wheelCircumferenceIn: 60, slipPercent: 0, stages: [{ driverTeeth: 20, drivenTeeth: 20 }], meterRatio: 1, cellsPerPlate: 10, rowSpacingIn: 30 }
    // 6 in spacing: at 2 mph 5.87 seeds/s → 35.2 rpm; at 1.9 mph 33.4 rpm (computed).
    expect(DEFAULT_PLATE_RPM_LIMIT).toBe(35)
    expect(computeMeter({ ...base, speedMph: 2 }).plateRpmWarning).toMatch(/35 rpm/)
    expect(computeMeter({ ...base, speedMph: 1.9 }).plateRpmWarning).toBeUndefined()
  })

  it('rounds for display only, half away from zero', () => {
    expect(roundTo(34_848.5)).toBe(34_849)
    expect(roundTo(5.7392, 2)).toBe(5.74)
  })
})

describe('meter properties', () => {
  const teeth = fc.integer({ min: 8, max: 60 })
  const input = fc.record({
    wheelCircumferenceIn: fc.double({ min: 20, max: 200, noNaN: true }),
    slipPercent: fc.double({ min: 0, max: 50, noNaN: true }),
    stages: fc.array(fc.record({ driverTeeth: teeth, drivenTeeth: teeth }), { minLength: 1, maxLength: 6 }),
    meterRatio: fc.double({ min: 0.1, max: 5, noNaN: true }),
    cellsPerPlate: fc.integer({ min: 1, max: 120 }),
    rowSpacingIn: fc.double({ min: 5, max: 60, noNaN: true }),
    speedMph: fc.double({ min: 0.5, max: 12, noNaN: true }),
  })

  it('population is inversely proportional to spacing', () => {
    fc.assert(fc.property(input, (i) => {
      const m = computeMeter(i)
      expect(m.seedsPerAcre * m.seedSpacingIn * i.rowSpacingIn).toBeCloseTo(SQ_IN_PER_ACRE, 3)
    }))
  })

  it('doubling the cells doubles the population', () => {
    fc.assert(fc.property(input, (i) => {
      const a = computeMeter(i).seedsPerAcre
      const b = computeMeter({ ...i, cellsPerPlate: i.cellsPerPlate * 2 }).seedsPerAcre
      expect(b / a).toBeCloseTo(2, 9)
    }))
  })

  it('swapping a stage\'s driver and driven inverts its ratio', () => {
    fc.assert(fc.property(teeth, teeth, (d, n) => {
      expect(driveRatio([{ driverTeeth: d, drivenTeeth: n }], 1).mul(driveRatio([{ driverTeeth: n, drivenTeeth: d }], 1)).toNumber()).toBeCloseTo(1, 12)
    }))
  })

  it('valid inputs never give NaN or Infinity', () => {
    fc.assert(fc.property(input, (i) => {
      for (const v of Object.values(computeMeter(i))) if (typeof v === 'number') expect(Number.isFinite(v)).toBe(true)
    }))
  })
})
