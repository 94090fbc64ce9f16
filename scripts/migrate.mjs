#!/usr/bin/env node
// Applies the committed drizzle-kit migrations. A failure stops the start with the reason.
import { drizzle } from 'drizzle-orm/node-postgres'
import { migrate } from 'drizzle-orm/node-postgres/migrator'
import pg from 'pg'
import { resolve } from 'node:path'
import { root } from './lib/deps.mjs'

export async function runMigrations(url) {
  const pool = new pg.Pool({ connectionString: url, max: 1 })
  try {
    await migrate(drizzle(pool), { migrationsFolder: resolve(root, 'server/db/migrations') })
  } finally {
    await pool.end()
  }
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const url = process.env.DATABASE_URL
  if (!url) {
    console.error('DATABASE_URL is required')
    process.exit(2)
  }
  runMigrations(url).then(() => console.log('[rowbench] migrations applied'), (err) => {
    console.error(`[rowbench] migration failed: ${err.message}`)
    process.exit(1)
  })
}
