import { timestamp, integer } from 'drizzle-orm/pg-core'

// Columns every table carries.
export const id = () => integer().primaryKey().generatedAlwaysAsIdentity()
export const timestamps = {
  createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow().$onUpdate(() => new Date()),
}
