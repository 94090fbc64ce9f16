import { pgTable, text, integer, jsonb, index, uniqueIndex, timestamp, date, pgEnum, numeric } from 'drizzle-orm/pg-core'
import { id, timestamps } from './_columns'
import { farms, users } from './accounts'
import { planters } from './equipment'
import { setups } from './setups'
import { cropPlans, fields } from './fields'
import { CHECK_KINDS, REVIEW_STATUSES } from '../../../shared/types/checks'
import type { CheckResults } from '../../../shared/types/checks'

// A file kept in the `uploads` storage mount; the row says whose it is and what the bytes are.
export const uploads = pgTable('uploads', {
  id: id(),
  farmId: integer().notNull().references(() => farms.id, { onDelete: 'cascade' }),
  storageKey: text().notNull(),
  contentType: text().notNull(),
  sizeBytes: integer().notNull(),
  fileName: text(),
  uploadedBy: integer().references(() => users.id, { onDelete: 'set null' }),
  ...timestamps,
}, (t) => [
  uniqueIndex('uploads_storage_key_idx').on(t.storageKey),
  index('uploads_farm_idx').on(t.farmId, t.createdAt),
])

// Every column through which a record names uploads, as table.column; the orphan sweep
// (server/utils/uploads.ts) keeps whatever these name, and a test fails when a column is missing.
export const UPLOAD_REFERENCES = ['field_checks.csv_upload_id', 'field_checks.photo_upload_ids', 'inspection_items.photo_upload_ids'] as const

export const checkKindEnum = pgEnum('check_kind', CHECK_KINDS)
export const reviewStatusEnum = pgEnum('check_review_status', REVIEW_STATUSES)

// One field check: what was counted or measured (inputs) and what Rowbench computed from it
// (results), tied to the setup revision on the planter at the time.
export const fieldChecks = pgTable('field_checks', {
  id: id(),
  farmId: integer().notNull().references(() => farms.id, { onDelete: 'cascade' }),
  kind: checkKindEnum().notNull(),
  // A check outlives the field or plan it was taken on, so deleting those only unlinks it.
  fieldId: integer().references(() => fields.id, { onDelete: 'set null' }),
  planId: integer().references(() => cropPlans.id, { onDelete: 'set null' }),
  setupId: integer().references(() => setups.id, { onDelete: 'set null' }),
  setupRevision: integer(),
  rows: integer().array().notNull().default([]),
  checkedOn: date({ mode: 'string' }).notNull(),
  authorId: integer().references(() => users.id, { onDelete: 'set null' }),
  inputs: jsonb().$type<Record<string, unknown>>().notNull(),
  results: jsonb().$type<CheckResults>().notNull(),
  csvUploadId: integer().references(() => uploads.id, { onDelete: 'set null' }),
  photoUploadIds: integer().array().notNull().default([]),
  note: text(),
  reviewStatus: reviewStatusEnum().notNull().default('awaiting-review'),
  reviewComment: text(),
  reviewedBy: integer().references(() => users.id, { onDelete: 'set null' }),
  reviewedAt: timestamp({ withTimezone: true }),
  // Set when the slip this check implies was stored on the planter.
  slipAppliedPercent: numeric({ precision: 12, scale: 4, mode: 'number' }),
  slipAppliedPlanterId: integer().references(() => planters.id, { onDelete: 'set null' }),
  slipAppliedBy: integer().references(() => users.id, { onDelete: 'set null' }),
  slipAppliedAt: timestamp({ withTimezone: true }),
  ...timestamps,
}, (t) => [
  index('field_checks_farm_idx').on(t.farmId, t.checkedOn, t.id),
  index('field_checks_setup_idx').on(t.setupId, t.setupRevision),
  index('field_checks_field_idx').on(t.fieldId),
  index('field_checks_plan_idx').on(t.planId),
  index('field_checks_farm_review_idx').on(t.farmId, t.reviewStatus),
])
