import { z } from 'zod'
import { isoDate } from './common'

// Limits shared by calculators, the equipment forms and the server.
export const teeth = (label: string) => z.number({ error: `${label} must be a number` }).int(`${label} must be a whole number from 1 to 200`).min(1, `${label} must be a whole number from 1 to 200`).max(200, `${label} must be a whole number from 1 to 200`)
export const positive = (label: string, max: number) => z.number({ error: `${label} must be a number` }).gt(0, `${label} must be more than 0`).max(max, `${label} must be at most ${max}`)
export const rowSpacingIn = positive('Row spacing', 120)
export const slipPercent = z.number({ error: 'Slip must be a number' }).min(0, 'Slip must be from 0 to 50 %').max(50, 'Slip must be from 0 to 50 %')
export const cellsPerPlate = z.number({ error: 'Cells must be a number' }).int('Cells must be a whole number from 1 to 500').min(1, 'Cells must be a whole number from 1 to 500').max(500, 'Cells must be a whole number from 1 to 500')
export const wheelCircumferenceIn = positive('Rolling circumference', 1000)
export const meterRatio = positive('Meter ratio', 20)
export const speedMph = positive('Speed', 30)
export const stage = z.strictObject({ driverTeeth: teeth('Driver teeth'), drivenTeeth: teeth('Driven teeth') })
export const stages = z.array(stage, { error: 'Stages must be a list' }).min(1, 'Give at least one drive stage').max(6, 'A drive has at most 6 stages')

export const meterBody = z.strictObject({
  wheelCircumferenceIn,
  slipPercent,
  stages,
  meterRatio,
  cellsPerPlate,
  rowSpacingIn,
  speedMph: speedMph.optional(),
  plateRpmLimit: positive('Plate speed limit', 500).optional(),
})

export const rowLengthBody = z.strictObject({
  rowSpacingIn,
  fractionOfAcre: z.number({ error: 'Fraction must be a number' }).gt(0, 'Fraction must be more than 0').max(1, 'Fraction must be at most 1').optional(),
})

export const seedingRateBody = z.strictObject({
  targetStand: positive('Target stand', 10_000_000),
  germinationPercent: positive('Germination', 100),
  survivalPercent: positive('Survival', 100),
})

export type MeterBody = z.infer<typeof meterBody>

// A finite number in a range, with one message for every way it can fail.
const between = (label: string, min: number, max: number, unit = '') => {
  const msg = `${label} must be a number from ${min} to ${max}${unit}`
  return z.number({ error: msg }).min(min, msg).max(max, msg)
}
const wholeBetween = (label: string, min: number, max: number) => {
  const msg = `${label} must be a whole number from ${min} to ${max}`
  return z.number({ error: msg }).int(msg).min(min, msg).max(max, msg)
}
const percentAbove0 = (label: string) => positive(label, 100)
const lengthFt = positive('Length', 10_000)

export const granularBody = z.strictObject({
  rowSpacingIn,
  ozPer1000Ft: positive('Ounces per 1,000 ft', 10_000).optional(),
  lbPerAcre: positive('Rate', 10_000).optional(),
  bandRateLbPerAcre: positive('Band rate', 10_000).optional(),
  bandWidthIn: positive('Band width', 120).optional(),
}).superRefine((b, ctx) => {
  const given = [b.ozPer1000Ft, b.lbPerAcre, b.bandRateLbPerAcre].filter((v) => v !== undefined).length
  if (given !== 1) ctx.addIssue({ code: 'custom', path: ['lbPerAcre'], message: 'Give exactly one of ounces per 1,000 ft, rate per acre or band rate' })
  if (b.bandRateLbPerAcre !== undefined && b.bandWidthIn === undefined) ctx.addIssue({ code: 'custom', path: ['bandWidthIn'], message: 'A band rate needs the band width' })
  if (b.bandWidthIn !== undefined && b.bandWidthIn > b.rowSpacingIn) ctx.addIssue({ code: 'custom', path: ['bandWidthIn'], message: 'The band cannot be wider than the row spacing' })
})

export const catchPoint = z.strictObject({
  setting: between('Setting', -1000, 1000),
  weightOz: positive('Catch weight', 100_000),
})

export const catchTestBody = z.strictObject({
  points: z.array(catchPoint, { error: 'Points must be a list' }).min(2, 'Give at least two catches').max(100, 'Give at most 100 catches'),
  courseFt: lengthFt,
  rowSpacingIn,
  targetLbPerAcre: positive('Target rate', 10_000),
  currentSetting: between('Current setting', -1000, 1000).optional(),
}).refine((b) => new Set(b.points.map((p) => p.setting)).size >= 2, { path: ['points'], message: 'Catch at two or more different settings' })

export const liquidBody = z.strictObject({
  gpm: positive('Flow', 1000),
  mph: speedMph,
  widthIn: positive('Spacing', 1200),
  specificGravity: positive('Specific gravity', 3).optional(),
})

export const capacityBody = z.strictObject({
  rows: wholeBetween('Rows', 1, 96),
  rowSpacingIn,
  speedMph,
  efficiencyPercent: percentAbove0('Field efficiency'),
})

export const spacingQualityBody = z.strictObject({
  spacingsIn: z.array(positive('Each spacing', 1000), { error: 'Spacings must be a list' }).min(1, 'Give at least one spacing').max(100_000, 'Give at most 100,000 spacings'),
  theoreticalIn: positive('Theoretical spacing', 1000),
})

export const seedCheckBody = z.strictObject({
  seedsCounted: wholeBetween('Seeds counted', 0, 100_000),
  lengthFt,
  rowSpacingIn,
})

export const standCountBody = z.strictObject({
  counts: z.array(wholeBetween('Each count', 0, 100_000), { error: 'Counts must be a list' }).min(1, 'Give at least one count').max(1000, 'Give at most 1,000 counts'),
  lengthFt,
  rowSpacingIn,
})


export const replantBody = z.strictObject({
  currentStand: between('Current stand', 0, 100_000),
  currentPlantingDate: isoDate,
  replantStand: between('Replant stand', 0, 100_000),
  replantDate: isoDate,
  expectedYieldBuPerAcre: positive('Expected yield', 500),
  pricePerBu: positive('Price', 100),
  replantCostPerAcre: between('Replant cost', 0, 10_000),
})

export type RowLengthBody = z.infer<typeof rowLengthBody>
export type SeedingRateBody = z.infer<typeof seedingRateBody>
export type GranularBody = z.infer<typeof granularBody>
export type CatchTestBody = z.infer<typeof catchTestBody>
export type LiquidBody = z.infer<typeof liquidBody>
export type CapacityBody = z.infer<typeof capacityBody>
export type SpacingQualityBody = z.infer<typeof spacingQualityBody>
export type SeedCheckBody = z.infer<typeof seedCheckBody>
export type StandCountBody = z.infer<typeof standCountBody>
export type ReplantBody = z.infer<typeof replantBody>
