import { z } from 'zod'
import { catchPoint, positive, rowSpacingIn } from './calc'
import { CROPS } from './equipment'
import { isoDate, shortText } from './common'

// Calculators beside the three of the API: dry catch, course helper, fill planning.
export const dryRateBody = z.strictObject({
  ounces: positive('Catch weight', 100_000),
  lengthFt: positive('Length', 10_000),
  widthIn: positive('Width', 1200),
})

export const catchCourseBody = z.strictObject({
  rowSpacingIn,
  fractionOfAcre: positive('Fraction of an acre', 1).optional(),
  lbPerAcre: positive('Rate', 10_000).optional(),
  revolutions: positive('Revolutions', 10_000).optional(),
  wheelCircumferenceIn: positive('Rolling circumference', 1000).optional(),
}).refine((b) => (b.revolutions === undefined) === (b.wheelCircumferenceIn === undefined), { path: ['wheelCircumferenceIn'], message: 'Give both the revolutions and the rolling circumference, or neither' })

export const FILL_KINDS = ['granular hopper', 'fertilizer hopper', 'liquid tank'] as const
export const fillPlanBody = z.strictObject({
  containers: z.array(z.strictObject({
    name: shortText(80).min(1, 'Name the hopper or tank'),
    kind: z.enum(FILL_KINDS, { error: 'Choose granular hopper, fertilizer hopper or liquid tank' }),
    // lb for hoppers (all rows together), gal for a tank.
    capacity: positive('Capacity', 100_000),
    ratePerAcre: positive('Rate per acre', 10_000),
  }), { error: 'Containers must be a list' }).min(1, 'Give at least one hopper or tank').max(12, 'Give at most 12 hoppers or tanks'),
  fields: z.array(z.strictObject({
    name: shortText(120).min(1, 'Name the field'),
    acres: positive('Acres', 100_000),
  }), { error: 'Fields must be a list' }).min(1, 'Give at least one field').max(200, 'Give at most 200 fields'),
})

// A catch test run on a setup: the course as a length or as drive-wheel revolutions.
export const calibrationBody = z.strictObject({
  baseRevision: z.number({ error: 'Say which revision you tested' }).int('Say which revision you tested').min(1, 'Say which revision you tested'),
  rows: z.array(z.number().int().min(1).max(96), { error: 'Rows must be a list' }).min(1, 'Say which rows you caught').max(96),
  productName: shortText(120).optional(),
  points: z.array(catchPoint, { error: 'Points must be a list' }).min(2, 'Give at least two catches').max(100, 'Give at most 100 catches'),
  courseFt: positive('Course length', 10_000).optional(),
  revolutions: positive('Revolutions', 10_000).optional(),
  targetLbPerAcre: positive('Target rate', 10_000),
  dialSetting: z.number({ error: 'Dial setting must be a number' }).min(-1000, 'Dial setting must be from -1000 to 1000').max(1000, 'Dial setting must be from -1000 to 1000').optional(),
  // Save the dial setting onto the setup as a new revision.
  saveToSetup: z.boolean({ error: 'Say yes or no' }).default(false),
  // Rows that get the dial setting; by default every row with a granular applicator.
  applyToRows: z.array(z.number().int().min(1).max(96)).min(1).max(96).optional(),
  note: shortText(1000).optional(),
}).superRefine((b, ctx) => {
  if (new Set(b.points.map((p) => p.setting)).size < 2) ctx.addIssue({ code: 'custom', path: ['points'], message: 'Catch at two or more different settings' })
  if ((b.courseFt === undefined) === (b.revolutions === undefined)) ctx.addIssue({ code: 'custom', path: ['courseFt'], message: 'Give the course length or the drive-wheel revolutions, one of them' })
  if (b.saveToSetup && b.dialSetting === undefined) ctx.addIssue({ code: 'custom', path: ['dialSetting'], message: 'Choose the dial setting to save' })
})

export const RATE_UNITS = ['lb/acre', 'oz/1000 ft', 'gal/acre', 'fl oz/acre', 'pt/acre', 'qt/acre'] as const
export const TOTAL_UNITS = ['lb', 'oz', 'gal', 'fl oz', 'pt', 'qt'] as const

const appliedOn = isoDate
  .refine((s) => s >= '2000-01-01', 'Give a date from 2000 on')
  // A day of slack for time zones; a record is of something already done.
  .refine((s) => new Date(`${s}T00:00:00Z`).getTime() <= Date.now() + 86_400_000, 'The application date cannot be in the future')
const optionalText = (max: number) => shortText(max).optional().transform((s) => s || undefined)
// EPA registration numbers read company-product, sometimes with a distributor number: 12345-67 or 12345-67-890.
export const EPA_REG_PATTERN = /^\d{1,7}-\d{1,6}(-\d{1,7})?$/

export const applicationRecordBody = z.strictObject({
  appliedOn,
  appliedTime: z.string({ error: 'Give the time as HH:MM' }).regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Give the time as HH:MM (24 h)').optional(),
  fieldId: z.number({ error: 'Choose a field' }).int().positive().optional(),
  fieldName: shortText(120).min(1, 'Name the field or site'),
  location: optionalText(300),
  crop: z.enum(CROPS, { error: 'Choose a crop from the list' }),
  productName: shortText(160).min(1, 'Give the product (brand) name'),
  epaRegNumber: z.string({ error: 'EPA registration number must be text' }).trim().regex(EPA_REG_PATTERN, 'Write the EPA registration number as on the label, e.g. 12345-67').optional().or(z.literal('').transform(() => undefined)),
  restrictedUse: z.boolean({ error: 'Say whether it is a restricted-use product' }),
  rate: positive('Rate', 100_000),
  rateUnit: z.enum(RATE_UNITS, { error: 'Choose a rate unit from the list' }),
  totalAmount: positive('Total amount', 10_000_000).optional(),
  totalUnit: z.enum(TOTAL_UNITS, { error: 'Choose a unit for the total from the list' }).optional(),
  areaTreatedAcres: positive('Area treated', 100_000),
  bandWidthIn: positive('Band width', 120).optional(),
  rowSpacingIn: rowSpacingIn.optional(),
  applicatorName: shortText(120).min(1, 'Give the applicator\'s name'),
  certificationNumber: optionalText(60),
  calibrationRunId: z.number({ error: 'Choose a catch test' }).int().positive().optional(),
  weatherNotes: optionalText(1000),
  notes: optionalText(2000),
}).superRefine((b, ctx) => {
  const need = (path: keyof typeof b, message: string) => {
    if (b[path] === undefined) ctx.addIssue({ code: 'custom', path: [path], message })
  }
  if (b.totalAmount !== undefined && b.totalUnit === undefined) need('totalUnit', 'Give the unit of the total amount')
  if (b.bandWidthIn !== undefined && b.rowSpacingIn !== undefined && b.bandWidthIn > b.rowSpacingIn) ctx.addIssue({ code: 'custom', path: ['bandWidthIn'], message: 'The band cannot be wider than the row spacing' })
  // What a certified private applicator must record for a restricted-use product (7 CFR 110.3).
  if (b.restrictedUse) {
    need('epaRegNumber', 'A restricted-use record needs the EPA registration number')
    need('totalAmount', 'A restricted-use record needs the total amount applied')
    need('totalUnit', 'A restricted-use record needs the unit of the total amount')
    need('certificationNumber', 'A restricted-use record needs the applicator\'s certification number')
  }
})

export const correctionBody = z.strictObject({
  reason: shortText(1000).min(1, 'Say what the correction changes and why'),
  record: applicationRecordBody,
})

export const recordListQuery = z.object({
  season: z.coerce.number({ error: 'Season must be a year' }).int('Season must be a year').min(2000, 'Season must be from 2000 to 2100').max(2100, 'Season must be from 2000 to 2100').optional(),
})

export type ApplicationRecordBody = z.infer<typeof applicationRecordBody>
export type CalibrationBody = z.infer<typeof calibrationBody>
export type FillPlanBody = z.infer<typeof fillPlanBody>
