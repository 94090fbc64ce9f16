#!/usr/bin/env node
// npm run db:backup [DIR] — pg_dump in custom format to a timestamped file.
import { spawnSync } from 'node:child_process'
import { mkdirSync } from 'node:fs'
import { resolve } from 'node:path'
import { root } from './lib/deps.mjs'
import { dbUp, findBinDir, localUrl } from './lib/pg.mjs'
import { suffix } from './lib/slot.mjs'

export function backup(url, dir) {
  mkdirSync(dir, { recursive: true })
  const stamp = new Date().toISOString().replace(/[:.]/g, '-')
  const file = resolve(dir, `rowbench-${stamp}.dump`)
  const r = spawnSync(`${findBinDir()}/pg_dump`, ['--format=custom', '--no-owner', '--file', file, url], { stdio: 'inherit' })
  if (r.status !== 0) throw new Error('pg_dump failed')
  return file
}

if (import.meta.url === `file://${process.argv[1]}`) {
  let url = process.env.DATABASE_URL
  if (!url) {
    dbUp()
    url = localUrl(`rowbench${suffix}`)
  }
  const file = backup(url, resolve(root, process.argv[2] || 'backups'))
  console.log(`[rowbench] backup written to ${file}`)
}
