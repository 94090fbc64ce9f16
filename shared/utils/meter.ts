import Decimal from 'decimal.js'
import convert from 'convert-units'

// Square inches in an acre: 43,560 ft² × 144 (L. H. Bailey, Farm and Garden Rule-Book).
export const SQ_IN_PER_ACRE = 6_272_640
export const SQ_FT_PER_ACRE = 43_560
// 17.6 in/s for each mph.
const IN_PER_S_PER_MPH = new Decimal(63_360).div(3600)
const HUNDRED = new Decimal(100)
const ONE = new Decimal(1)
// Rule of thumb (common practice, no source): plate meters fill cells less reliably as the plate
// speeds up; 35 rpm is a cautious default that the user can change.
export const DEFAULT_PLATE_RPM_LIMIT = 35

export interface DriveStageTeeth { driverTeeth: number, drivenTeeth: number }

export interface MeterInput {
  wheelCircumferenceIn: number
  slipPercent: number
  stages: DriveStageTeeth[]
  meterRatio: number
  cellsPerPlate: number
  rowSpacingIn: number
  speedMph?: number
  plateRpmLimit?: number
}

export interface MeterResult {
  plateRevsPerWheelRev: number
  seedsPerWheelRev: number
  seedSpacingIn: number
  seedsPerAcre: number
  seedsPerFoot: number
  seedsPerSecond?: number
  plateRpm?: number
  plateRpmWarning?: string
}

// R = Π(driver ÷ driven) × meter ratio: plate revolutions per drive-wheel revolution.
export function driveRatio(stages: DriveStageTeeth[], meterRatio: number): Decimal {
  // Whole teeth multiply exactly, so one division serves the whole train.
  let up = new Decimal(meterRatio)
  let down = new Decimal(1)
  for (const s of stages) {
    up = up.mul(s.driverTeeth)
    down = down.mul(s.drivenTeeth)
  }
  return up.div(down)
}

// spacing (in) = circumference ÷ (cells × R × (1 − slip/100)); seeds/acre = 6,272,640 ÷ (row in × spacing in).
// Slip means the planter travels farther than the wheel rolls, so it widens the spacing.
// At 100 % slip (or more) the wheel never turns the drive, so no spacing exists: refused, not Infinity.
export function computeMeter(input: MeterInput): MeterResult {
  if (!(input.slipPercent < 100)) throw new RangeError('Slip must be below 100 %: at 100 % the drive wheel does not turn the meter')
  const r = driveRatio(input.stages, input.meterRatio)
  const seedsPerWheelRev = r.mul(input.cellsPerPlate)
  // Seeds per inch of travel = seeds per wheel revolution × (100 − slip) ÷ (100 × circumference);
  // everything else follows from it with one division each (divisions are the costly step).
  const seedsPerIn = seedsPerWheelRev.mul(HUNDRED.minus(input.slipPercent)).div(new Decimal(input.wheelCircumferenceIn).mul(100))
  const seedSpacingIn = ONE.div(seedsPerIn)
  const result: MeterResult = {
    plateRevsPerWheelRev: r.toNumber(),
    seedsPerWheelRev: seedsPerWheelRev.toNumber(),
    seedSpacingIn: seedSpacingIn.toNumber(),
    seedsPerAcre: seedsPerIn.mul(SQ_IN_PER_ACRE).div(input.rowSpacingIn).toNumber(),
    seedsPerFoot: seedsPerIn.mul(12).toNumber(),
  }
  if (input.speedMph !== undefined && input.speedMph > 0) {
    const seedsPerSecond = seedsPerIn.mul(IN_PER_S_PER_MPH).mul(input.speedMph)
    const plateRpm = seedsPerSecond.mul(60).div(input.cellsPerPlate)
    result.seedsPerSecond = seedsPerSecond.toNumber()
    result.plateRpm = plateRpm.toNumber()
    const limit = input.plateRpmLimit ?? DEFAULT_PLATE_RPM_LIMIT
    if (plateRpm.gt(limit)) {
      result.plateRpmWarning = `The plate turns at ${plateRpm.toFixed(1)} rpm, above the ${limit} rpm limit set for this check: slow down or use a plate with more cells.`
    }
  }
  return result
}

// Circumference = distance ÷ revolutions (University of Kentucky: 10 revolutions in 50 ft → 60 in).
export function rollingCircumferenceFromRun(input: { revolutions: number, distanceFt: number }): number {
  return new Decimal(input.distanceFt).mul(12).div(input.revolutions).toNumber()
}

// Length of row (ft) whose area is a fraction of an acre: 43,560 × fraction ÷ (row spacing in ÷ 12).
export function rowLengthForFraction(input: { rowSpacingIn: number, fractionOfAcre?: number }): { lengthFt: number, feet: number, inches: number } {
  const lengthFt = new Decimal(SQ_FT_PER_ACRE).mul(input.fractionOfAcre ?? 0.001).div(new Decimal(input.rowSpacingIn).div(12))
  let feet = lengthFt.floor().toNumber()
  let inches = lengthFt.minus(feet).mul(12).toDecimalPlaces(0, Decimal.ROUND_HALF_UP).toNumber()
  if (inches === 12) {
    feet += 1
    inches = 0
  }
  return { lengthFt: lengthFt.toNumber(), feet, inches }
}

// Seeds per acre = harvest stand ÷ (germination × survival) (Ohio State University, Thomison).
export function seedingRateForStand(input: { targetStand: number, germinationPercent: number, survivalPercent: number }): { seedsPerAcre: number } {
  const seedsPerAcre = new Decimal(input.targetStand).div(new Decimal(input.germinationPercent).div(100)).div(new Decimal(input.survivalPercent).div(100))
  return { seedsPerAcre: seedsPerAcre.toNumber() }
}

// Seeds per foot = (seeds per acre ÷ 43,560) × (row spacing in ÷ 12) (Iowa State University, Agron 212).
export function seedsPerFootFromRate(input: { seedsPerAcre: number, rowSpacingIn: number }): number {
  return new Decimal(input.seedsPerAcre).div(SQ_FT_PER_ACRE).mul(new Decimal(input.rowSpacingIn).div(12)).toNumber()
}

// Seeds per acre = seeds per foot × 43,560 ÷ (row spacing in ÷ 12) (Iowa State University, Agron 212).
export function seedsPerAcreFromFoot(input: { seedsPerFoot: number, rowSpacingIn: number }): number {
  return new Decimal(input.seedsPerFoot).mul(SQ_FT_PER_ACRE).div(new Decimal(input.rowSpacingIn).div(12)).toNumber()
}

// Slip implied by a field count: (1 − counted ÷ expected at 0 % slip) × 100, from the meter formula.
// A negative value means more seed than the drive predicts (doubles, or a wrong circumference).
export function impliedSlipPercent(input: { expectedSeedsPerAcre: number, countedSeedsPerAcre: number }): number {
  return new Decimal(1).minus(new Decimal(input.countedSeedsPerAcre).div(input.expectedSeedsPerAcre)).mul(100).toNumber()
}

// seeds/ha = seeds/acre × acres per hectare; cm = in × 2.54. convert-units 2 carries its own
// factors (1 ha = 2.4710514 acres, 1 ppm from the exact 2.4710538), close enough for display.
export function toMetricPopulation(input: { seedsPerAcre: number, seedSpacingIn: number }): { seedsPerHectare: number, seedSpacingCm: number } {
  const acresPerHectare = convert(1).from('ha').to('ac')
  return {
    seedsPerHectare: new Decimal(input.seedsPerAcre).mul(acresPerHectare).toNumber(),
    seedSpacingCm: convert(input.seedSpacingIn).from('in').to('cm'),
  }
}

// Display rounding only; computations keep full precision.
export function roundTo(value: number, digits = 0): number {
  return new Decimal(value).toDecimalPlaces(digits, Decimal.ROUND_HALF_UP).toNumber()
}

export function formatFeetInches(feet: number, inches: number): string {
  return `${feet} ft ${inches} in`
}

// Starting targets when a crop is picked, in seeds per acre: common practice, no source; the
// agronomist's plan replaces them.
export const STARTING_TARGETS: Record<string, number> = {
  'corn': 34_000, 'soybeans': 140_000, 'sorghum': 90_000, 'cotton': 45_000, 'sunflower': 22_000, 'dry beans': 100_000, 'sugar beets': 55_000, 'peanuts': 110_000,
}
