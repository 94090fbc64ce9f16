import { describe, expect, inject, it } from 'vitest'
import { existsSync } from 'node:fs'
import { join } from 'node:path'
import { Client, createFarm, sql } from './helpers'
import { startTestServer } from '../../scripts/lib/test-server.mjs'
import { UPLOAD_REFERENCES } from '../../server/db/schema'

// Files no record names are removed a day after they were sent (server/plugins/upload-sweep.ts).
// A second instance sweeps every 250 ms here; "a day ago" is made by moving created_at back.

const PNG = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d, 0x49, 0x48, 0x44, 0x52])

async function eventually(ok: () => Promise<boolean>, timeoutMs = 5_000) {
  const until = Date.now() + timeoutMs
  while (!(await ok())) {
    if (Date.now() > until) throw new Error(`not within ${timeoutMs} ms`)
    await new Promise((r) => setTimeout(r, 50))
  }
}

describe('orphan upload sweep', () => {
  it('every column that names uploads is one the sweep looks at', async () => {
    const columns = await sql<{ ref: string }>(
      `select table_name || '.' || column_name as ref from information_schema.columns
        where table_schema = current_schema() and column_name ~ 'upload_ids?$' order by 1`)
    expect(columns.map((c) => c.ref)).toEqual([...UPLOAD_REFERENCES].sort())
  })

  it('removes a day-old file no record names, row and bytes, and keeps every named or recent one', async () => {
    const databaseName = new URL(inject('databaseUrl')).pathname.slice(1)
    const other = await startTestServer({ database: databaseName, fresh: false, port: 3184, smtpPort: 2594, env: { ROWBENCH_UPLOAD_SWEEP_MS: '250' } })
    try {
      const farm = await createFarm()
      const operator = new Client(other.baseUrl)
      expect((await operator.post('/api/auth/login', { email: farm.users.operator.email, password: 'test-password-123' })).status).toBe(200)
      const send = async (body: Uint8Array | string, name: string) => {
        const res = await fetch(`${other.baseUrl}/api/uploads?name=${name}`, { method: 'POST', headers: { cookie: operator.cookie }, body: typeof body === 'string' ? body : new Blob([body as Uint8Array<ArrayBuffer>]) })
        expect(res.status).toBe(201)
        return ((await res.json()) as { id: number }).id
      }
      const onItem = await send(PNG, 'chain.png')
      const onCheck = await send(PNG, 'dig.png')
      const csv = await send('spacing\n6.1\n5.9\n', 'row6.csv')
      const orphan = await send(PNG, 'forgotten.png')
      const recent = await send(PNG, 'just-taken.png')
      const [planter] = await sql<{ id: number }>(`insert into planters (farm_id, name, frame_kind, row_count, row_spacing_in, wheel_circumference_in)
        values ($1, 'Sweep planter', 'mounted', 4, 30, 86) returning id`, [farm.farmId])
      const [inspection] = await sql<{ id: number }>(`insert into inspections (farm_id, planter_id, template_name) values ($1, $2, 'Sweep check') returning id`, [farm.farmId, planter!.id])
      await sql(`insert into inspection_items (inspection_id, position, area, label, photo_upload_ids) values ($1, 1, 'Drive', 'Chains', $2)`, [inspection!.id, [onItem]])
      const [check] = await sql<{ id: number }>(`insert into field_checks (farm_id, kind, rows, checked_on, inputs, results, csv_upload_id, photo_upload_ids)
        values ($1, 'spacing', '{6}', '2026-05-18', '{}', '{}', $2, $3) returning id`, [farm.farmId, csv, [onCheck]])
      await sql(`update uploads set created_at = now() - interval '25 hours' where id = any($1::int[])`, [[onItem, onCheck, csv, orphan]])
      const keys = Object.fromEntries((await sql<{ id: number, storage_key: string }>('select id, storage_key from uploads where id = any($1::int[])', [[onItem, onCheck, csv, orphan, recent]])).map((r) => [r.id, r.storage_key]))
      const onDisk = (id: number) => existsSync(join(other.uploads, ...keys[id]!.split(':')))
      expect([onItem, onCheck, csv, orphan, recent].every(onDisk)).toBe(true)

      const left = async () => (await sql<{ id: number }>('select id from uploads where id = any($1::int[]) order by id', [[onItem, onCheck, csv, orphan, recent]])).map((r) => r.id)
      await eventually(async () => !(await left()).includes(orphan))
      expect(await left()).toEqual([onItem, onCheck, csv, recent])
      expect(onDisk(orphan)).toBe(false)
      expect([onItem, onCheck, csv, recent].every(onDisk)).toBe(true)
      expect((await operator.get(`/api/uploads/${orphan}`)).status).toBe(404)
      const [audit] = await sql<{ user_id: number | null, action: string }>(`select user_id, action from audit_log where entity = 'upload' and entity_id = $1 and action = 'delete'`, [orphan])
      expect(audit).toEqual({ user_id: null, action: 'delete' })

      // Taking the photo off the check leaves it unnamed: it goes on the next sweep; the CSV stays.
      await sql(`update field_checks set photo_upload_ids = '{}' where id = $1`, [check!.id])
      await eventually(async () => !(await left()).includes(onCheck))
      expect(await left()).toEqual([onItem, csv, recent])
      expect(onDisk(onCheck)).toBe(false)
    } finally {
      await other.stop()
    }
  }, 60_000)
})
