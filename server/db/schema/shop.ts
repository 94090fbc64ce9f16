import { pgTable, text, integer, numeric, pgEnum, index, uniqueIndex, timestamp, date, jsonb } from 'drizzle-orm/pg-core'
import { id, timestamps } from './_columns'
import { farms, users } from './accounts'
import { planters } from './equipment'

const num = (precision = 12, scale = 4) => numeric({ precision, scale, mode: 'number' })

export interface ChecklistItem { area: string, label: string, hint: string | null }

// ok | needs-fixing | replaced; null until the item has been looked at.
export const itemResultEnum = pgEnum('inspection_item_result', ['ok', 'needs-fixing', 'replaced'])
export const inspectionStatusEnum = pgEnum('inspection_status', ['started', 'completed'])
// open → in-progress → closed
export const workItemStatusEnum = pgEnum('work_item_status', ['open', 'in-progress', 'closed'])

// A list of things to look at before the season; the foreman keeps the farm's lists.
export const checklistTemplates = pgTable('checklist_templates', {
  id: id(),
  farmId: integer().notNull().references(() => farms.id, { onDelete: 'cascade' }),
  name: text().notNull(),
  items: jsonb().$type<ChecklistItem[]>().notNull(),
  archivedAt: timestamp({ withTimezone: true }),
  ...timestamps,
}, (t) => [index('checklist_templates_farm_idx').on(t.farmId, t.name)])

export const inspections = pgTable('inspections', {
  id: id(),
  farmId: integer().notNull().references(() => farms.id, { onDelete: 'cascade' }),
  planterId: integer().notNull().references(() => planters.id, { onDelete: 'cascade' }),
  templateId: integer().references(() => checklistTemplates.id, { onDelete: 'set null' }),
  templateName: text().notNull(),
  status: inspectionStatusEnum().notNull().default('started'),
  notes: text(),
  inspectedBy: integer().references(() => users.id, { onDelete: 'set null' }),
  completedAt: timestamp({ withTimezone: true }),
  ...timestamps,
}, (t) => [
  index('inspections_farm_created_idx').on(t.farmId, t.createdAt),
  index('inspections_planter_idx').on(t.planterId, t.createdAt),
])

// One line of an inspection; area and label are copied so editing the list later changes no record.
export const inspectionItems = pgTable('inspection_items', {
  id: id(),
  inspectionId: integer().notNull().references(() => inspections.id, { onDelete: 'cascade' }),
  position: integer().notNull(),
  area: text().notNull(),
  label: text().notNull(),
  hint: text(),
  result: itemResultEnum(),
  notes: text(),
  // Ids of uploaded photos (the upload store is another area's; kept as plain ids here).
  photoUploadIds: integer().array().notNull().default([]),
  ...timestamps,
}, (t) => [uniqueIndex('inspection_items_pos_idx').on(t.inspectionId, t.position)])

export const workItems = pgTable('work_items', {
  id: id(),
  farmId: integer().notNull().references(() => farms.id, { onDelete: 'cascade' }),
  planterId: integer().notNull().references(() => planters.id, { onDelete: 'cascade' }),
  inspectionItemId: integer().references(() => inspectionItems.id, { onDelete: 'set null' }),
  title: text().notNull(),
  notes: text(),
  status: workItemStatusEnum().notNull().default('open'),
  assignedTo: integer().references(() => users.id, { onDelete: 'set null' }),
  createdBy: integer().references(() => users.id, { onDelete: 'set null' }),
  closedBy: integer().references(() => users.id, { onDelete: 'set null' }),
  closedAt: timestamp({ withTimezone: true }),
  ...timestamps,
}, (t) => [
  index('work_items_farm_status_idx').on(t.farmId, t.status, t.createdAt),
  index('work_items_planter_idx').on(t.planterId),
])

// The maintenance log: what was serviced when, and when it is due again (by acres, by date or both).
export const serviceEvents = pgTable('service_events', {
  id: id(),
  farmId: integer().notNull().references(() => farms.id, { onDelete: 'cascade' }),
  planterId: integer().notNull().references(() => planters.id, { onDelete: 'cascade' }),
  servicedOn: date({ mode: 'string' }).notNull(),
  task: text().notNull(),
  notes: text(),
  intervalAcres: num(),
  nextDueOn: date({ mode: 'string' }),
  performedBy: integer().references(() => users.id, { onDelete: 'set null' }),
  ...timestamps,
}, (t) => [
  index('service_events_planter_idx').on(t.planterId, t.servicedOn),
  index('service_events_farm_idx').on(t.farmId, t.servicedOn),
])
