// Demo data: an invented farm and season. Runs at start when the database has no farms.
import { drizzle } from 'drizzle-orm/node-postgres'
import pg from 'pg'
import * as schema from '../../server/db/schema'
import { seedAccounts } from './accounts'
import { seedEquipment } from './equipment'
import { seedFields } from './fields'
import { seedPlans } from './plans'
import { seedShop } from './shop'
import { seedChecks } from './checks'
import { seedApplications } from './applications'

export type SeedDb = ReturnType<typeof drizzle<typeof schema>>

export async function seedDemo(url: string) {
  const pool = new pg.Pool({ connectionString: url, max: 2 })
  const db = drizzle(pool, { schema, casing: 'snake_case' })
  try {
    const existing = await db.select({ id: schema.farms.id }).from(schema.farms).limit(1)
    if (existing.length) return false
    await db.transaction(async (tx) => {
      const accounts = await seedAccounts(tx as unknown as SeedDb)
      const equipment = await seedEquipment(tx as unknown as SeedDb, accounts)
      const made = await seedFields(tx as unknown as SeedDb, accounts)
      await seedPlans(tx as unknown as SeedDb, accounts, equipment, made)
      await seedShop(tx as unknown as SeedDb, accounts)
      await seedChecks(tx as unknown as SeedDb, accounts)
      await seedApplications(tx as unknown as SeedDb, accounts)
    })
    return true
  } finally {
    await pool.end()
  }
}
