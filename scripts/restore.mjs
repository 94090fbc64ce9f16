#!/usr/bin/env node
// npm run db:restore FILE — restores a custom-format dump, replacing what the database holds, and
// when FILE's uploads archive (rowbench-<stamp>.uploads.tar.gz) lies beside it, the uploads folder.
import { spawnSync } from 'node:child_process'
import { existsSync, mkdirSync, renameSync, rmSync } from 'node:fs'
import { dirname } from 'node:path'
import { dbUp, findBinDir, localUrl } from './lib/pg.mjs'
import { suffix } from './lib/slot.mjs'
import { uploadsArchiveFor, uploadsDir } from './lib/uploads-dir.mjs'

// The archive is unpacked beside the folder first, so a broken archive changes nothing; the folder
// is swapped only after the database restored.
export function restore(url, file, uploads = uploadsDir()) {
  if (!existsSync(file)) throw new Error(`no such backup file: ${file}`)
  const archive = uploadsArchiveFor(file)
  const staged = existsSync(archive) ? `${uploads}.restoring-${process.pid}` : null
  if (staged) {
    rmSync(staged, { recursive: true, force: true })
    mkdirSync(staged, { recursive: true })
    const t = spawnSync('tar', ['-xzf', archive, '-C', staged, '--no-same-owner'], { stdio: 'inherit' })
    if (t.status !== 0) {
      rmSync(staged, { recursive: true, force: true })
      throw new Error(`the uploads archive ${archive} could not be read; nothing was restored`)
    }
  }
  const r = spawnSync(`${findBinDir()}/pg_restore`, ['--clean', '--if-exists', '--no-owner', '--single-transaction', '--exit-on-error', '--dbname', url, file], { stdio: 'inherit' })
  if (r.status !== 0) {
    if (staged) rmSync(staged, { recursive: true, force: true })
    throw new Error('pg_restore failed; the database and the uploads folder are unchanged (single transaction)')
  }
  if (!staged) return { archive: null }
  const old = `${uploads}.replaced-${process.pid}`
  mkdirSync(dirname(uploads), { recursive: true })
  if (existsSync(uploads)) renameSync(uploads, old)
  renameSync(staged, uploads)
  rmSync(old, { recursive: true, force: true })
  return { archive }
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
    const { archive } = restore(url, file)
    console.log(`[rowbench] restored ${file}`)
    console.log(archive ? `[rowbench] restored the uploaded files from ${archive} into ${uploadsDir()}` : '[rowbench] no uploads archive beside it; the uploads folder was left as it was')
  } catch (err) {
    console.error(`[rowbench] ${err.message}`)
    process.exit(1)
  }
}
