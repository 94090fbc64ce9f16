import { describe, expect, inject, it } from 'vitest'
import { execFileSync } from 'node:child_process'
import { copyFileSync, existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join, relative, resolve } from 'node:path'
import pg from 'pg'
import { baseUrl, createFarm, sql } from './helpers'
import { localUrl, psql } from '../../scripts/lib/pg.mjs'

const root = resolve(import.meta.dirname, '../..')

async function counts(url: string) {
  const client = new pg.Client({ connectionString: url })
  await client.connect()
  try {
    const tables = ['farms', 'users', 'memberships', 'audit_log', 'planters', 'setups', 'setup_revisions', 'uploads']
    const out: Record<string, number> = {}
    for (const t of tables) out[t] = Number((await client.query(`select count(*) from ${t}`)).rows[0].count)
    out.farmNames = ((await client.query('select string_agg(name, \',\' order by id) as n from farms')).rows[0].n ?? '').length
    return out
  } finally {
    await client.end()
  }
}

// Every file under a folder as relative path → bytes (base64), however deep the storage driver nests them.
function tree(dir: string): Record<string, string> {
  const out: Record<string, string> = {}
  const walk = (d: string) => {
    for (const e of readdirSync(d, { withFileTypes: true })) {
      if (e.isDirectory()) walk(join(d, e.name))
      else out[relative(dir, join(d, e.name))] = readFileSync(join(d, e.name)).toString('base64')
    }
  }
  if (existsSync(dir)) walk(dir)
  return out
}

describe('backup and restore', () => {
  it('writes a custom-format dump and the uploaded files with the same timestamp, and restores both', async () => {
    const farm = await createFarm()
    // An uploaded photo, through the API, into the test server's uploads folder.
    const photo = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52, 7, 7, 7])
    const owner = await farm.as('owner')
    const res = await fetch(`${baseUrl()}/api/uploads?kind=photo&name=dig.png`, { method: 'POST', headers: { cookie: owner.cookie }, body: new Blob([photo]) })
    expect(res.status).toBe(201)
    const uploadId = (await res.json() as { id: number }).id
    const [up] = await sql<{ storage_key: string }>('select storage_key from uploads where id = $1', [uploadId])
    // The file-system driver keeps key a:b at a/b.
    const photoPath = up!.storage_key.replace(/:/g, '/')
    const sourceUploads = inject('uploadsDir')
    expect(readFileSync(join(sourceUploads, photoPath))).toEqual(Buffer.from(photo))

    const [row] = await sql<{ name: string }>('select current_database() as name')
    const source = localUrl(row!.name)
    const dir = mkdtempSync(join(tmpdir(), 'rowbench-backup-'))
    const restoredUploads = join(dir, 'restored', 'uploads')
    const scratch = `rowbench_restore_${process.pid}`
    try {
      const env = { ...process.env, DATABASE_URL: source, NUXT_UPLOAD_DIR: sourceUploads }
      execFileSync(process.execPath, [join(root, 'scripts/backup.mjs'), dir], { env, stdio: 'pipe' })
      const files = readdirSync(dir).filter((f) => f.startsWith('rowbench-')).sort()
      expect(files).toHaveLength(2)
      const [dump, archive] = files as [string, string]
      expect(dump).toMatch(/^rowbench-\d{4}-\d{2}-\d{2}T[\d-]+Z\.dump$/)
      expect(archive).toBe(dump.replace(/\.dump$/, '.uploads.tar.gz'))
      const listed = execFileSync('tar', ['-tzf', join(dir, archive)], { encoding: 'utf8' }).split('\n')
      expect(listed).toContain(`./${photoPath}`)

      // A stale file in the target folder is gone after the restore; the folder holds what was backed up.
      mkdirSync(restoredUploads, { recursive: true })
      writeFileSync(join(restoredUploads, 'stale.txt'), 'not in the backup')
      psql('postgres', `DROP DATABASE IF EXISTS "${scratch}" WITH (FORCE)`)
      psql('postgres', `CREATE DATABASE "${scratch}"`)
      const restoreEnv = { ...process.env, DATABASE_URL: localUrl(scratch), NUXT_UPLOAD_DIR: restoredUploads }
      const out = execFileSync(process.execPath, [join(root, 'scripts/restore.mjs'), join(dir, dump)], { env: restoreEnv, encoding: 'utf8' })
      expect(out).toContain(`restored the uploaded files from ${join(dir, archive)}`)
      expect(await counts(localUrl(scratch))).toEqual(await counts(source))
      expect(readFileSync(join(restoredUploads, photoPath))).toEqual(Buffer.from(photo))
      expect(existsSync(join(restoredUploads, 'stale.txt'))).toBe(false)
      expect(tree(restoredUploads)).toEqual(tree(sourceUploads))
      expect(readdirSync(join(dir, 'restored'))).toEqual(['uploads'])

      // A dump with no archive beside it restores the database and leaves the uploads folder alone.
      const alone = join(dir, 'alone')
      mkdirSync(alone)
      copyFileSync(join(dir, dump), join(alone, dump))
      writeFileSync(join(restoredUploads, 'kept.txt'), 'still here')
      const outAlone = execFileSync(process.execPath, [join(root, 'scripts/restore.mjs'), join(alone, dump)], { env: restoreEnv, encoding: 'utf8' })
      expect(outAlone).toContain('no uploads archive beside it')
      expect(readFileSync(join(restoredUploads, 'kept.txt'), 'utf8')).toBe('still here')
      expect(readFileSync(join(restoredUploads, photoPath))).toEqual(Buffer.from(photo))

      // A broken archive is refused before anything is restored.
      const broken = join(dir, 'broken')
      mkdirSync(broken)
      copyFileSync(join(dir, dump), join(broken, dump))
      writeFileSync(join(broken, archive), 'not a tar file')
      let failure = ''
      try {
        execFileSync(process.execPath, [join(root, 'scripts/restore.mjs'), join(broken, dump)], { env: restoreEnv, encoding: 'utf8', stdio: 'pipe' })
      } catch (err) {
        failure = String((err as { stderr?: string }).stderr)
      }
      expect(failure).toContain('could not be read; nothing was restored')
      expect(readFileSync(join(restoredUploads, 'kept.txt'), 'utf8')).toBe('still here')
      expect(readdirSync(join(dir, 'restored'))).toEqual(['uploads'])
    } finally {
      psql('postgres', `DROP DATABASE IF EXISTS "${scratch}" WITH (FORCE)`)
      rmSync(dir, { recursive: true, force: true })
    }
  }, 90_000)
})
