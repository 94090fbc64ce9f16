import { describe, expect, inject, it } from 'vitest'
import { Client, createFarm, sql, TEST_PASSWORD } from './helpers'
import { startTestServer } from '../../scripts/lib/test-server.mjs'

// Signed-in list pages are answered from memory (server/utils/response-cache.ts). These tests prove
// the page is never staler than the change feed's delivery, whoever writes, and that nothing is
// kept while the feed cannot tell what changed.

interface Plate { id: number, code: string, quantityOnHand: number }

async function eventually<T>(probe: () => Promise<T>, ok: (value: T) => boolean, timeoutMs = 5_000): Promise<{ value: T, ms: number }> {
  const start = Date.now()
  let value = await probe()
  while (!ok(value)) {
    if (Date.now() - start > timeoutMs) throw new Error(`condition not met within ${timeoutMs} ms; last value ${JSON.stringify(value)}`)
    await new Promise((r) => setTimeout(r, 25))
    value = await probe()
  }
  return { value, ms: Date.now() - start }
}

async function farmWithPlate() {
  const farm = await createFarm()
  const foreman = await farm.as('foreman')
  const created = await foreman.post('/api/plates', { code: 'CACHE-30', crops: ['corn'], cellsPerPlate: 30, quantityOnHand: 2 })
  expect(created.status).toBe(201)
  return { farm, foreman, plate: created.data as Plate }
}

const cacheState = (r: { headers: Headers }) => r.headers.get('x-rowbench-cache')

describe('cached list pages', () => {
  it('every table carries the change trigger, so no write goes unheard', async () => {
    const missing = await sql<{ name: string }>(
      `select c.relname as name from pg_class c join pg_namespace n on n.oid = c.relnamespace
        where n.nspname = current_schema() and c.relkind in ('r', 'p')
          and not exists (select 1 from pg_trigger t where t.tgrelid = c.oid and t.tgname = 'rowbench_change')`)
    expect(missing).toEqual([])
    const [{ count }] = await sql<{ count: number }>(`select count(*)::int as count from pg_trigger where tgname = 'rowbench_change'`) as [{ count: number }]
    expect(count).toBeGreaterThanOrEqual(30)
  })

  it('answers a repeat read from memory with the same body, and an unchanged page with 304', async () => {
    const { foreman, plate } = await farmWithPlate()
    // The feed may still be reconnecting after an earlier test restarted PostgreSQL.
    await eventually(() => foreman.get('/api/plates'), (r) => cacheState(r) === 'hit')
    const first = await foreman.get('/api/plates')
    const second = await foreman.get('/api/plates')
    expect(cacheState(second)).toBe('hit')
    expect(second.data).toEqual(first.data)
    expect((second.data as Plate[]).map((p) => p.code)).toEqual([plate.code])
    expect(second.headers.get('content-type')).toMatch(/^application\/json/)
    expect(second.headers.get('cache-control')).toBe('private, no-cache')
    const etag = second.headers.get('etag')!
    expect(etag).toMatch(/^"[\w-]+"$/)
    const notModified = await fetch(`${inject('baseUrl')}/api/plates`, { headers: { 'cookie': foreman.cookie, 'if-none-match': etag } })
    expect(notModified.status).toBe(304)
    expect(notModified.headers.get('etag')).toBe(etag)
    expect(await notModified.text()).toBe('')
    // Another member's tag for the same address is not this page's: a full answer.
    const stale = await fetch(`${inject('baseUrl')}/api/plates`, { headers: { 'cookie': foreman.cookie, 'if-none-match': '"someone-elses"' } })
    expect(stale.status).toBe(200)
    expect(await stale.json()).toEqual(first.data)
  })

  it('shows a write through the app in the writer\'s next read, without waiting for the feed', async () => {
    const { foreman, plate } = await farmWithPlate()
    await eventually(() => foreman.get('/api/plates'), (r) => cacheState(r) === 'hit')
    for (let i = 1; i <= 5; i++) {
      expect((await foreman.patch(`/api/plates/${plate.id}`, { quantityOnHand: 10 + i })).status).toBe(200)
      const after = await foreman.get('/api/plates')
      expect((after.data as Plate[])[0]!.quantityOnHand).toBe(10 + i)
    }
    // A refused write leaves the data and answers alike.
    expect((await foreman.patch(`/api/plates/${plate.id}`, { quantityOnHand: -1 })).status).toBe(400)
    expect(((await foreman.get('/api/plates')).data as Plate[])[0]!.quantityOnHand).toBe(15)
  })

  it('shows a write made outside this instance (psql, a script, another instance) within moments', async () => {
    const { foreman, plate } = await farmWithPlate()
    await eventually(() => foreman.get('/api/plates'), (r) => cacheState(r) === 'hit')
    await sql('update seed_plates set quantity_on_hand = 7 where id = $1', [plate.id])
    const { ms } = await eventually(() => foreman.get('/api/plates'), (r) => (r.data as Plate[])[0]!.quantityOnHand === 7, 2_000)
    expect(ms).toBeLessThan(2_000)
    await sql('delete from seed_plates where id = $1', [plate.id])
    await eventually(() => foreman.get('/api/plates'), (r) => (r.data as Plate[]).length === 0, 2_000)
  })

  it('keeps pages apart per member and farm: nobody is served another\'s page', async () => {
    const { farm, foreman, plate } = await farmWithPlate()
    const other = await farmWithPlate()
    await eventually(() => foreman.get('/api/plates'), (r) => cacheState(r) === 'hit')
    const operator = await farm.as('operator')
    const mine = await operator.get('/api/plates')
    expect(cacheState(mine)).toBe('miss')
    expect((mine.data as Plate[]).map((p) => p.id)).toEqual([plate.id])
    const theirs = await other.foreman.get('/api/plates')
    expect((theirs.data as Plate[]).map((p) => p.id)).toEqual([other.plate.id])
    // The other farm's write reaches its own next read.
    expect((await other.foreman.patch(`/api/plates/${other.plate.id}`, { quantityOnHand: 3 })).status).toBe(200)
    expect((await other.foreman.get('/api/plates')).data).toMatchObject([{ quantityOnHand: 3 }])
    // Signed out, the page is a 401 whatever is kept.
    expect((await new Client().get('/api/plates')).status).toBe(401)
  })

  it('keeps nothing while the change feed is down, and resumes once it is back', async () => {
    const { foreman, plate } = await farmWithPlate()
    await eventually(() => foreman.get('/api/plates'), (r) => cacheState(r) === 'hit')
    const cut = await sql<{ ok: boolean }>(`select pg_terminate_backend(pid) as ok from pg_stat_activity where application_name = 'rowbench-change-feed' and datname = current_database()`)
    expect(cut.length).toBeGreaterThanOrEqual(1)
    const down = await eventually(() => foreman.get('/api/plates'), (r) => cacheState(r) === 'off' || cacheState(r) === 'miss', 2_000)
    expect(down.value.status).toBe(200)
    // Written while nobody listens: still seen at once.
    await sql('update seed_plates set quantity_on_hand = 9 where id = $1', [plate.id])
    expect(((await foreman.get('/api/plates')).data as Plate[])[0]!.quantityOnHand).toBe(9)
    const back = await eventually(() => foreman.get('/api/plates'), (r) => cacheState(r) === 'hit', 15_000)
    expect((back.value.data as Plate[])[0]!.quantityOnHand).toBe(9)
  }, 30_000)

  it('a member removed on one instance loses access on another at once, long before its role cache would expire', async () => {
    const databaseName = new URL(inject('databaseUrl')).pathname.slice(1)
    const other = await startTestServer({ database: databaseName, fresh: false, port: 3182, smtpPort: 2592, env: { ROWBENCH_ROLE_TTL_MS: '600000' } })
    try {
      const { farm } = await farmWithPlate()
      const owner = await farm.as('owner')
      const operatorThere = new Client(other.baseUrl)
      expect((await operatorThere.post('/api/auth/login', { email: farm.users.operator.email, password: TEST_PASSWORD })).status).toBe(200)
      await eventually(() => operatorThere.get('/api/plates'), (r) => cacheState(r) === 'hit', 15_000)
      const members = (await owner.get('/api/members')).data as { id: number, userId: number }[]
      const row = members.find((m) => m.userId === farm.users.operator.id)!
      expect((await owner.delete(`/api/members/${row.id}`)).status).toBe(200)
      const { ms } = await eventually(() => operatorThere.get('/api/plates'), (r) => r.status === 403, 2_000)
      expect(ms).toBeLessThan(2_000)
    } finally {
      await other.stop()
    }
  }, 60_000)

  it('notices a feed connection that hangs without closing, stops caching, and resumes when it answers again', async () => {
    const databaseName = new URL(inject('databaseUrl')).pathname.slice(1)
    const feeds = async () => (await sql<{ pid: number }>(`select pid from pg_stat_activity where application_name = 'rowbench-change-feed' and datname = current_database()`)).map((r) => r.pid)
    const before = new Set(await feeds())
    const other = await startTestServer({ database: databaseName, fresh: false, port: 3186, smtpPort: 2596, env: { ROWBENCH_FEED_HEARTBEAT_MS: '200', ROWBENCH_FEED_HEARTBEAT_TIMEOUT_MS: '500' } })
    let stopped: number | undefined
    try {
      const { farm } = await farmWithPlate()
      const foreman = new Client(other.baseUrl)
      expect((await foreman.post('/api/auth/login', { email: farm.users.foreman.email, password: TEST_PASSWORD })).status).toBe(200)
      await eventually(() => foreman.get('/api/plates'), (r) => cacheState(r) === 'hit', 15_000)
      const [pid] = (await feeds()).filter((p) => !before.has(p))
      expect(pid).toBeGreaterThan(0)
      // The backend stops answering but its socket stays open: no error, no close, only silence.
      process.kill(pid!, 'SIGSTOP')
      stopped = pid
      const { ms } = await eventually(() => foreman.get('/api/plates'), (r) => cacheState(r) === 'off', 5_000)
      expect(ms).toBeLessThan(5_000)
      process.kill(pid!, 'SIGCONT')
      stopped = undefined
      await eventually(() => foreman.get('/api/plates'), (r) => cacheState(r) === 'hit', 15_000)
    } finally {
      if (stopped) process.kill(stopped, 'SIGCONT')
      await other.stop()
    }
  }, 60_000)
})
