import { pgTable, text, integer, jsonb, index, uniqueIndex, timestamp } from 'drizzle-orm/pg-core'
import { id, timestamps } from './_columns'
import { farms, users } from './accounts'
import { planters } from './equipment'
import type { SetupConfig, SetupResults } from '../../../shared/types/setup'

// A setup is a named purpose for a planter; its content lives in immutable, numbered revisions.
export const setups = pgTable('setups', {
  id: id(),
  farmId: integer().notNull().references(() => farms.id, { onDelete: 'cascade' }),
  planterId: integer().notNull().references(() => planters.id, { onDelete: 'restrict' }),
  name: text().notNull(),
  crop: text().notNull(),
  latestRevision: integer().notNull().default(1),
  createdBy: integer().references(() => users.id, { onDelete: 'set null' }),
  // Which revision the planter has on it now (set when the shop marks a setup installed).
  installedRevision: integer(),
  installedAt: timestamp({ withTimezone: true }),
  ...timestamps,
}, (t) => [
  index('setups_farm_id_idx').on(t.farmId, t.id),
  index('setups_farm_updated_idx').on(t.farmId, t.updatedAt),
  index('setups_planter_idx').on(t.planterId),
])

export const setupRevisions = pgTable('setup_revisions', {
  id: id(),
  setupId: integer().notNull().references(() => setups.id, { onDelete: 'cascade' }),
  revision: integer().notNull(),
  config: jsonb().$type<SetupConfig>().notNull(),
  results: jsonb().$type<SetupResults>().notNull(),
  note: text(),
  savedBy: integer().references(() => users.id, { onDelete: 'set null' }),
  savedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
}, (t) => [uniqueIndex('setup_revisions_setup_rev_idx').on(t.setupId, t.revision)])

export const setupComments = pgTable('setup_comments', {
  id: id(),
  setupId: integer().notNull().references(() => setups.id, { onDelete: 'cascade' }),
  revision: integer(),
  userId: integer().references(() => users.id, { onDelete: 'set null' }),
  body: text().notNull(),
  ...timestamps,
}, (t) => [index('setup_comments_setup_idx').on(t.setupId, t.createdAt)])
