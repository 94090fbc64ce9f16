import { Hash } from '@adonisjs/hash'
import { Scrypt } from '@adonisjs/hash/drivers/scrypt'
import * as schema from '../../server/db/schema'
import type { SeedDb } from './index'

export const DEMO_PASSWORD = 'rowbench-demo'

// Same hasher and defaults as nuxt-auth-utils' hashPassword.
const hasher = new Hash(new Scrypt({}))

export async function seedAccounts(db: SeedDb) {
  const passwordHash = await hasher.make(DEMO_PASSWORD)
  const [farm] = await db.insert(schema.farms).values({ name: 'Cottonwood Flats Farm', place: 'Harlan Creek bottoms' }).returning()
  const [second] = await db.insert(schema.farms).values({ name: 'Sandridge Acres', place: 'Upper Pell township' }).returning()
  const people = [
    { email: 'owner@demo.test', name: 'Dana Whitfield', role: 'owner' as const },
    { email: 'agronomist@demo.test', name: 'Priya Okafor', role: 'agronomist' as const },
    { email: 'operator@demo.test', name: 'Luis Brandt', role: 'operator' as const },
    { email: 'foreman@demo.test', name: 'Marty Kessler', role: 'foreman' as const },
  ]
  const users = await db.insert(schema.users).values(people.map((p) => ({ email: p.email, name: p.name, passwordHash }))).returning()
  const byEmail = Object.fromEntries(users.map((u) => [u.email, u]))
  await db.insert(schema.memberships).values([
    ...people.map((p) => ({ farmId: farm!.id, userId: byEmail[p.email]!.id, role: p.role })),
    { farmId: second!.id, userId: byEmail['owner@demo.test']!.id, role: 'owner' as const },
    { farmId: second!.id, userId: byEmail['agronomist@demo.test']!.id, role: 'agronomist' as const },
  ])
  return {
    farm: farm!,
    secondFarm: second!,
    owner: byEmail['owner@demo.test']!,
    agronomist: byEmail['agronomist@demo.test']!,
    operator: byEmail['operator@demo.test']!,
    foreman: byEmail['foreman@demo.test']!,
  }
}
