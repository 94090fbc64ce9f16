import { pgTable, text, integer, numeric, boolean, jsonb, date, time, index, uniqueIndex, type AnyPgColumn } from 'drizzle-orm/pg-core'
import { id, timestamps } from './_columns'
import { farms, users } from './accounts'
import { setups, setupRevisions } from './setups'
import { fields } from './fields'
import type { CatchPoint, CatchTestFit } from '../../../shared/utils/application'

const num = (precision = 12, scale = 4) => numeric({ precision, scale, mode: 'number' })

// One catch test of the granular metering dial, tied to the setup revision it was run on.
export const calibrationRuns = pgTable('calibration_runs', {
  id: id(),
  farmId: integer().notNull().references(() => farms.id, { onDelete: 'cascade' }),
  setupId: integer().notNull().references(() => setups.id, { onDelete: 'cascade' }),
  setupRevisionId: integer().notNull().references(() => setupRevisions.id, { onDelete: 'cascade' }),
  revision: integer().notNull(),
  productName: text(),
  // Row positions whose output was caught.
  rows: integer().array().notNull(),
  courseFt: num().notNull(),
  // Set when the course was N drive-wheel revolutions rather than a measured length.
  revolutions: num(),
  rowSpacingIn: num().notNull(),
  targetLbPerAcre: num().notNull(),
  points: jsonb().$type<CatchPoint[]>().notNull(),
  fit: jsonb().$type<CatchTestFit>().notNull(),
  r2: num(8, 6).notNull(),
  // The dial setting chosen from the fit, and the setup revision that carries it when it was saved there.
  dialSetting: num(),
  appliedRevision: integer(),
  note: text(),
  runBy: integer().references(() => users.id, { onDelete: 'set null' }),
  ...timestamps,
}, (t) => [
  index('calibration_runs_setup_idx').on(t.setupId, t.createdAt),
  index('calibration_runs_farm_idx').on(t.farmId, t.createdAt),
])

// Application records are append-only: a correction is a new row pointing at the one it replaces.
export const applicationRecords = pgTable('application_records', {
  id: id(),
  farmId: integer().notNull().references(() => farms.id, { onDelete: 'cascade' }),
  season: integer().notNull(),
  appliedOn: date({ mode: 'string' }).notNull(),
  appliedTime: time(),
  fieldId: integer().references(() => fields.id, { onDelete: 'set null' }),
  // The field's name as it was when recorded, so the record reads the same after a rename.
  fieldName: text().notNull(),
  location: text(),
  crop: text().notNull(),
  productName: text().notNull(),
  epaRegNumber: text(),
  restrictedUse: boolean().notNull().default(false),
  rate: num().notNull(),
  rateUnit: text().notNull(),
  totalAmount: num(),
  totalUnit: text(),
  areaTreatedAcres: num().notNull(),
  bandWidthIn: num(),
  rowSpacingIn: num(),
  applicatorName: text().notNull(),
  certificationNumber: text(),
  calibrationRunId: integer().references(() => calibrationRuns.id, { onDelete: 'set null' }),
  weatherNotes: text(),
  notes: text(),
  correctsId: integer().references((): AnyPgColumn => applicationRecords.id, { onDelete: 'no action' }),
  correctionReason: text(),
  recordedBy: integer().references(() => users.id, { onDelete: 'set null' }),
  ...timestamps,
}, (t) => [
  index('application_records_farm_season_idx').on(t.farmId, t.season, t.appliedOn),
  index('application_records_field_idx').on(t.fieldId),
  index('application_records_calibration_idx').on(t.calibrationRunId),
  // A record is corrected at most once; later corrections correct the correction.
  uniqueIndex('application_records_corrects_idx').on(t.correctsId),
])
