import { pgTable, text, integer, timestamp, jsonb, pgEnum, uniqueIndex, index } from 'drizzle-orm/pg-core'
import { id, timestamps } from './_columns'

export const roleEnum = pgEnum('role', ['owner', 'agronomist', 'operator', 'foreman'])

export const farms = pgTable('farms', {
  id: id(),
  name: text().notNull(),
  place: text(),
  ...timestamps,
})

export const users = pgTable('users', {
  id: id(),
  email: text().notNull(),
  name: text().notNull(),
  passwordHash: text(),
  ...timestamps,
}, (t) => [uniqueIndex('users_email_idx').on(t.email)])

export const memberships = pgTable('memberships', {
  id: id(),
  farmId: integer().notNull().references(() => farms.id, { onDelete: 'cascade' }),
  userId: integer().notNull().references(() => users.id, { onDelete: 'cascade' }),
  role: roleEnum().notNull(),
  ...timestamps,
}, (t) => [
  uniqueIndex('memberships_farm_user_idx').on(t.farmId, t.userId),
  index('memberships_user_idx').on(t.userId),
])

export const invitations = pgTable('invitations', {
  id: id(),
  farmId: integer().notNull().references(() => farms.id, { onDelete: 'cascade' }),
  email: text().notNull(),
  name: text().notNull(),
  role: roleEnum().notNull(),
  tokenHash: text().notNull(),
  invitedBy: integer().references(() => users.id, { onDelete: 'set null' }),
  expiresAt: timestamp({ withTimezone: true }).notNull(),
  acceptedAt: timestamp({ withTimezone: true }),
  ...timestamps,
}, (t) => [uniqueIndex('invitations_token_idx').on(t.tokenHash), index('invitations_farm_idx').on(t.farmId)])

export const passwordResets = pgTable('password_resets', {
  id: id(),
  userId: integer().notNull().references(() => users.id, { onDelete: 'cascade' }),
  tokenHash: text().notNull(),
  expiresAt: timestamp({ withTimezone: true }).notNull(),
  usedAt: timestamp({ withTimezone: true }),
  ...timestamps,
}, (t) => [uniqueIndex('password_resets_token_idx').on(t.tokenHash)])

export const auditLog = pgTable('audit_log', {
  id: id(),
  farmId: integer().references(() => farms.id, { onDelete: 'cascade' }),
  userId: integer().references(() => users.id, { onDelete: 'set null' }),
  action: text().notNull(),
  entity: text().notNull(),
  entityId: integer(),
  before: jsonb(),
  after: jsonb(),
  at: timestamp({ withTimezone: true }).notNull().defaultNow(),
}, (t) => [index('audit_log_farm_at_idx').on(t.farmId, t.at), index('audit_log_entity_idx').on(t.entity, t.entityId)])

// Outgoing mail waits here until the SMTP server takes it; a failed send is retried later.
export const outbox = pgTable('outbox', {
  id: id(),
  farmId: integer().references(() => farms.id, { onDelete: 'set null' }),
  to: text().notNull(),
  subject: text().notNull(),
  text: text().notNull(),
  html: text(),
  attachments: jsonb().$type<{ filename: string, contentBase64: string, contentType: string }[]>(),
  attempts: integer().notNull().default(0),
  lastError: text(),
  sentAt: timestamp({ withTimezone: true }),
  nextAttemptAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  ...timestamps,
}, (t) => [index('outbox_pending_idx').on(t.sentAt, t.nextAttemptAt)])
