import { describe, expect, it } from 'vitest'
import { execFileSync } from 'node:child_process'
import { mkdtempSync, readdirSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join, resolve } from 'node:path'
import pg from 'pg'
import { createFarm, sql } from './helpers'
import { localUrl, psql } from '../../scripts/lib/pg.mjs'

const root = resolve(import.meta.dirname, '../..')

async function counts(url: string) {
  const client = new pg.Client({ connectionString: url })
  await client.connect()
  try {
    const tables = ['farms', 'users', 'memberships', 'audit_log', 'planters', 'setups', 'setup_revisions']
    const out: Record<string, number> = {}
    for (const t of tables) out[t] = Number((await client.query(`select count(*) from ${t}`)).rows[0].count)
    out.farmNames = ((await client.query('select string_agg(name, \',\' order by id) as n from farms')).rows[0].n ?? '').length
    return out
  } finally {
    await client.end()
  }
}

describe('backup and restore', () => {
  it('writes a custom-format dump and restores it into a scratch database with the same rows', async () => {
    await createFarm()
    const [row] = await sql<{ name: string }>('select current_database() as name')
    const source = localUrl(row!.name)
    const dir = mkdtempSync(join(tmpdir(), 'rowbench-backup-'))
    const scratch = `rowbench_restore_${process.pid}`
    try {
      const env = { ...process.env, DATABASE_URL: source }
      execFileSync(process.execPath, [join(root, 'scripts/backup.mjs'), dir], { env, stdio: 'pipe' })
      const files = readdirSync(dir)
      expect(files).toHaveLength(1)
      expect(files[0]).toMatch(/^rowbench-\d{4}-\d{2}-\d{2}T[\d-]+Z\.dump$/)
      psql('postgres', `DROP DATABASE IF EXISTS "${scratch}" WITH (FORCE)`)
      psql('postgres', `CREATE DATABASE "${scratch}"`)
      execFileSync(process.execPath, [join(root, 'scripts/restore.mjs'), join(dir, files[0]!)], { env: { ...process.env, DATABASE_URL: localUrl(scratch) }, stdio: 'pipe' })
      expect(await counts(localUrl(scratch))).toEqual(await counts(source))
    } finally {
      psql('postgres', `DROP DATABASE IF EXISTS "${scratch}" WITH (FORCE)`)
      rmSync(dir, { recursive: true, force: true })
    }
  }, 60_000)
})
