#!/usr/bin/env node
// Throughput on loopback with autocannon (50 connections): the health route beside a signed-in
// calculator and signed-in lists of setups, on the same server in the same run. The routes take
// turns over several rounds so a busy machine weighs on all of them alike; the ratio is the figure.
// Lists are answered from memory until a write drops them; the last row writes a setup from another
// connection every WRITE_EVERY_MS meanwhile, so each write's notification empties the cache.
import autocannon from 'autocannon'
import pg from 'pg'
import { benchMember, benchServer, printTable, signIn } from './lib.mjs'

const seconds = Number(process.env.BENCH_SECONDS || 10)
const rounds = Number(process.env.BENCH_ROUNDS || 2)
const WRITE_EVERY_MS = 50
const meterBody = JSON.stringify({ wheelCircumferenceIn: 86.4, slipPercent: 3, stages: [{ driverTeeth: 21, drivenTeeth: 19 }, { driverTeeth: 17, drivenTeeth: 26 }], meterRatio: 1, cellsPerPlate: 30, rowSpacingIn: 30, speedMph: 5 })

await measure('list pages kept in memory', {}, (base, cookie) => [
  { route: 'GET /api/health', opts: { url: `${base}/api/health` } },
  { route: 'POST /api/calc/meter (signed in)', opts: { url: `${base}/api/calc/meter`, method: 'POST', body: meterBody, headers: { cookie, 'content-type': 'application/json' } } },
  { route: 'GET /api/setups, 10 rows (signed in)', opts: { url: `${base}/api/setups?limit=10`, headers: { cookie } } },
  { route: 'GET /api/setups, 50 rows (signed in)', opts: { url: `${base}/api/setups?limit=50`, headers: { cookie } } },
  { route: `GET /api/setups, 50 rows, a write every ${WRITE_EVERY_MS} ms`, opts: { url: `${base}/api/setups?limit=50`, headers: { cookie } }, writes: true },
])
// The same list from the database on every request, for comparison (ROWBENCH_RESPONSE_CACHE=off).
await measure('list cache off', { ROWBENCH_RESPONSE_CACHE: 'off' }, (base, cookie) => [
  { route: 'GET /api/health', opts: { url: `${base}/api/health` } },
  { route: 'GET /api/setups, 50 rows (signed in), from the database', opts: { url: `${base}/api/setups?limit=50`, headers: { cookie } } },
])

async function measure(title, env, targetsFor) {
  const server = await benchServer('http', env)
  try {
    const member = await benchMember(server.databaseUrl)
    await seedSetups(server.databaseUrl, member, 60)
    const cookie = await signIn(server.baseUrl, member.email, member.password)
    const targets = targetsFor(server.baseUrl, cookie)
    const writer = new pg.Pool({ connectionString: server.databaseUrl, max: 1 })
    let writes = 0
    const samples = new Map(targets.map((t) => [t.route, []]))
    for (let round = 0; round < rounds; round++) {
      for (const t of targets) {
        const timer = t.writes ? setInterval(() => { writes++; writer.query(`update setups set updated_at = now() where farm_id = $1 and id = (select max(id) from setups where farm_id = $1)`, [member.farmId]) }, WRITE_EVERY_MS) : undefined
        samples.get(t.route).push(await autocannon({ ...t.opts, connections: 50, duration: seconds / rounds }))
        clearInterval(timer)
      }
    }
    await writer.end()
    const mean = (xs) => xs.reduce((a, b) => a + b, 0) / xs.length
    const healthRps = mean(samples.get(targets[0].route).map((r) => r.requests.average))
    printTable(`HTTP throughput, ${title}: 50 connections, ${seconds} s per route in ${rounds} turns${writes ? ` (${writes} writes during the last row)` : ''}`, targets.map((t) => {
      const rs = samples.get(t.route)
      const rps = mean(rs.map((r) => r.requests.average))
      return {
        'route': t.route,
        'req/s': Math.round(rps),
        'p50 ms': Math.max(...rs.map((r) => r.latency.p50)),
        'p99 ms': Math.max(...rs.map((r) => r.latency.p99)),
        'non2xx': rs.reduce((n, r) => n + r.non2xx, 0),
        'vs health': `${Math.round((rps / healthRps) * 100)} %`,
      }
    }))
  } finally {
    await server.stop()
  }
}

// A farm's worth of setups, so the list route returns a full page.
async function seedSetups(databaseUrl, member, count) {
  const pool = new pg.Pool({ connectionString: databaseUrl, max: 1 })
  const { rows: [planter] } = await pool.query(
    `insert into planters (farm_id, name, frame_kind, row_count, row_spacing_in, wheel_circumference_in)
     values ($1, 'Bench planter', 'folding', 12, 30, 86.4) returning id`, [member.farmId])
  const config = { crop: 'corn', targetSeedsPerAcre: 34000, rowSpacingIn: 30, speedMph: 5, wheelCircumferenceIn: 86.4, slipPercent: 3, meterRatio: 1, sections: [], rowUnits: [] }
  const results = { sections: [], seedsPerAcre: 34000, seedSpacingIn: 6.15, errorPercent: 0, checkLengthFt: 17.42, warnings: [] }
  await pool.query(`insert into setups (farm_id, planter_id, name, crop, latest_revision, created_by)
    select $1, $2, 'Bench setup ' || g, 'corn', 1, $3 from generate_series(1, $4) g`, [member.farmId, planter.id, member.userId, count])
  await pool.query(`insert into setup_revisions (setup_id, revision, config, results, saved_by)
    select id, 1, $2::jsonb, $3::jsonb, $4 from setups where farm_id = $1`, [member.farmId, JSON.stringify(config), JSON.stringify(results), member.userId])
  await pool.end()
}
