import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { computeSetupResults, seedsPerAcreOnRows } from '../../shared/utils/setup-results'
import type { SetupConfig, SetupRowUnit, SetupSection } from '../../shared/types/setup'

function unit(position: number, planting = true): SetupRowUnit {
  return {
    position, opener: 'double-disc', gaugeWheels: null, depthIn: 1.75, depthBand: null, downPressureLb: null, pressWheel: 'open-center',
    pressWheelWidthIn: null, covering: 'none', furrower: false, seedPlateId: null, granular: 'none', granularBandWidthIn: null,
    granularDialSetting: null, fertilizerSetting: null, planting,
  }
}

function section(name: string, rows: number[], cellsPerPlate: number, stages = [{ position: 1, driverTeeth: 20, drivenTeeth: 20 }]): SetupSection {
  return { sectionId: null, name, rows, seedPlateId: null, plateCode: null, cellsPerPlate, stages }
}

const range = (from: number, to: number) => Array.from({ length: to - from + 1 }, (_, i) => from + i)

// A 60 in wheel with a 1:1 drive and 10 cells drops a seed every 6 in (computed): the University of
// Kentucky (Bitzer & Herbek) run of 10 revolutions in 50 ft gives that 60 in wheel.
function config(over: Partial<SetupConfig> = {}): SetupConfig {
  return {
    crop: 'corn', targetSeedsPerAcre: 34_848, rowSpacingIn: 30, speedMph: null, wheelCircumferenceIn: 60, slipPercent: 0, meterRatio: 1,
    sections: [section('Main drive', range(1, 12), 10)], rowUnits: range(1, 12).map((p) => unit(p)), ...over,
  }
}

describe('computeSetupResults', () => {
  it('gives one section the meter formula and the 1/1000 acre check length', () => {
    const r = computeSetupResults(config())
    // 6,272,640 ÷ (30 in × 6 in) = 34,848 seeds/acre (constant from L. H. Bailey, Farm and Garden Rule-Book; computed).
    expect(r.seedsPerAcre).toBeCloseTo(34_848, 6)
    expect(r.seedSpacingIn).toBeCloseTo(6, 10)
    expect(r.errorPercent).toBeCloseTo(0, 10)
    expect(r.sections).toHaveLength(1)
    expect(r.sections[0]!.seedsPerFoot).toBeCloseTo(2, 10)
    // 30 in rows → 17 ft 5 in for 1/1000 acre (University of Tennessee Extension, 2011): 17.424 ft.
    expect(r.checkLengthFt).toBeCloseTo(17.424, 6)
    expect(r.warnings).toEqual([])
  })

  it('weighs the sections by their planting rows, leaving shut-off rows out', () => {
    const split = config({ sections: [section('Main bar', range(1, 8), 10), section('Split bar', range(9, 12), 20)] })
    const all = computeSetupResults(split)
    // (8 × 34,848 + 4 × 69,696) ÷ 12 = 46,464 (computed).
    expect(all.sections.map((s) => Math.round(s.seedsPerAcre))).toEqual([34_848, 69_696])
    expect(all.seedsPerAcre).toBeCloseTo(46_464, 6)
    expect(all.seedSpacingIn).toBeCloseTo(6_272_640 / (46_464 * 30), 10)
    const shut = computeSetupResults({ ...split, rowUnits: range(1, 12).map((p) => unit(p, p !== 12)) })
    // (8 × 34,848 + 3 × 69,696) ÷ 11 = 44,352 (computed).
    expect(shut.seedsPerAcre).toBeCloseTo(44_352, 6)
    expect(shut.sections[1]!.errorPercent).toBeCloseTo(100, 8)
  })

  it('applies drive slip, the stages and the meter ratio', () => {
    // 60 in at 4 % slip rolls 57.6 in per turn; 18/24 × 24/16 × 1.5 = 1.6875 plate turns; 10 cells → 16.875 seeds (computed).
    const r = computeSetupResults(config({
      slipPercent: 4, meterRatio: 1.5,
      sections: [section('Main drive', range(1, 12), 10, [{ position: 1, driverTeeth: 18, drivenTeeth: 24 }, { position: 2, driverTeeth: 24, drivenTeeth: 16 }])],
    }))
    expect(r.sections[0]!.plateRevsPerWheelRev).toBeCloseTo(1.6875, 12)
    expect(r.seedSpacingIn).toBeCloseTo(60 / (16.875 * 0.96), 10)
    expect(r.seedsPerAcre).toBeCloseTo(6_272_640 / (30 * (60 / (16.875 * 0.96))), 6)
  })

  it('warns about a population far from the target, a fast plate and rows without a drive', () => {
    const r = computeSetupResults(config({
      targetSeedsPerAcre: 30_000, speedMph: 12,
      sections: [section('Main drive', range(1, 11), 10)],
    }))
    expect(r.errorPercent).toBeCloseTo((34_848 / 30_000 - 1) * 100, 8)
    // 12 mph = 211.2 in/s → 35.2 seeds/s → 211.2 plate rpm with 10 cells (computed); the default limit is a rule of thumb.
    expect(r.sections[0]!.plateRpm).toBeCloseTo(211.2, 8)
    expect(r.warnings).toHaveLength(3)
    expect(r.warnings[0]).toMatch(/^Main drive: The plate turns at 211\.2 rpm/)
    expect(r.warnings[1]).toMatch(/16\.2 % from the target/)
    expect(r.warnings[2]).toBe('Rows 12 plant but belong to no drive section.')
    expect(computeSetupResults(config({ speedMph: 12 }), 250).warnings).toEqual([])
  })

  it('properties: twice the cells twice the population, finite results, population × spacing × row spacing constant', () => {
    const arb = fc.record({
      wheel: fc.double({ min: 40, max: 120, noNaN: true }),
      slip: fc.double({ min: 0, max: 50, noNaN: true }),
      driver: fc.integer({ min: 5, max: 120 }),
      driven: fc.integer({ min: 5, max: 120 }),
      cells: fc.integer({ min: 1, max: 200 }),
      rowSpacing: fc.double({ min: 6, max: 80, noNaN: true }),
      splitAt: fc.integer({ min: 1, max: 11 }),
    })
    fc.assert(fc.property(arb, (a) => {
      const stages = [{ position: 1, driverTeeth: a.driver, drivenTeeth: a.driven }]
      const make = (cells: number) => config({
        wheelCircumferenceIn: a.wheel, slipPercent: a.slip, rowSpacingIn: a.rowSpacing,
        sections: [section('A', range(1, a.splitAt), cells, stages), section('B', range(a.splitAt + 1, 12), cells, stages)],
      })
      const one = computeSetupResults(make(a.cells))
      const two = computeSetupResults(make(a.cells * 2))
      for (const v of [one.seedsPerAcre, one.seedSpacingIn, one.errorPercent, one.checkLengthFt]) expect(Number.isFinite(v)).toBe(true)
      expect(two.seedsPerAcre / one.seedsPerAcre).toBeCloseTo(2, 9)
      expect(one.seedsPerAcre * one.seedSpacingIn * a.rowSpacing).toBeCloseTo(6_272_640, 3)
    }), { numRuns: 200 })
  })
})

describe('seedsPerAcreOnRows', () => {
  // Two sections at different rates (computed results stand in as plain figures here).
  const config = { sections: [{ rows: [1, 2] }, { rows: [3, 4] }] } as unknown as Pick<SetupConfig, 'sections'>
  const results = { sections: [{ seedsPerAcre: 32_000 }, { seedsPerAcre: 36_000 }], seedsPerAcre: 34_000 } as never

  it('a check on one section\'s rows expects that section\'s rate, not the planter mean (computed)', () => {
    expect(seedsPerAcreOnRows(config, results, [1])).toBe(32_000)
    expect(seedsPerAcreOnRows(config, results, [3, 4])).toBe(36_000)
  })

  it('rows of both sections average row by row; a row in no section and no rows fall back to the mean', () => {
    // (32,000 + 32,000 + 36,000) ÷ 3 = 33,333.3
    expect(seedsPerAcreOnRows(config, results, [1, 2, 3])).toBeCloseTo(100_000 / 3, 6)
    expect(seedsPerAcreOnRows(config, results, [9])).toBe(34_000)
    expect(seedsPerAcreOnRows(config, results, [])).toBe(34_000)
  })
})
