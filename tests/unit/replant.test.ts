import { describe, expect, it } from 'vitest'
import { cornYieldPercent, plantingDayOfYear, replantDecision } from '../../shared/utils/replant'

// Iowa State University, PM 1885, "Corn Planting Guide": yield % by stand (thousand/acre) and date.
const TABLE: [string, number[]][] = [
  ['2026-04-20', [100, 94, 81, 74, 68]],
  ['2026-05-05', [100, 94, 81, 74, 68]],
  ['2026-05-16', [99, 93, 80, 73, 67]],
  ['2026-05-29', [90, 85, 73, 67, 61]],
  ['2026-06-13', [68, 64, 55, 50, 46]],
  ['2026-06-26', [52, 49, 42, 38, 35]],
]
const STANDS = [30_000, 24_000, 20_000, 16_000, 12_000]

describe('PM 1885 yield table (Iowa State University)', () => {
  it.each(TABLE)('reproduces every published value planted %s', (date, yields) => {
    STANDS.forEach((standPerAcre, i) => {
      expect(cornYieldPercent({ standPerAcre, plantingDate: date })).toEqual({ yieldPercent: yields[i], extrapolated: false })
    })
    expect(cornYieldPercent({ standPerAcre: 28_000, plantingDate: date }).yieldPercent).toBe(yields[0])
    expect(cornYieldPercent({ standPerAcre: 32_000, plantingDate: date }).yieldPercent).toBe(yields[0])
  })

  it('interpolates bilinearly between window middles (computed)', () => {
    // 26,000 on May 1: halfway between 94 and 100.
    expect(cornYieldPercent({ standPerAcre: 26_000, plantingDate: '2026-05-01' }).yieldPercent).toBeCloseTo(97, 12)
    // 22,000 on May 22 (6 of 13 days from May 16 to May 29): 86.5 → 79.
    expect(cornYieldPercent({ standPerAcre: 22_000, plantingDate: '2026-05-22' }).yieldPercent).toBeCloseTo(86.5 + (79 - 86.5) * 6 / 13, 10)
  })

  it('holds the edge value outside the table and says so', () => {
    expect(cornYieldPercent({ standPerAcre: 8_000, plantingDate: '2026-05-01' })).toEqual({ yieldPercent: 68, extrapolated: true })
    expect(cornYieldPercent({ standPerAcre: 40_000, plantingDate: '2026-05-01' })).toEqual({ yieldPercent: 100, extrapolated: true })
    expect(cornYieldPercent({ standPerAcre: 30_000, plantingDate: '2026-04-10' })).toEqual({ yieldPercent: 100, extrapolated: true })
    expect(cornYieldPercent({ standPerAcre: 30_000, plantingDate: '2026-06-28' })).toEqual({ yieldPercent: 52, extrapolated: false })
    expect(cornYieldPercent({ standPerAcre: 30_000, plantingDate: '2026-07-05' })).toEqual({ yieldPercent: 52, extrapolated: true })
  })

  it('counts days the same in every year and rejects dates that do not exist', () => {
    expect(plantingDayOfYear('2024-05-05')).toBe(plantingDayOfYear('2026-05-05'))
    expect(plantingDayOfYear('05-05')).toBe(125)
    expect(() => plantingDayOfYear('2026-04-31')).toThrow(/not a date/)
    expect(() => plantingDayOfYear('tomorrow')).toThrow(/not a date/)
  })
})

describe('replant decision', () => {
  it('compares keeping 16,000 from May 1 with 32,000 replanted May 29 (PM 1885 values; money computed)', () => {
    const r = replantDecision({ currentStand: 16_000, currentPlantingDate: '2026-05-01', replantStand: 32_000, replantDate: '2026-05-29', expectedYieldBuPerAcre: 200, pricePerBu: 4.5, replantCostPerAcre: 60 })
    expect(r.currentYieldPercent).toBe(74)
    expect(r.replantYieldPercent).toBe(90)
    expect(r.currentBuPerAcre).toBeCloseTo(148, 12)
    expect(r.replantBuPerAcre).toBeCloseTo(180, 12)
    expect(r.buDifferencePerAcre).toBeCloseTo(32, 12)
    expect(r.valueDifferencePerAcre).toBeCloseTo(144, 12)
    expect(r.netPerAcre).toBeCloseTo(84, 12)
    expect(r.extrapolated).toBe(false)
    expect(r.advice).toMatch(/Replanting comes out about \$84\.00 per acre ahead/)
    expect(r.advice).toMatch(/The agronomist decides\./)
  })

  it('advises keeping a fair stand late in the season', () => {
    const r = replantDecision({ currentStand: 24_000, currentPlantingDate: '2026-05-01', replantStand: 32_000, replantDate: '2026-06-13', expectedYieldBuPerAcre: 200, pricePerBu: 4.5, replantCostPerAcre: 60 })
    expect(r.netPerAcre).toBeLessThan(0)
    expect(r.advice).toMatch(/^Keeping the stand/)
  })
})
