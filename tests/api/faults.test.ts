import { describe, expect, inject, it } from 'vitest'
import { Client, createFarm, sql, TEST_PASSWORD } from './helpers'
import { dbRestart } from '../../scripts/lib/pg.mjs'
import { startTestServer } from '../../scripts/lib/test-server.mjs'
import { startFakeSmtp } from '../../scripts/lib/fake-smtp.mjs'
import { mkdtempSync, readdirSync } from 'node:fs'
import pg from 'pg'
import { tmpdir } from 'node:os'
import { join } from 'node:path'

const databaseName = () => new URL(inject('databaseUrl')).pathname.slice(1)

describe('faults', () => {
  it('survives a PostgreSQL restart while requests run: 503s with a retry hint, every acknowledged write kept', async () => {
    const farm = await createFarm()
    const foreman = await farm.as('foreman')
    const acknowledged: string[] = []
    const statuses: number[] = []
    let n = 0
    let stop = false
    const worker = async () => {
      while (!stop) {
        const code = `F-${process.pid}-${n++}`
        const res = await foreman.post('/api/plates', { code, crops: ['corn'], cellsPerPlate: 30, quantityOnHand: 1 }).catch(() => ({ status: 0, data: null }))
        statuses.push(res.status)
        if (res.status === 201) acknowledged.push(code)
        if (res.status === 503) expect(res.data.message).toMatch(/retry/i)
      }
    }
    const workers = [worker(), worker(), worker()]
    await new Promise((r) => setTimeout(r, 400))
    dbRestart()
    await new Promise((r) => setTimeout(r, 1500))
    stop = true
    await Promise.all(workers)
    expect(statuses.filter((s) => ![201, 503].includes(s))).toEqual([])
    expect(statuses).toContain(201)
    // The app recovered without a restart of its own.
    const after = await foreman.post('/api/plates', { code: `F-${process.pid}-after`, crops: ['corn'], cellsPerPlate: 30 })
    expect(after.status).toBe(201)
    const stored = await sql<{ code: string }>('select code from seed_plates where farm_id = $1', [farm.farmId])
    const codes = new Set(stored.map((r) => r.code))
    expect(acknowledged.filter((c) => !codes.has(c))).toEqual([])
    // No half-written row: every stored plate has its audit entry from the same transaction.
    const [orphans] = await sql<{ n: number }>(`select count(*)::int as n from seed_plates p where p.farm_id = $1 and not exists (select 1 from audit_log a where a.entity = 'seed_plate' and a.entity_id = p.id)`, [farm.farmId])
    expect(orphans!.n).toBe(0)
  }, 60_000)

  it('keeps mail in the outbox while SMTP is down and delivers it when it is back', async () => {
    const smtpPort = 2580 + (process.pid % 10)
    // A database of its own, so no other instance's outbox delivers the message meanwhile.
    const server = await startTestServer({ database: `${databaseName()}_mail`, port: 3180, smtpPort, smtp: false, env: { ROWBENCH_OUTBOX_INTERVAL_MS: '300' } })
    const pool = new pg.Pool({ connectionString: server.databaseUrl, max: 2 })
    const query = async <T>(text: string, params: unknown[] = []) => (await pool.query(text, params)).rows as T[]
    try {
      const farm = await createFarm(query as typeof sql, () => new Client(server.baseUrl))
      const owner = await farm.as('owner')
      const email = `outbox-${Date.now()}@test.example`
      const inv = await owner.post('/api/members/invite', { email, name: 'Olive Outbox', role: 'operator' })
      expect(inv.status).toBe(201)
      await new Promise((r) => setTimeout(r, 800))
      const [waiting] = await query<{ sent_at: string | null, attempts: number, last_error: string | null }>('select sent_at, attempts, last_error from outbox where "to" = $1', [email])
      expect(waiting!.sent_at).toBeNull()
      expect(waiting!.attempts).toBeGreaterThan(0)
      expect(waiting!.last_error).toBeTruthy()
      // Back-off is 10 s after the first failure; make it due now and bring SMTP up.
      await query('update outbox set next_attempt_at = now() where "to" = $1', [email])
      const dir = mkdtempSync(join(tmpdir(), 'rowbench-late-smtp-'))
      const smtp = await startFakeSmtp({ port: smtpPort, dir })
      try {
        let delivered = false
        for (let i = 0; i < 40 && !delivered; i++) {
          await new Promise((r) => setTimeout(r, 250))
          const [row] = await query<{ sent_at: string | null }>('select sent_at from outbox where "to" = $1', [email])
          delivered = !!row!.sent_at
        }
        expect(delivered).toBe(true)
        expect(readdirSync(dir).length).toBeGreaterThan(0)
      } finally {
        await new Promise((r) => smtp.close(r))
      }
    } finally {
      await pool.end()
      await server.stop()
    }
  }, 60_000)

  it('a removed member loses access at once here and within seconds on another instance', async () => {
    const other = await startTestServer({ database: databaseName(), fresh: false, port: 3181, smtpPort: 2591, env: { ROWBENCH_ROLE_TTL_MS: '1000' } })
    try {
      const farm = await createFarm()
      const ownerHere = await farm.as('owner')
      const operatorHere = await farm.as('operator')
      const operatorThere = new Client(other.baseUrl)
      await operatorThere.post('/api/auth/login', { email: farm.users.operator.email, password: TEST_PASSWORD })
      expect((await operatorHere.get('/api/planters')).status).toBe(200)
      expect((await operatorThere.get('/api/planters')).status).toBe(200)
      const members = (await ownerHere.get('/api/members')).data as { id: number, userId: number }[]
      const row = members.find((m) => m.userId === farm.users.operator.id)!
      expect((await ownerHere.delete(`/api/members/${row.id}`)).status).toBe(200)
      expect((await operatorHere.get('/api/planters')).status).toBe(403)
      await new Promise((r) => setTimeout(r, 1200))
      expect((await operatorThere.get('/api/planters')).status).toBe(403)
    } finally {
      await other.stop()
    }
  }, 60_000)
})
