import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { createFarm, sql, type Client } from './helpers'
import { ROUTES } from './route-rules'

// Hostile bodies for every route that takes one: never a 500, always a JSON error with field
// messages, and nothing written by a rejected request.
const weird = fc.oneof(
  fc.constantFrom('NaN', 'Infinity', '-Infinity', '1e309', '', ' ', 'null', '0x10', '١٢٣'),
  fc.constantFrom(Number.MAX_SAFE_INTEGER, -Number.MAX_SAFE_INTEGER, 1e308, -1e308, -1, 0, 0.0000001, 2 ** 31),
  fc.string({ maxLength: 20 }),
  fc.string({ unit: 'grapheme', minLength: 2000, maxLength: 6000 }),
  fc.boolean(),
  fc.constant(null),
  fc.array(fc.integer(), { maxLength: 5 }),
)
const deep = fc.letrec((tie) => ({ node: fc.oneof({ depthSize: 'small' }, weird, fc.dictionary(fc.string({ maxLength: 8 }), tie('node'), { maxKeys: 3 }), fc.array(tie('node'), { maxLength: 3 })) })).node
const body = fc.oneof(
  fc.anything({ maxDepth: 4 }),
  fc.dictionary(fc.constantFrom('email', 'password', 'name', 'role', 'rows', 'stages', 'config', 'teeth', 'cellsPerPlate', 'rowSpacingIn', 'positions', 'changes', 'baseRevision', 'planterId', 'targetSeedsPerAcre', 'body', 'token', 'extraField'), weird, { maxKeys: 6 }),
  deep,
)

async function rowCounts() {
  const tables = await sql<{ tablename: string }>("select tablename from pg_tables where schemaname = 'public' and tablename not like '__drizzle%' order by tablename")
  const [row] = await sql<Record<string, string>>(`select ${tables.map((t) => `(select count(*) from "${t.tablename}") as "${t.tablename}"`).join(', ')}`)
  return row!
}

const bodyRoutes = Object.entries(ROUTES).filter(([key]) => /^(POST|PATCH|PUT) /.test(key) && key !== 'POST /api/auth/logout')

describe('input fuzzing', () => {
  it('covers every route that takes a body', () => {
    expect(bodyRoutes.length).toBeGreaterThan(20)
  })

  it.each(bodyRoutes)('%s', async (key, rule) => {
    const farm = await createFarm()
    const owner: Client = await farm.as('owner')
    const ids = rule.fixture ? await rule.fixture(farm) : {}
    const [method, pattern] = key.split(' ') as [string, string]
    const path = pattern.replace(/:(\w+)/g, (_, k: string) => String(ids[k]))
    let ip = 1
    await fc.assert(fc.asyncProperty(body, async (b) => {
      const before = await rowCounts()
      // Each request comes from its own address so the sign-in limiter never trips other tests.
      const res = await owner.request(method, path, b === undefined ? null : b, { 'x-forwarded-for': `198.51.100.${(ip++ % 250) + 1}` })
      expect(res.status, `${key} answered ${res.status}: ${JSON.stringify(res.data).slice(0, 300)}`).toBeLessThan(500)
      expect(res.headers.get('content-type')).toMatch(/json/)
      if (res.status >= 400) {
        expect(typeof res.data.message).toBe('string')
        if (res.status === 400) expect(typeof res.data.data?.fields).toBe('object')
        expect(await rowCounts()).toEqual(before)
      }
    }), { numRuns: 15 })
  }, 120_000)
})
