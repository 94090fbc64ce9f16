#!/usr/bin/env node
// 100,000 stored setups: time the first and a deep page of GET /api/setups (keyset pagination)
// and show the plan PostgreSQL picks for the page query.
import pg from 'pg'
import { benchMember, benchServer, printTable, signIn } from './lib.mjs'

const COUNT = Number(process.env.BENCH_SETUPS || 100_000)
// The database's own work is the figure here, so the server keeps no pages in memory.
const server = await benchServer('setups', { ROWBENCH_RESPONSE_CACHE: 'off' })
const pool = new pg.Pool({ connectionString: server.databaseUrl, max: 2 })
try {
  const member = await benchMember(server.databaseUrl, 'operator')
  const { rows: [planter] } = await pool.query(
    `insert into planters (farm_id, name, frame_kind, row_count, row_spacing_in, wheel_circumference_in)
     values ($1, 'Bench planter', 'folding', 12, 30, 86.4) returning id`, [member.farmId])
  const config = { crop: 'corn', targetSeedsPerAcre: 34000, rowSpacingIn: 30, speedMph: 5, wheelCircumferenceIn: 86.4, slipPercent: 3, meterRatio: 1, sections: [], rowUnits: [] }
  const results = { sections: [], seedsPerAcre: 34000, seedSpacingIn: 6.15, errorPercent: 0, checkLengthFt: 17.42, warnings: [] }
  const t0 = performance.now()
  await pool.query(
    `insert into setups (farm_id, planter_id, name, crop, latest_revision, created_by)
     select $1, $2, 'Bench setup ' || g, 'corn', 1, $3 from generate_series(1, $4) g`, [member.farmId, planter.id, member.userId, COUNT])
  await pool.query(
    `insert into setup_revisions (setup_id, revision, config, results, saved_by)
     select id, 1, $2::jsonb, $3::jsonb, $4 from setups where farm_id = $1`, [member.farmId, JSON.stringify(config), JSON.stringify(results), member.userId])
  await pool.query('analyze setups; analyze setup_revisions')
  const insertMs = Math.round(performance.now() - t0)

  const cookie = await signIn(server.baseUrl, member.email, member.password)
  const { rows: [{ deep }] } = await pool.query('select min(id) + 500 as deep from setups where farm_id = $1', [member.farmId])
  async function time(path) {
    const samples = []
    let body
    for (let i = 0; i < 25; i++) {
      const s = performance.now()
      const res = await fetch(`${server.baseUrl}${path}`, { headers: { cookie } })
      body = await res.json()
      samples.push(performance.now() - s)
    }
    samples.sort((a, b) => a - b)
    const items = Array.isArray(body) ? body : body.items ?? []
    return { median: samples[12].toFixed(1), p95: samples[23].toFixed(1), n: items.length }
  }
  const first = await time('/api/setups?limit=50')
  const deepPage = await time(`/api/setups?limit=50&after=${deep}`)
  printTable(`GET /api/setups over ${COUNT.toLocaleString('en-US')} setups (inserted in ${insertMs} ms)`, [
    { page: 'first', 'median ms': first.median, 'p95 ms': first.p95, rows: first.n },
    { page: `deep (after id ${deep})`, 'median ms': deepPage.median, 'p95 ms': deepPage.p95, rows: deepPage.n },
  ])
  // The route's own statement (server/services/setups.ts listSetups), deep page.
  const { rows: plan } = await pool.query(
    `explain select s.id, s.name, p.name, (r.results->>'seedsPerAcre')::float from setups s
     inner join planters p on p.id = s.planter_id
     inner join setup_revisions r on r.setup_id = s.id and r.revision = s.latest_revision
     where s.farm_id = $1 and s.id < $2 order by s.id desc limit 51`, [member.farmId, deep])
  console.log('\nEXPLAIN of the page query:')
  for (const r of plan) console.log(`  ${r['QUERY PLAN']}`)
} finally {
  await pool.end()
  await server.stop()
}
