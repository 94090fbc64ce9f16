import Decimal from 'decimal.js'

const SQ_FT_PER_ACRE = 43_560
// Grams in a pound (international avoirdupois pound, 453.59237 g).
const GRAMS_PER_LB = new Decimal('453.59237')

// Effective field capacity C = S × W × E ÷ 8.25 (acres/h; mph, ft, efficiency as a fraction)
// (Iowa State University Extension, PM 696 / Ag Decision Maker A3-24). Width = rows × spacing.
export function computeCapacity(input: { rows: number, rowSpacingIn: number, speedMph: number, efficiencyPercent: number }): { widthFt: number, acresPerHour: number } {
  const widthFt = new Decimal(input.rows).mul(input.rowSpacingIn).div(12)
  const acresPerHour = new Decimal(input.speedMph).mul(widthFt).mul(new Decimal(input.efficiencyPercent).div(100)).div('8.25')
  return { widthFt: widthFt.toNumber(), acresPerHour: acresPerHour.toNumber() }
}

// Hours = acres ÷ acres per hour; days = hours ÷ planting hours per day.
export function daysToPlant(input: { acres: number, acresPerHour: number, hoursPerDay: number }): { hours: number, days: number } {
  const hours = new Decimal(input.acres).div(input.acresPerHour)
  return { hours: hours.toNumber(), days: hours.div(input.hoursPerDay).toNumber() }
}

// lb/acre = seeds per acre ÷ seeds per lb (Iowa State University, Agron 212).
export function lbPerAcreFromSeeds(input: { seedsPerAcre: number, seedsPerLb: number }): { lbPerAcre: number } {
  return { lbPerAcre: new Decimal(input.seedsPerAcre).div(input.seedsPerLb).toNumber() }
}

// Weight of a seed unit = seeds per unit ÷ seeds per lb (University of Missouri IPM, Wiebold 2008).
export function seedUnitWeightLb(input: { seedsPerUnit: number, seedsPerLb: number }): { lb: number } {
  return { lb: new Decimal(input.seedsPerUnit).div(input.seedsPerLb).toNumber() }
}

// Seeds per lb from a weighed sample = seeds × 453.59 ÷ grams; for a 20 g sample that is seeds ×
// 22.68 (University of Kentucky, Bitzer & Herbek).
export function seedsPerLbFromSample(input: { seedsCounted: number, sampleGrams: number }): { seedsPerLb: number } {
  return { seedsPerLb: new Decimal(input.seedsCounted).mul(GRAMS_PER_LB).div(input.sampleGrams).toNumber() }
}

export interface SeedNeedsInput {
  seedsPerAcre: number
  acres: number
  // Extra seed bought beyond the plan, in percent of it.
  marginPercent?: number
  // Units sold by count (e.g. 80,000-seed units) or by weight (then seedsPerLb is needed).
  unitSeeds?: number
  unitLb?: number
  seedsPerLb?: number
}

// Seeds = rate × acres × (1 + margin); units = ⌈seeds ÷ unit seeds⌉, or ⌈lb ÷ unit lb⌉ with
// lb = seeds ÷ seeds per lb. A part unit is a whole unit to buy.
export function seedNeeds(input: SeedNeedsInput): { seeds: number, lb?: number, units?: number } {
  const seeds = new Decimal(input.seedsPerAcre).mul(input.acres).mul(new Decimal(input.marginPercent ?? 0).div(100).plus(1))
  const out: { seeds: number, lb?: number, units?: number } = { seeds: seeds.toNumber() }
  const lb = input.seedsPerLb ? seeds.div(input.seedsPerLb) : undefined
  if (lb) out.lb = lb.toNumber()
  if (input.unitSeeds) out.units = seeds.div(input.unitSeeds).ceil().toNumber()
  else if (input.unitLb) {
    if (!lb) throw new RangeError('Seeds per lb is needed to count units sold by weight')
    out.units = lb.div(input.unitLb).ceil().toNumber()
  }
  return out
}

// Acres one fill covers = capacity ÷ rate per acre (lb and lb/acre, or gal and gal/acre); fills =
// ⌈field acres ÷ acres per fill⌉, starting full, so refill stops = fills − 1.
export function fillPlan(input: { capacity: number, ratePerAcre: number, fieldAcres: number }): { acresPerFill: number, fills: number, refillStops: number } {
  const acresPerFill = new Decimal(input.capacity).div(input.ratePerAcre)
  const fills = Decimal.max(1, new Decimal(input.fieldAcres).div(acresPerFill).ceil())
  return { acresPerFill: acresPerFill.toNumber(), fills: fills.toNumber(), refillStops: fills.minus(1).toNumber() }
}

// One row's hopper: seeds = hopper lb × seeds per lb; the row plants seeds ÷ rate acres, which is
// row spacing (ft) × distance, so distance = acres × 43,560 ÷ spacing ft. With every row fed the
// same way the planter covers rows × that.
export function hopperCoverage(input: { hopperLb: number, seedsPerLb: number, seedsPerAcre: number, rowSpacingIn: number, rows?: number }): { rowAcresPerFill: number, distanceFt: number, planterAcresPerFill?: number } {
  const rowAcres = new Decimal(input.hopperLb).mul(input.seedsPerLb).div(input.seedsPerAcre)
  const distanceFt = rowAcres.mul(SQ_FT_PER_ACRE).div(new Decimal(input.rowSpacingIn).div(12))
  const out: { rowAcresPerFill: number, distanceFt: number, planterAcresPerFill?: number } = { rowAcresPerFill: rowAcres.toNumber(), distanceFt: distanceFt.toNumber() }
  if (input.rows) out.planterAcresPerFill = rowAcres.mul(input.rows).toNumber()
  return out
}
