import { sql } from 'drizzle-orm'
import { pgTable, text, integer, numeric, pgEnum, index, uniqueIndex, timestamp, date, jsonb } from 'drizzle-orm/pg-core'
import { id, timestamps } from './_columns'
import { farms, users } from './accounts'
import { planters } from './equipment'
import { setups } from './setups'

const num = (precision = 12, scale = 4) => numeric({ precision, scale, mode: 'number' })

export const tillageEnum = pgEnum('tillage', ['conventional', 'minimum', 'no-till'])
export const drainageEnum = pgEnum('drainage', ['well', 'moderate', 'poor', 'tiled'])
export const seedUnitKindEnum = pgEnum('seed_unit_kind', ['seeds', 'lb'])
// draft → submitted → approved | changes-requested → set-up → planted
export const planStatusEnum = pgEnum('plan_status', ['draft', 'submitted', 'approved', 'changes-requested', 'set-up', 'planted'])

export const fields = pgTable('fields', {
  id: id(),
  farmId: integer().notNull().references(() => farms.id, { onDelete: 'cascade' }),
  name: text().notNull(),
  acres: num().notNull(),
  soilTexture: text(),
  tillage: tillageEnum().notNull().default('conventional'),
  drainage: drainageEnum(),
  notes: text(),
  // GeoJSON Polygon or MultiPolygon (WGS 84); acres computed from it when present.
  boundary: jsonb().$type<{ type: 'Polygon' | 'MultiPolygon', coordinates: unknown }>(),
  boundaryAcres: num(),
  ...timestamps,
}, (t) => [
  // Names are unique per farm whatever their case, as the service checks.
  uniqueIndex('fields_farm_name_idx').on(t.farmId, sql`lower(${t.name})`),
  index('fields_farm_id_idx').on(t.farmId, t.id),
])

export const seedLots = pgTable('seed_lots', {
  id: id(),
  farmId: integer().notNull().references(() => farms.id, { onDelete: 'cascade' }),
  crop: text().notNull(),
  variety: text().notNull(),
  lotNumber: text().notNull(),
  seedsPerLb: num().notNull(),
  germinationPercent: num(6, 2).notNull(),
  sizeGrade: text(),
  treatment: text(),
  unitsOnHand: num().notNull().default(0),
  // A unit is either a seed count (80,000 kernels) or a weight in lb (50 lb bag).
  unitKind: seedUnitKindEnum().notNull().default('seeds'),
  unitSize: num(14, 2).notNull(),
  notes: text(),
  ...timestamps,
}, (t) => [
  uniqueIndex('seed_lots_farm_lot_idx').on(t.farmId, t.lotNumber),
  index('seed_lots_farm_crop_idx').on(t.farmId, t.crop),
])

export const cropPlans = pgTable('crop_plans', {
  id: id(),
  farmId: integer().notNull().references(() => farms.id, { onDelete: 'cascade' }),
  season: integer().notNull(),
  fieldId: integer().notNull().references(() => fields.id, { onDelete: 'restrict' }),
  crop: text().notNull(),
  seedLotId: integer().references(() => seedLots.id, { onDelete: 'set null' }),
  targetStand: integer().notNull(),
  survivalPercent: num(6, 2).notNull().default(95),
  rowSpacingIn: num().notNull(),
  windowStart: date(),
  windowEnd: date(),
  planterId: integer().references(() => planters.id, { onDelete: 'set null' }),
  speedMph: num().notNull().default(5),
  marginPercent: num(6, 2).notNull().default(5),
  sortOrder: integer().notNull().default(0),
  notes: text(),
  status: planStatusEnum().notNull().default('draft'),
  // The proposed setup; approval pins the revision it saw.
  setupId: integer().references(() => setups.id, { onDelete: 'set null' }),
  proposedBy: integer().references(() => users.id, { onDelete: 'set null' }),
  approvedRevision: integer(),
  approvedBy: integer().references(() => users.id, { onDelete: 'set null' }),
  approvedAt: timestamp({ withTimezone: true }),
  plantedOn: date(),
  plantedAcres: num(),
  createdBy: integer().references(() => users.id, { onDelete: 'set null' }),
  ...timestamps,
}, (t) => [
  index('crop_plans_farm_season_idx').on(t.farmId, t.season, t.status),
  index('crop_plans_field_idx').on(t.fieldId),
  index('crop_plans_setup_idx').on(t.setupId),
  index('crop_plans_planter_idx').on(t.planterId, t.sortOrder),
])

// Every status change, with who, when and why.
export const planEvents = pgTable('plan_events', {
  id: id(),
  planId: integer().notNull().references(() => cropPlans.id, { onDelete: 'cascade' }),
  fromStatus: planStatusEnum(),
  toStatus: planStatusEnum().notNull(),
  setupRevision: integer(),
  comment: text(),
  userId: integer().references(() => users.id, { onDelete: 'set null' }),
  createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
}, (t) => [index('plan_events_plan_idx').on(t.planId, t.createdAt)])

export const planComments = pgTable('plan_comments', {
  id: id(),
  planId: integer().notNull().references(() => cropPlans.id, { onDelete: 'cascade' }),
  userId: integer().references(() => users.id, { onDelete: 'set null' }),
  body: text().notNull(),
  ...timestamps,
}, (t) => [index('plan_comments_plan_idx').on(t.planId, t.createdAt)])
