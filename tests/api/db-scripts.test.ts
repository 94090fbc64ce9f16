import { describe, expect, it } from 'vitest'
import { execFileSync } from 'node:child_process'
import { mkdtempSync, readFileSync, rmSync, chmodSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join, resolve } from 'node:path'

// The database scripts on a scratch cluster of their own (own port and folder), so the shared
// test cluster is never touched.
const root = resolve(import.meta.dirname, '../..')
const dir = mkdtempSync(join(tmpdir(), 'rowbench-pg-'))
chmodSync(dir, 0o755)
const env = { ...process.env, ROWBENCH_PG_PORT: '54388', ROWBENCH_PG_DIR: join(dir, 'cluster'), DATABASE_URL: '' }
const db = (cmd: string) => execFileSync(process.execPath, [join(root, 'scripts/db.mjs'), cmd], { env, encoding: 'utf8' })

describe('database scripts', () => {
  it('bring the cluster up twice, recover after a kill, and stop cleanly', () => {
    try {
      expect(db('up')).toMatch(/PostgreSQL started/)
      expect(db('up')).toMatch(/already running/)
      const pid = Number(readFileSync(join(dir, 'cluster/postgres/postmaster.pid'), 'utf8').split('\n')[0])
      process.kill(pid, 'SIGKILL')
      execFileSync('sleep', ['1'])
      expect(db('up')).toMatch(/PostgreSQL started/)
      expect(db('stop')).toMatch(/stopped/)
      expect(db('stop')).toMatch(/was not running/)
    } finally {
      try { db('stop') } catch { /* already stopped */ }
      rmSync(dir, { recursive: true, force: true })
    }
  }, 90_000)
})
