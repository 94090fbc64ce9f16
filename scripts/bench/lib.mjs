// Shared pieces of the benchmarks: a server on a bench database, a signed-in cookie, a table printer.
import { Hash } from '@adonisjs/hash'
import { Scrypt } from '@adonisjs/hash/drivers/scrypt'
import pg from 'pg'
import { startTestServer } from '../lib/test-server.mjs'

export async function benchServer(name, env = {}, nodeArgs = []) {
  return startTestServer({ database: `rowbench_bench_${name}`, port: 3190, smtpPort: 2590, env: { ROWBENCH_LOGIN_IP_LIMIT: '100000', ...env }, nodeArgs })
}

export async function benchMember(databaseUrl, role = 'owner') {
  const pool = new pg.Pool({ connectionString: databaseUrl, max: 2 })
  const hash = await new Hash(new Scrypt({})).make('bench-password-1')
  const { rows: [farm] } = await pool.query("insert into farms (name) values ('Bench Farm') returning id")
  const email = `bench-${Date.now()}@bench.example`
  const { rows: [user] } = await pool.query('insert into users (email, name, password_hash) values ($1, $2, $3) returning id', [email, 'Bench User', hash])
  await pool.query('insert into memberships (farm_id, user_id, role) values ($1, $2, $3)', [farm.id, user.id, role])
  await pool.end()
  return { farmId: farm.id, userId: user.id, email, password: 'bench-password-1' }
}

export async function signIn(baseUrl, email, password) {
  const res = await fetch(`${baseUrl}/api/auth/login`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email, password }) })
  if (res.status !== 200) throw new Error(`bench sign-in failed: ${res.status}`)
  return res.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ')
}

export function printTable(title, rows) {
  console.log(`\n${title}`)
  const keys = Object.keys(rows[0] ?? {})
  const widths = keys.map((k) => Math.max(k.length, ...rows.map((r) => String(r[k]).length)))
  const line = (cells) => cells.map((c, i) => String(c).padEnd(widths[i])).join('  ')
  console.log(line(keys))
  console.log(line(widths.map((w) => '-'.repeat(w))))
  for (const r of rows) console.log(line(keys.map((k) => r[k])))
}
