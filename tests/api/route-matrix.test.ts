import { describe, expect, it } from 'vitest'
import { readdirSync, statSync } from 'node:fs'
import { join, relative, resolve } from 'node:path'
import { Client, createFarm, sql, type TestFarm } from './helpers'
import { ROUTES, type RouteRule } from './route-rules'
import type { Role } from '../../shared/types/roles'

// Every route file under server/api must have a rule, so a new route without one fails here.
const apiDir = resolve(import.meta.dirname, '../../server/api')
function routeFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((f) => {
    const p = join(dir, f)
    return statSync(p).isDirectory() ? routeFiles(p) : [p]
  })
}
function routeKey(file: string) {
  const rel = relative(apiDir, file).replace(/\\/g, '/')
  const m = /^(.*?)(?:\/index)?\.(get|post|patch|put|delete)\.ts$/.exec(rel)
  if (!m) throw new Error(`route file without a method suffix: ${rel}`)
  const path = `/api/${m[1] === 'index' ? '' : m[1]}`.replace(/\/$/, '').replace(/\[(\w+)\]/g, ':$1')
  return `${m[2]!.toUpperCase()} ${path}`
}

async function auditCount() {
  const [row] = await sql<{ n: string }>('select count(*) as n from audit_log')
  return Number(row!.n)
}

const discovered = routeFiles(apiDir).map(routeKey).sort()
const ROLES: Role[] = ['owner', 'agronomist', 'operator', 'foreman']

describe('route matrix', () => {
  it('has a rule for every route file and no rule for a route that does not exist', () => {
    expect(Object.keys(ROUTES).sort()).toEqual(discovered)
  })

  let a: TestFarm
  let b: TestFarm
  const clients = {} as Record<Role, Client>

  it.each(discovered)('%s: anonymous, each role, and another farm', async (key) => {
    a ??= await createFarm()
    b ??= await createFarm()
    for (const r of ROLES) clients[r] ??= await a.as(r)
    const rule: RouteRule = ROUTES[key]!
    const [method, pattern] = key.split(' ') as [string, string]
    const ids = rule.fixture ? await rule.fixture(a) : {}
    const path = pattern.replace(/:(\w+)/g, (_, k: string) => String(ids[k] ?? 999_999_999)) + (ids.query ?? '')
    const body = rule.body?.(ids)

    if (rule.public) {
      const res = await new Client().request(method, path, body)
      expect(res.status, `${key} is public and answers without a server error`).toBeLessThan(500)
      expect(res.status, `${key} is public`).not.toBe(403)
      return
    }
    expect((await new Client().request(method, path, body)).status, `${key} anonymous`).toBe(401)
    const audited = method !== 'GET' && rule.audit !== false && !pattern.startsWith('/api/calc/')
    for (const role of ROLES) {
      const before = audited ? await auditCount() : 0
      const res = await clients[role].request(method, path, body)
      if (rule.roles.includes(role)) expect([401, 403], `${key} as ${role} should be allowed, got ${res.status} ${JSON.stringify(res.data).slice(0, 200)}`).not.toContain(res.status)
      else expect(res.status, `${key} as ${role} should be refused`).toBe(403)
      if (audited && res.status < 300) expect(await auditCount(), `${key} as ${role} succeeded without an audit entry`).toBeGreaterThan(before)
      if (audited && res.status >= 400) expect(await auditCount(), `${key} as ${role} was refused but left an audit entry`).toBe(before)
    }
    if (pattern.includes(':') && rule.fixture) {
      const foreign = await rule.fixture(b)
      const foreignPath = pattern.replace(/:(\w+)/g, (_, k: string) => String(foreign[k])) + (foreign.query ?? '')
      const owner = clients[rule.roles[0]!]
      const res = await owner.request(method, foreignPath, rule.body?.(foreign))
      expect(res.status, `${key} on another farm's record`).toBe(404)
    }
  })
})
