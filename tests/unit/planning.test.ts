import { describe, expect, it } from 'vitest'
import { computeCapacity, daysToPlant, fillPlan, hopperCoverage, lbPerAcreFromSeeds, seedNeeds, seedsPerLbFromSample, seedUnitWeightLb } from '../../shared/utils/planning'

describe('field capacity', () => {
  it('C = S × W × E ÷ 8.25: 40 ft (16 rows × 30 in) at 6 mph and 70 % → 20.4 acres/h (Iowa State University Extension, Ag Decision Maker A3-24 / PM 696, "Estimating Farm Machinery Costs")', () => {
    const c = computeCapacity({ rows: 16, rowSpacingIn: 30, speedMph: 6, efficiencyPercent: 70 })
    expect(c.widthFt).toBe(40)
    expect(c.acresPerHour).toBeCloseTo(20.4, 1)
  })

  it('a 12-row 30 in planter at 5 mph and 60 % plants 10.9 acres/h (computed from the same PM 696 formula; no published figure)', () => {
    expect(computeCapacity({ rows: 12, rowSpacingIn: 30, speedMph: 5, efficiencyPercent: 60 }).acresPerHour).toBeCloseTo(10.9, 1)
  })

  it('days to plant: 1,000 acres at 20 acres/h and 10 h a day → 50 h, 5 days (computed)', () => {
    expect(daysToPlant({ acres: 1000, acresPerHour: 20, hoursPerDay: 10 })).toEqual({ hours: 50, days: 5 })
  })
})

describe('seed', () => {
  it('150,000 seeds/acre at 2,750 seeds/lb → 54.5 lb/acre (Iowa State University, Agron 212)', () => {
    expect(lbPerAcreFromSeeds({ seedsPerAcre: 150_000, seedsPerLb: 2750 }).lbPerAcre).toBeCloseTo(54.5, 1)
  })

  it('a 140,000-seed unit weighs 50 lb at 2,800 seeds/lb and 43.8 lb at 3,200 (University of Missouri IPM, Wiebold 2008)', () => {
    expect(seedUnitWeightLb({ seedsPerUnit: 140_000, seedsPerLb: 2800 }).lb).toBe(50)
    expect(seedUnitWeightLb({ seedsPerUnit: 140_000, seedsPerLb: 3200 }).lb).toBeCloseTo(43.8, 1)
  })

  it('seeds per lb = seeds in a 20 g sample × 22.68 (University of Kentucky, Bitzer & Herbek)', () => {
    expect(seedsPerLbFromSample({ seedsCounted: 120, sampleGrams: 20 }).seedsPerLb).toBeCloseTo(120 * 22.68, 0)
  })

  it('80,000-seed corn units (Iowa State University, Agron 212): 34,000/acre on 160 acres with 2 % extra → 5,548,800 seeds, 70 units (computed)', () => {
    const n = seedNeeds({ seedsPerAcre: 34_000, acres: 160, marginPercent: 2, unitSeeds: 80_000 })
    expect(n.seeds).toBeCloseTo(5_548_800, 6)
    expect(n.units).toBe(70)
  })

  it('units sold by weight: 140,000/acre on 100 acres at 2,800 seeds/lb in 50 lb bags → 5,000 lb, 100 bags (computed)', () => {
    expect(seedNeeds({ seedsPerAcre: 140_000, acres: 100, seedsPerLb: 2800, unitLb: 50 })).toEqual({ seeds: 14_000_000, lb: 5000, units: 100 })
    expect(() => seedNeeds({ seedsPerAcre: 1, acres: 1, unitLb: 50 })).toThrow(/Seeds per lb/)
  })
})

describe('fills', () => {
  it('acres per fill and refill stops: 3,000 lb at 150 lb/acre on 70 acres → 20 acres, 4 fills, 3 stops (computed)', () => {
    expect(fillPlan({ capacity: 3000, ratePerAcre: 150, fieldAcres: 70 })).toEqual({ acresPerFill: 20, fills: 4, refillStops: 3 })
    expect(fillPlan({ capacity: 3000, ratePerAcre: 150, fieldAcres: 20 }).refillStops).toBe(0)
  })

  it('a row hopper of 50 lb at 2,800 seeds/lb and 140,000/acre in 30 in rows covers 1 row-acre, 17,424 ft; 12 rows → 12 acres (computed)', () => {
    const h = hopperCoverage({ hopperLb: 50, seedsPerLb: 2800, seedsPerAcre: 140_000, rowSpacingIn: 30, rows: 12 })
    expect(h.rowAcresPerFill).toBe(1)
    expect(h.distanceFt).toBeCloseTo(17_424, 9)
    expect(h.planterAcresPerFill).toBe(12)
  })
})
