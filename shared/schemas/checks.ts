import { MAX_PHOTOS_PER_RECORD } from '../utils/upload-limits'
import { z } from 'zod'
import { positive, rowSpacingIn, spacingQualityBody } from './calc'
import { isoDate, shortText } from './common'
import { CHECK_KINDS, REVIEW_STATUSES } from '../types/checks'

const recordId = (label: string) => z.number({ error: `${label} must be a record id` }).int(`${label} must be a record id`).positive(`${label} must be a record id`).max(2_147_483_647, `${label} must be a record id`)
const whole = (label: string, min: number, max: number) => {
  const msg = `${label} must be a whole number from ${min} to ${max}`
  return z.number({ error: msg }).int(msg).min(min, msg).max(max, msg)
}
const row = whole('Row', 1, 96)

// Links every kind of check shares.
const links = {
  setupId: recordId('Setup').optional(),
  setupRevision: whole('Setup revision', 1, 100_000).optional(),
  fieldId: recordId('Field').optional(),
  planId: recordId('Crop plan').optional(),
  checkedOn: isoDate.optional(),
  note: shortText(2000).optional(),
  photoUploadIds: z.array(recordId('Photo'), { error: 'Photos must be a list' }).max(MAX_PHOTOS_PER_RECORD, 'Attach at most 10 photos').optional(),
}

export const seedDropCheckBody = z.strictObject({
  kind: z.literal('seed-drop'),
  ...links,
  setupId: recordId('Setup'),
  rows: z.array(z.strictObject({ row, seedsCounted: whole('Seeds counted', 0, 100_000) }), { error: 'Rows must be a list' })
    .min(1, 'Count at least one row').max(96, 'At most 96 rows'),
  lengthFt: positive('Length', 10_000).optional(),
  wheelRevolutions: positive('Wheel revolutions', 1_000).optional(),
  rowSpacingIn: rowSpacingIn.optional(),
}).superRefine((b, ctx) => {
  if ((b.lengthFt === undefined) === (b.wheelRevolutions === undefined)) ctx.addIssue({ code: 'custom', path: ['lengthFt'], message: 'Give either the length of row or the number of drive wheel revolutions' })
  if (new Set(b.rows.map((r) => r.row)).size !== b.rows.length) ctx.addIssue({ code: 'custom', path: ['rows'], message: 'Each row appears once' })
})

export const standCountCheckBody = z.strictObject({
  kind: z.literal('stand-count'),
  ...links,
  rows: z.array(row, { error: 'Rows must be a list' }).max(96, 'At most 96 rows').optional(),
  counts: z.array(whole('Each count', 0, 100_000), { error: 'Counts must be a list' }).min(1, 'Give at least one count').max(1000, 'Give at most 1,000 counts'),
  lengthFt: positive('Length', 10_000),
  rowSpacingIn: rowSpacingIn.optional(),
  targetStand: positive('Target stand', 10_000_000).optional(),
})

export const spacingCheckBody = z.strictObject({
  kind: z.literal('spacing'),
  ...links,
  row: row.optional(),
  spacingsIn: spacingQualityBody.shape.spacingsIn.optional(),
  csvUploadId: recordId('CSV file').optional(),
  csvColumn: z.string({ error: 'Column must be text' }).trim().min(1, 'Name the column').max(80, 'Use at most 80 characters').optional(),
  theoreticalIn: positive('Theoretical spacing', 1000).optional(),
}).superRefine((b, ctx) => {
  if ((b.spacingsIn === undefined) === (b.csvUploadId === undefined)) ctx.addIssue({ code: 'custom', path: ['spacingsIn'], message: 'Give the spacings or an uploaded CSV file, not both' })
})

export const checkCreateBody = z.discriminatedUnion('kind', [seedDropCheckBody, standCountCheckBody, spacingCheckBody], { error: 'Choose the kind of check: seed-drop, stand-count or spacing' })

export const checkReviewBody = z.strictObject({
  status: z.enum(REVIEW_STATUSES.filter((s) => s !== 'awaiting-review') as ['accepted', 'correction-needed', 'replant-considered'], { error: 'Choose accepted, correction-needed or replant-considered' }),
  comment: shortText(4000).optional(),
})

export const applySlipBody = z.strictObject({
  // The planter version the user saw, so a change made meanwhile is not overwritten (409).
  configVersion: z.number({ error: 'Version must be a number' }).int().positive().optional(),
})

export const checkListQuery = z.object({
  kind: z.enum(CHECK_KINDS).optional(),
  setupId: z.coerce.number().int().positive().max(2_147_483_647).optional(),
  fieldId: z.coerce.number().int().positive().max(2_147_483_647).optional(),
  planId: z.coerce.number().int().positive().max(2_147_483_647).optional(),
  reviewStatus: z.enum(REVIEW_STATUSES).optional(),
  after: z.coerce.number().int().positive().max(2_147_483_647).optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
})

export type CheckCreateBody = z.infer<typeof checkCreateBody>
export type SeedDropCheckBody = z.infer<typeof seedDropCheckBody>
export type StandCountCheckBody = z.infer<typeof standCountCheckBody>
export type SpacingCheckBody = z.infer<typeof spacingCheckBody>

// Photos added to a check after it was taken (a dig photographed later, a gap found on a second walk).
export const checkPhotosBody = z.strictObject({
  uploadIds: z.array(recordId('Photo'), { error: 'Photos must be a list' }).min(1, 'Choose at least one photo').max(MAX_PHOTOS_PER_RECORD, 'Attach at most 10 photos'),
})
