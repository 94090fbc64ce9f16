import Decimal from 'decimal.js'

const SQ_FT_PER_ACRE = new Decimal(43_560)
// Water weighs about 8.34 lb/gal: common practice, no source.
export const WATER_LB_PER_GAL = 8.34

const rowFt = (rowSpacingIn: number) => new Decimal(rowSpacingIn).div(12)

// lb per field acre from oz per 1,000 ft of row: oz × 43,560 ÷ (1,000 × row ft) ÷ 16.
const lbPerAcreFromOz = (oz: Decimal, rowSpacingIn: number) => oz.mul(SQ_FT_PER_ACRE).div(rowFt(rowSpacingIn).mul(1000)).div(16)
const ozFromLbPerAcre = (lb: Decimal, rowSpacingIn: number) => lb.mul(16).mul(rowFt(rowSpacingIn).mul(1000)).div(SQ_FT_PER_ACRE)

export interface GranularInput {
  rowSpacingIn: number
  // Give exactly one of the three rates:
  // ozPer1000Ft: what the row's applicator meters per 1,000 ft of row;
  // lbPerAcre: product per field acre (rows and middles counted alike);
  // bandRateLbPerAcre: the rate on the treated band, which is the label's broadcast rate (needs bandWidthIn).
  ozPer1000Ft?: number
  lbPerAcre?: number
  bandRateLbPerAcre?: number
  bandWidthIn?: number
}

// Row ↔ field rate: lb/acre = oz per 1,000 ft × 43,560 ÷ (1,000 × row ft) ÷ 16. On a band the field
// rate = band rate × band width ÷ row width (OMAFRA, banded applications; the constant 2,722 =
// 43,560 ÷ 16 of Pesticide Environmental Stewardship, "Band Applicators").
export function computeGranular(input: GranularInput): { ozPer1000Ft: number, lbPerFieldAcre: number, lbPerBandAcre?: number } {
  const given = [input.ozPer1000Ft, input.lbPerAcre, input.bandRateLbPerAcre].filter((v) => v !== undefined)
  if (given.length !== 1) throw new RangeError('Give exactly one of oz per 1,000 ft, lb per acre or the band rate')
  if (input.bandWidthIn !== undefined && input.bandWidthIn > input.rowSpacingIn) throw new RangeError('The band cannot be wider than the row spacing')
  if (input.bandRateLbPerAcre !== undefined && input.bandWidthIn === undefined) throw new RangeError('A band rate needs the band width')
  // Share of the field the band treats.
  const bandShare = input.bandWidthIn !== undefined ? new Decimal(input.bandWidthIn).div(input.rowSpacingIn) : undefined
  let field: Decimal
  if (input.ozPer1000Ft !== undefined) field = lbPerAcreFromOz(new Decimal(input.ozPer1000Ft), input.rowSpacingIn)
  else if (input.lbPerAcre !== undefined) field = new Decimal(input.lbPerAcre)
  else field = new Decimal(input.bandRateLbPerAcre!).mul(bandShare!)
  const out: { ozPer1000Ft: number, lbPerFieldAcre: number, lbPerBandAcre?: number } = {
    ozPer1000Ft: ozFromLbPerAcre(field, input.rowSpacingIn).toNumber(),
    lbPerFieldAcre: field.toNumber(),
  }
  if (bandShare) out.lbPerBandAcre = field.div(bandShare).toNumber()
  return out
}

// Ounces to collect per row on a 653 ft course = lb/acre × width (in) ÷ 50 (University of Missouri
// Extension G1273, Fishel).
export function catchCourse653(input: { lbPerAcre: number, rowWidthIn: number }): { ounces: number } {
  return { ounces: new Decimal(input.lbPerAcre).mul(input.rowWidthIn).div(50).toNumber() }
}

// Length of a strip whose area is a fraction of an acre: 43,560 × fraction ÷ width ft (University of
// Georgia Extension, Sumner: 1/128 acre at 19 in → 214.9 ft).
export function courseLengthForFraction(input: { widthIn: number, fractionOfAcre: number }): { lengthFt: number } {
  return { lengthFt: SQ_FT_PER_ACRE.mul(input.fractionOfAcre).div(rowFt(input.widthIn)).toNumber() }
}

// Distance the drive wheel covers: revolutions × rolling circumference ÷ 12.
export function catchLengthFromRevolutions(input: { revolutions: number, wheelCircumferenceIn: number }): { lengthFt: number } {
  return { lengthFt: new Decimal(input.revolutions).mul(input.wheelCircumferenceIn).div(12).toNumber() }
}

// lb/acre = (oz ÷ 16) × 43,560 ÷ (length ft × width ft); on a 1/128 acre course that is oz × 8
// (University of Georgia Extension, Sumner, "Fertilizer Applicator Calibration").
export function dryRateFromCatch(input: { ounces: number, lengthFt: number, widthIn: number }): { lbPerAcre: number } {
  return { lbPerAcre: new Decimal(input.ounces).div(16).mul(SQ_FT_PER_ACRE).div(new Decimal(input.lengthFt).mul(rowFt(input.widthIn))).toNumber() }
}

export interface CatchPoint { setting: number, weightOz: number }
export interface CatchTestInput { points: CatchPoint[], courseFt: number, rowSpacingIn: number, targetLbPerAcre: number, currentSetting?: number }
export interface CatchTestFit {
  slope: number
  intercept: number
  r2: number
  // null when the line is flat (slope 0), so no setting reaches the target.
  settingForTarget: number | null
  rateAtSettings: { setting: number, lbPerAcre: number, fittedLbPerAcre: number, residual: number, offLine: boolean }[]
  // The setting for the target lies between the lowest and highest settings caught.
  inRange: boolean
  rateAtCurrentSetting?: number
}

// A catch is "off the line" when it differs from the fitted rate by more than 10 % of it: a rule of
// thumb (common practice, no source). A fixed share works with three points, where a test on the
// residual standard error has one degree of freedom and says little.
export const CATCH_OFF_LINE_SHARE = 0.1

// Least squares of rate (lb/acre from each catch, as dryRateFromCatch) on the dial setting:
// slope = Sxy ÷ Sxx, intercept = ȳ − slope × x̄, r² = 1 − SSE ÷ SST; the setting for the target is
// (target − intercept) ÷ slope.
export function fitCatchTest(input: CatchTestInput): CatchTestFit {
  if (new Set(input.points.map((p) => p.setting)).size < 2) throw new RangeError('A catch test needs catches at two or more different settings')
  const xs = input.points.map((p) => new Decimal(p.setting))
  const ys = input.points.map((p) => new Decimal(dryRateFromCatch({ ounces: p.weightOz, lengthFt: input.courseFt, widthIn: input.rowSpacingIn }).lbPerAcre))
  const n = xs.length
  const mean = (v: Decimal[]) => Decimal.sum(...v).div(n)
  const mx = mean(xs)
  const my = mean(ys)
  const sxx = Decimal.sum(...xs.map((x) => x.minus(mx).pow(2)))
  const sxy = Decimal.sum(...xs.map((x, i) => x.minus(mx).mul(ys[i]!.minus(my))))
  const slope = sxy.div(sxx)
  const intercept = my.minus(slope.mul(mx))
  const fitted = xs.map((x) => intercept.plus(slope.mul(x)))
  const sse = Decimal.sum(...ys.map((y, i) => y.minus(fitted[i]!).pow(2)))
  const sst = Decimal.sum(...ys.map((y) => y.minus(my).pow(2)))
  const r2 = sst.isZero() ? new Decimal(1) : new Decimal(1).minus(sse.div(sst))
  const settingForTarget = slope.isZero() ? null : new Decimal(input.targetLbPerAcre).minus(intercept).div(slope)
  const lo = Decimal.min(...xs)
  const hi = Decimal.max(...xs)
  const out: CatchTestFit = {
    slope: slope.toNumber(),
    intercept: intercept.toNumber(),
    r2: r2.toNumber(),
    settingForTarget: settingForTarget?.toNumber() ?? null,
    rateAtSettings: input.points.map((p, i) => {
      const residual = ys[i]!.minus(fitted[i]!)
      return { setting: p.setting, lbPerAcre: ys[i]!.toNumber(), fittedLbPerAcre: fitted[i]!.toNumber(), residual: residual.toNumber(), offLine: residual.abs().gt(fitted[i]!.abs().mul(CATCH_OFF_LINE_SHARE)) }
    }),
    inRange: settingForTarget !== null && settingForTarget.gte(lo) && settingForTarget.lte(hi),
  }
  if (input.currentSetting !== undefined) out.rateAtCurrentSetting = intercept.plus(slope.mul(input.currentSetting)).toNumber()
  return out
}

// GPA = 5,940 × GPM ÷ (MPH × W in) (University of Florida IFAS Extension, EDIS WG013). The water
// rate that calibrates the same nozzles = GPA × √SG (UNL CropWatch 2016).
export function computeLiquid(input: { gpm: number, mph: number, widthIn: number, specificGravity?: number }): { gpa: number, waterEquivalentGpa: number } {
  const gpa = new Decimal(5940).mul(input.gpm).div(new Decimal(input.mph).mul(input.widthIn))
  return { gpa: gpa.toNumber(), waterEquivalentGpa: gpa.mul(new Decimal(input.specificGravity ?? 1).sqrt()).toNumber() }
}

// GPM = GPA × MPH × W ÷ 5,940, the same formula turned round (EDIS WG013).
export function gpmForGpa(input: { gpa: number, mph: number, widthIn: number }): { gpm: number } {
  return { gpm: new Decimal(input.gpa).mul(input.mph).mul(input.widthIn).div(5940).toNumber() }
}

// Specific gravity = lb/gal ÷ 8.34 (water); conversion factor = √SG (UNL CropWatch 2016).
export function solutionFactor(input: { lbPerGal: number }): { specificGravity: number, factor: number } {
  const sg = new Decimal(input.lbPerGal).div(WATER_LB_PER_GAL)
  return { specificGravity: sg.toNumber(), factor: sg.sqrt().toNumber() }
}

// Gallons of solution for a nutrient rate = lb per acre ÷ (lb/gal × analysis %) (UNL CropWatch 2016:
// 75 lb N ÷ 2.982 lb N/gal = 25.151 gal of 28 % UAN).
export function gallonsForNutrient(input: { lbNutrientPerAcre: number, lbPerGal: number, analysisPercent: number }): { lbNutrientPerGal: number, galPerAcre: number } {
  const perGal = new Decimal(input.lbPerGal).mul(input.analysisPercent).div(100)
  return { lbNutrientPerGal: perGal.toNumber(), galPerAcre: new Decimal(input.lbNutrientPerAcre).div(perGal).toNumber() }
}

// GPM from a timed catch = (oz ÷ 128) ÷ (seconds ÷ 60).
export function gpmFromTimedCatch(input: { ounces: number, seconds: number }): { gpm: number } {
  return { gpm: new Decimal(input.ounces).div(128).div(new Decimal(input.seconds).div(60)).toNumber() }
}

// Acres per tank = tank gallons ÷ GPA.
export function acresPerTank(input: { tankGal: number, gpa: number }): { acres: number } {
  return { acres: new Decimal(input.tankGal).div(input.gpa).toNumber() }
}
