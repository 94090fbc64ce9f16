import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { seedLotUnit } from '../../shared/utils/seed-lots'

describe('seed lot units', () => {
  it('140,000 soybean seeds weigh 50 lb at 2,800 seeds/lb and 43.8 lb at 3,200 seeds/lb (University of Missouri IPM, Wiebold 2008)', () => {
    expect(seedLotUnit({ unitKind: 'seeds', unitSize: 140_000, seedsPerLb: 2_800 })).toEqual({ seedsPerUnit: 140_000, unitWeightLb: 50 })
    expect(seedLotUnit({ unitKind: 'seeds', unitSize: 140_000, seedsPerLb: 3_200 }).unitWeightLb).toBeCloseTo(43.75, 10)
  })

  it('an 80,000-kernel corn unit (Iowa State University, Agron 212) at 1,600 kernels/lb weighs 50 lb (computed)', () => {
    expect(seedLotUnit({ unitKind: 'seeds', unitSize: 80_000, seedsPerLb: 1_600 }).unitWeightLb).toBe(50)
  })

  it('a 50 lb bag at 2,750 seeds/lb holds 137,500 seeds (computed)', () => {
    expect(seedLotUnit({ unitKind: 'lb', unitSize: 50, seedsPerLb: 2_750 })).toEqual({ seedsPerUnit: 137_500, unitWeightLb: 50 })
  })

  it('the two measures agree both ways (property)', () => {
    fc.assert(fc.property(fc.integer({ min: 100, max: 10_000_000 }), fc.integer({ min: 1, max: 100_000 }), (seeds, perLb) => {
      const u = seedLotUnit({ unitKind: 'seeds', unitSize: seeds, seedsPerLb: perLb })
      const back = seedLotUnit({ unitKind: 'lb', unitSize: u.unitWeightLb, seedsPerLb: perLb })
      expect(back.seedsPerUnit).toBeCloseTo(seeds, 6)
    }))
  })
})
