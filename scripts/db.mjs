#!/usr/bin/env node
// npm run db:up | db:stop — the project-local PostgreSQL cluster.
import { dbUp, dbStop, ensureDatabase, localUrl, PG_PORT } from './lib/pg.mjs'

const cmd = process.argv[2]
if (cmd === 'up') {
  if (process.env.DATABASE_URL) {
    console.log('[rowbench] DATABASE_URL is set; the local cluster is not used')
  } else {
    const { reused } = dbUp()
    ensureDatabase('rowbench')
    console.log(`[rowbench] PostgreSQL ${reused ? 'already running' : 'started'} on 127.0.0.1:${PG_PORT} (${localUrl('rowbench').replace(/:[^:@]+@/, ':***@')})`)
  }
} else if (cmd === 'stop') {
  console.log(dbStop() ? '[rowbench] PostgreSQL stopped' : '[rowbench] PostgreSQL was not running')
} else {
  console.error('usage: node scripts/db.mjs up|stop')
  process.exit(2)
}
