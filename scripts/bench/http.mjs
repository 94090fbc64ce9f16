#!/usr/bin/env node
// Throughput on loopback with autocannon (50 connections, 10 s each): the health route beside a
// signed-in calculator and a signed-in list, on the same server in the same run.
import autocannon from 'autocannon'
import { benchMember, benchServer, printTable, signIn } from './lib.mjs'

const seconds = Number(process.env.BENCH_SECONDS || 10)
const server = await benchServer('http')
try {
  const member = await benchMember(server.databaseUrl)
  const cookie = await signIn(server.baseUrl, member.email, member.password)
  const meterBody = JSON.stringify({ wheelCircumferenceIn: 86.4, slipPercent: 3, stages: [{ driverTeeth: 21, drivenTeeth: 19 }, { driverTeeth: 17, drivenTeeth: 26 }], meterRatio: 1, cellsPerPlate: 30, rowSpacingIn: 30, speedMph: 5 })
  const targets = [
    { route: 'GET /api/health', opts: { url: `${server.baseUrl}/api/health` } },
    { route: 'POST /api/calc/meter (signed in)', opts: { url: `${server.baseUrl}/api/calc/meter`, method: 'POST', body: meterBody, headers: { cookie, 'content-type': 'application/json' } } },
    { route: 'GET /api/setups (signed in)', opts: { url: `${server.baseUrl}/api/setups`, headers: { cookie } } },
  ]
  const rows = []
  let healthRps = 0
  for (const t of targets) {
    const r = await autocannon({ ...t.opts, connections: 50, duration: seconds })
    const rps = Math.round(r.requests.average)
    if (t.route.startsWith('GET /api/health')) healthRps = rps
    rows.push({
      route: t.route,
      'req/s': rps,
      'p50 ms': r.latency.p50,
      'p99 ms': r.latency.p99,
      non2xx: r.non2xx,
      'vs health': healthRps ? `${Math.round((rps / healthRps) * 100)} %` : '—',
    })
  }
  printTable(`HTTP throughput, 50 connections, ${seconds} s per route`, rows)
} finally {
  await server.stop()
}
