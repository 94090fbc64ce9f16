import Decimal from 'decimal.js'
import { seedUnitWeightLb } from './planning'

export interface SeedLotUnitInput { unitKind: 'seeds' | 'lb', unitSize: number, seedsPerLb: number }

// A unit in both measures: a seed-count unit weighs seeds ÷ seeds per lb; a weight unit holds
// lb × seeds per lb (140,000 seeds at 2,800 seeds/lb = 50 lb; University of Missouri IPM, Wiebold 2008).
export function seedLotUnit(lot: SeedLotUnitInput): { seedsPerUnit: number, unitWeightLb: number } {
  if (lot.unitKind === 'lb') {
    return { seedsPerUnit: new Decimal(lot.unitSize).mul(lot.seedsPerLb).toNumber(), unitWeightLb: lot.unitSize }
  }
  return { seedsPerUnit: lot.unitSize, unitWeightLb: seedUnitWeightLb({ seedsPerUnit: lot.unitSize, seedsPerLb: lot.seedsPerLb }).lb }
}
