import { pgTable, text, integer, numeric, boolean, pgEnum, index, uniqueIndex, timestamp } from 'drizzle-orm/pg-core'
import { id, timestamps } from './_columns'
import { farms } from './accounts'

const num = (precision = 12, scale = 4) => numeric({ precision, scale, mode: 'number' })

export const frameKindEnum = pgEnum('frame_kind', ['pull-type', 'mounted', 'folding', 'toolbar'])
export const openerEnum = pgEnum('opener', ['runner', 'double-disc'])
export const pressWheelEnum = pgEnum('press_wheel', ['open-center', 'flat-tread', 'center-rib', 'dual-rib', 'semi-pneumatic'])
export const coveringEnum = pgEnum('covering', ['none', 'knife', 'disc'])
export const granularEnum = pgEnum('granular', ['none', 'insecticide', 'herbicide', 'both'])

export const planters = pgTable('planters', {
  id: id(),
  farmId: integer().notNull().references(() => farms.id, { onDelete: 'cascade' }),
  name: text().notNull(),
  frameKind: frameKindEnum().notNull(),
  rowCount: integer().notNull(),
  rowSpacingIn: num().notNull(),
  transportWidthFt: num(),
  tireDescription: text(),
  wheelCircumferenceIn: num().notNull(),
  // How the circumference was found: typed in, or from a measured run of N revolutions over a distance.
  circumferenceRevolutions: num(),
  circumferenceDistanceFt: num(),
  slipPercent: num().notNull().default(0),
  meterRatio: num().notNull().default(1),
  seedHopperLb: num(),
  granularHopperLb: num(),
  notes: text(),
  // Bumped by every change to the installed configuration; installs check it to refuse stale work.
  configVersion: integer().notNull().default(1),
  archivedAt: timestamp({ withTimezone: true }),
  ...timestamps,
}, (t) => [index('planters_farm_idx').on(t.farmId, t.name)])

// A planter has one or more drive sections (for example a split row bar driven separately).
export const driveSections = pgTable('drive_sections', {
  id: id(),
  planterId: integer().notNull().references(() => planters.id, { onDelete: 'cascade' }),
  name: text().notNull(),
  sortOrder: integer().notNull().default(0),
  // Row positions (1-based) this section drives.
  rows: integer().array().notNull(),
  ...timestamps,
}, (t) => [index('drive_sections_planter_idx').on(t.planterId, t.sortOrder)])

// One chain pair of a section's drive train, in order from the drive wheel to the meters.
export const driveStages = pgTable('drive_stages', {
  id: id(),
  sectionId: integer().notNull().references(() => driveSections.id, { onDelete: 'cascade' }),
  position: integer().notNull(),
  chainPitch: text().notNull().default('#40'),
  driverTeeth: integer().notNull(),
  drivenTeeth: integer().notNull(),
  driverOptions: integer().array().notNull(),
  drivenOptions: integer().array().notNull(),
  ...timestamps,
}, (t) => [uniqueIndex('drive_stages_section_pos_idx').on(t.sectionId, t.position)])

export const seedPlates = pgTable('seed_plates', {
  id: id(),
  farmId: integer().notNull().references(() => farms.id, { onDelete: 'cascade' }),
  code: text().notNull(),
  crops: text().array().notNull(),
  cellsPerPlate: integer().notNull(),
  cellDescription: text(),
  seedsPerLbMin: integer(),
  seedsPerLbMax: integer(),
  quantityOnHand: integer().notNull().default(0),
  wearNotes: text(),
  ...timestamps,
}, (t) => [uniqueIndex('seed_plates_farm_code_idx').on(t.farmId, t.code)])

export const sprockets = pgTable('sprockets', {
  id: id(),
  farmId: integer().notNull().references(() => farms.id, { onDelete: 'cascade' }),
  teeth: integer().notNull(),
  chainPitch: text().notNull().default('#40'),
  quantityOnHand: integer().notNull().default(0),
  ...timestamps,
}, (t) => [uniqueIndex('sprockets_farm_teeth_pitch_idx').on(t.farmId, t.teeth, t.chainPitch)])

export const rowUnits = pgTable('row_units', {
  id: id(),
  planterId: integer().notNull().references(() => planters.id, { onDelete: 'cascade' }),
  position: integer().notNull(),
  opener: openerEnum().notNull().default('double-disc'),
  gaugeWheels: text(),
  depthIn: num().notNull().default(1.75),
  depthBand: text(),
  // null means no down-pressure springs.
  downPressureLb: num(),
  pressWheel: pressWheelEnum().notNull().default('open-center'),
  pressWheelWidthIn: num(),
  covering: coveringEnum().notNull().default('none'),
  furrower: boolean().notNull().default(false),
  seedPlateId: integer().references(() => seedPlates.id, { onDelete: 'set null' }),
  granular: granularEnum().notNull().default('none'),
  granularBandWidthIn: num(),
  granularDialSetting: num(),
  fertilizerSetting: text(),
  planting: boolean().notNull().default(true),
  ...timestamps,
}, (t) => [uniqueIndex('row_units_planter_pos_idx').on(t.planterId, t.position)])
