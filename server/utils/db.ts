import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres'
import pg from 'pg'
import * as schema from '../db/schema'

export type Db = NodePgDatabase<typeof schema>
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0]

let pool: pg.Pool | undefined
let db: Db | undefined

// The one database handle. The pool survives a PostgreSQL restart: broken clients are dropped and
// new ones are made on the next query.
export function useDb(): Db {
  if (!db) {
    pool = new pg.Pool({
      connectionString: process.env.DATABASE_URL || useRuntimeConfig().databaseUrl,
      max: Number(process.env.ROWBENCH_DB_POOL || 10),
      connectionTimeoutMillis: 5_000,
      idleTimeoutMillis: 30_000,
    })
    pool.on('error', (err) => console.warn('[db] idle client error:', err.message))
    // A client in use when the server goes away emits its own error; the query that used it fails
    // and answers 503, and the pool replaces the client.
    pool.on('connect', (client) => client.on('error', (err) => console.warn('[db] client error:', err.message)))
    db = drizzle(pool, { schema, casing: 'snake_case' })
  }
  return db
}

export async function closeDb() {
  await pool?.end()
  pool = undefined
  db = undefined
}

export { schema }
