#!/usr/bin/env node
// npm run db:restore FILE — restores a custom-format dump, replacing what the database holds.
import { spawnSync } from 'node:child_process'
import { existsSync } from 'node:fs'
import { dbUp, findBinDir, localUrl } from './lib/pg.mjs'
import { suffix } from './lib/slot.mjs'

export function restore(url, file) {
  if (!existsSync(file)) throw new Error(`no such backup file: ${file}`)
  const r = spawnSync(`${findBinDir()}/pg_restore`, ['--clean', '--if-exists', '--no-owner', '--single-transaction', '--exit-on-error', '--dbname', url, file], { stdio: 'inherit' })
  if (r.status !== 0) throw new Error('pg_restore failed; the database is unchanged (single transaction)')
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const file = process.argv[2]
  if (!file) {
    console.error('usage: npm run db:restore FILE')
    process.exit(2)
  }
  let url = process.env.DATABASE_URL
  if (!url) {
    dbUp()
    url = localUrl(`rowbench${suffix}`)
  }
  try {
    restore(url, file)
    console.log(`[rowbench] restored ${file}`)
  } catch (err) {
    console.error(`[rowbench] ${err.message}`)
    process.exit(1)
  }
}
