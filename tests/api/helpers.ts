import { inject } from 'vitest'
import pg from 'pg'
import { readdir, readFile } from 'node:fs/promises'
import { join } from 'node:path'
import { Hash } from '@adonisjs/hash'
import { Scrypt } from '@adonisjs/hash/drivers/scrypt'
import type { Role } from '../../shared/types/roles'

export const baseUrl = () => inject('baseUrl')
const hasher = new Hash(new Scrypt({}))
export const TEST_PASSWORD = 'test-password-123'

let pool: pg.Pool | undefined
export function db() {
  if (!pool) {
    pool = new pg.Pool({ connectionString: inject('databaseUrl'), max: 3 })
    // Fault tests restart PostgreSQL; idle clients then error and are replaced.
    pool.on('error', () => {})
  }
  return pool
}

export async function sql<T = Record<string, unknown>>(text: string, params: unknown[] = []): Promise<T[]> {
  return (await db().query(text, params)).rows as T[]
}

// A client with its own cookie jar, speaking JSON to the test server (or to another instance).
export class Client {
  cookie = ''
  constructor(private base?: string) {}
  async request(method: string, path: string, body?: unknown, headers: Record<string, string> = {}) {
    const res = await fetch(`${this.base ?? baseUrl()}${path}`, {
      method,
      headers: { ...(body !== undefined ? { 'content-type': 'application/json' } : {}), ...(this.cookie ? { cookie: this.cookie } : {}), ...headers },
      body: body === undefined ? undefined : typeof body === 'string' ? body : JSON.stringify(body),
      redirect: 'manual',
    })
    const set = res.headers.getSetCookie()
    for (const c of set) {
      const pair = c.split(';')[0]!
      if (pair.startsWith('rowbench-session=')) this.cookie = pair.endsWith('=') ? '' : pair
    }
    const type = res.headers.get('content-type') ?? ''
    const data = type.includes('json') ? await res.json() : await res.text()
    return { status: res.status, data, headers: res.headers }
  }
  get(path: string) { return this.request('GET', path) }
  post(path: string, body: unknown = {}) { return this.request('POST', path, body) }
  patch(path: string, body: unknown = {}) { return this.request('PATCH', path, body) }
  put(path: string, body: unknown = {}) { return this.request('PUT', path, body) }
  delete(path: string) { return this.request('DELETE', path) }
}

let seq = 0
function unique(prefix: string) {
  return `${prefix}-${process.pid}-${Date.now().toString(36)}-${++seq}`
}

export interface TestFarm {
  farmId: number
  farmName: string
  users: Record<Role, { id: number, email: string }>
  as: (role: Role) => Promise<Client>
}

let passwordHash: string | undefined

// A new farm with one member per role, made straight in the database (another one when given).
export async function createFarm(query: typeof sql = sql, client: () => Client = () => new Client()): Promise<TestFarm> {
  passwordHash ??= await hasher.make(TEST_PASSWORD)
  const name = unique('Farm')
  const [farm] = await query<{ id: number }>('insert into farms (name) values ($1) returning id', [name])
  const users = {} as TestFarm['users']
  for (const role of ['owner', 'agronomist', 'operator', 'foreman'] as Role[]) {
    const email = `${unique(role)}@test.example`.toLowerCase()
    const [u] = await query<{ id: number }>('insert into users (email, name, password_hash) values ($1, $2, $3) returning id', [email, `${role} of ${name}`, passwordHash])
    await query('insert into memberships (farm_id, user_id, role) values ($1, $2, $3)', [farm!.id, u!.id, role])
    users[role] = { id: u!.id, email }
  }
  return {
    farmId: farm!.id,
    farmName: name,
    users,
    async as(role: Role) {
      const c = client()
      const r = await c.post('/api/auth/login', { email: users[role].email, password: TEST_PASSWORD })
      if (r.status !== 200) throw new Error(`sign-in as ${role} failed: ${r.status} ${JSON.stringify(r.data)}`)
      return c
    },
  }
}

export interface Mail { to: string[], subject: string, text: string, attachments: { filename: string, contentType: string, size: number, contentBase64: string }[] }

// Waits for a message to reach the fake SMTP server.
export async function waitForMail(match: (m: Mail) => boolean, timeoutMs = 15_000, dir: string = inject('mailbox')): Promise<Mail> {
  const until = Date.now() + timeoutMs
  while (Date.now() < until) {
    const files = await readdir(dir)
    for (const f of files.sort().reverse()) {
      const m = JSON.parse(await readFile(join(dir, f), 'utf8')) as Mail
      if (match(m)) return m
    }
    await new Promise((r) => setTimeout(r, 200))
  }
  throw new Error('expected e-mail did not arrive')
}

export function linkToken(text: string) {
  const m = /token=([\w-]+)/.exec(text)
  if (!m) throw new Error('no token link in message')
  return m[1]!
}
