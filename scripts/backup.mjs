#!/usr/bin/env node
// npm run db:backup [DIR] — pg_dump in custom format to a timestamped file, and the uploaded files
// (NUXT_UPLOAD_DIR or .data/uploads) beside it as a tar.gz with the same timestamp.
import { spawnSync } from 'node:child_process'
import { existsSync, mkdirSync, rmSync } from 'node:fs'
import { resolve } from 'node:path'
import { root } from './lib/deps.mjs'
import { dbUp, findBinDir, localUrl } from './lib/pg.mjs'
import { suffix } from './lib/slot.mjs'
import { uploadsArchiveFor, uploadsDir } from './lib/uploads-dir.mjs'

// The dump is taken first, so every upload row it holds has its file in the archive taken after.
export function backup(url, dir, uploads = uploadsDir()) {
  mkdirSync(dir, { recursive: true })
  const stamp = new Date().toISOString().replace(/[:.]/g, '-')
  const file = resolve(dir, `rowbench-${stamp}.dump`)
  const r = spawnSync(`${findBinDir()}/pg_dump`, ['--format=custom', '--no-owner', '--file', file, url], { stdio: 'inherit' })
  if (r.status !== 0) throw new Error('pg_dump failed')
  // Uploads on object storage (NUXT_UPLOAD_STORAGE=config) are not on this disk; the bucket has its own backups.
  if (process.env.NUXT_UPLOAD_STORAGE === 'config' || !existsSync(uploads)) return { file, archive: null }
  const archive = uploadsArchiveFor(file)
  const t = spawnSync('tar', ['-czf', archive, '-C', uploads, '.'], { stdio: 'inherit' })
  if (t.status !== 0) {
    rmSync(archive, { force: true })
    throw new Error(`tar failed on ${uploads}; the database dump ${file} was written, the uploaded files were not`)
  }
  return { file, archive }
}

if (import.meta.url === `file://${process.argv[1]}`) {
  let url = process.env.DATABASE_URL
  if (!url) {
    dbUp()
    url = localUrl(`rowbench${suffix}`)
  }
  try {
    const { file, archive } = backup(url, resolve(root, process.argv[2] || 'backups'))
    console.log(`[rowbench] backup written to ${file}`)
    console.log(archive ? `[rowbench] uploaded files written to ${archive}` : `[rowbench] no uploads folder at ${uploadsDir()} (or uploads on object storage); only the database was backed up`)
  } catch (err) {
    console.error(`[rowbench] ${err.message}`)
    process.exit(1)
  }
}
