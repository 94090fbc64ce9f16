import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { PageStore } from '../../server/utils/page-store'

const store = (over: Partial<ConstructorParameters<typeof PageStore>[0]> = {}) => new PageStore({ maxBytes: 1024 * 1024, ttlMs: 60_000, maxEntryBytes: 64 * 1024, ...over })
const page = (json: string) => ({ json, etag: `"${json.length}"` })

describe('page store', () => {
  it('keeps a page loaded with no drop in between and serves it back', () => {
    const s = store()
    const ticket = s.begin(1)
    expect(s.keep(ticket, 1, '1:a', page('[1]'))).toBe(true)
    expect(s.get('1:a')).toMatchObject(page('[1]'))
  })

  it('does not keep a page whose load overlapped a drop of its farm or of everything', () => {
    const s = store()
    const t1 = s.begin(1)
    s.forget(1)
    expect(s.keep(t1, 1, '1:a', page('[old]'))).toBe(false)
    const t2 = s.begin(1)
    s.forget()
    expect(s.keep(t2, 1, '1:a', page('[old]'))).toBe(false)
    expect(s.get('1:a')).toBeUndefined()
  })

  it('a farm\'s drop leaves other farms\' pages and their loads alone', () => {
    const s = store()
    s.keep(s.begin(2), 2, '2:a', page('[2]'))
    const t1 = s.begin(1)
    s.keep(s.begin(1), 1, '1:b', page('[1]'))
    const t2 = s.begin(2)
    s.forget(1)
    expect(s.get('1:b')).toBeUndefined()
    expect(s.get('2:a')).toMatchObject(page('[2]'))
    expect(s.keep(t2, 2, '2:c', page('[2c]'))).toBe(true)
    expect(s.keep(t1, 1, '1:c', page('[1c]'))).toBe(false)
  })

  it('refuses a page over the entry limit and evicts the least recent beyond the byte limit', () => {
    const s = store({ maxBytes: 4_000, maxEntryBytes: 1_000 })
    expect(s.keep(s.begin(1), 1, '1:big', page('x'.repeat(600)))).toBe(false)
    for (let i = 0; i < 10; i++) s.keep(s.begin(1), 1, `1:${i}`, page('y'.repeat(300)))
    expect(s.bytes).toBeLessThanOrEqual(4_000)
    expect(s.get('1:9')).toBeDefined()
    expect(s.get('1:0')).toBeUndefined()
    // An evicted key no longer counts among the farm's pages: dropping the farm still empties it.
    s.forget(1)
    expect(s.size).toBe(0)
  })

  it('forgets pages past their age', async () => {
    const s = store({ ttlMs: 20 })
    s.keep(s.begin(1), 1, '1:a', page('[1]'))
    await new Promise((r) => setTimeout(r, 40))
    expect(s.get('1:a')).toBeUndefined()
  })

  // Property: after any interleaving of loads and drops, every kept page was loaded after the last
  // drop that touched its farm; no page outlives a drop.
  it('never serves a page loaded before a drop that touched its farm (fast-check)', () => {
    type Op = { kind: 'begin', farm: number, slot: number } | { kind: 'keep', slot: number } | { kind: 'forget', farm: number | null }
    const op = fc.oneof(
      fc.record({ kind: fc.constant('begin' as const), farm: fc.integer({ min: 1, max: 3 }), slot: fc.integer({ min: 0, max: 4 }) }),
      fc.record({ kind: fc.constant('keep' as const), slot: fc.integer({ min: 0, max: 4 }) }),
      fc.record({ kind: fc.constant('forget' as const), farm: fc.option(fc.integer({ min: 1, max: 3 })) }),
    )
    fc.assert(fc.property(fc.array(op, { maxLength: 60 }), (ops: Op[]) => {
      const s = store()
      let clock = 0
      const lastDrop = new Map<number, number>()
      const loads = new Map<number, { farm: number, ticket: string, at: number }>()
      const keptAt = new Map<string, number>()
      for (const o of ops) {
        clock++
        if (o.kind === 'begin') loads.set(o.slot, { farm: o.farm, ticket: s.begin(o.farm), at: clock })
        else if (o.kind === 'keep') {
          const l = loads.get(o.slot)
          if (!l) continue
          const key = `${l.farm}:${o.slot}`
          if (s.keep(l.ticket, l.farm, key, page(`[${l.at}]`))) keptAt.set(key, l.at)
        } else {
          for (const farm of o.farm === null ? [1, 2, 3] : [o.farm]) lastDrop.set(farm, clock)
          s.forget(o.farm ?? undefined)
        }
        for (const [key, at] of keptAt) {
          const farm = Number(key.split(':')[0])
          if (s.get(key) && at < (lastDrop.get(farm) ?? 0)) return false
        }
      }
      return true
    }), { numRuns: 500 })
  })
})

describe('page store loads', () => {
  const deferred = () => {
    let resolve!: (p: { json: string, etag: string }) => void
    const promise = new Promise<{ json: string, etag: string }>((r) => { resolve = r })
    return { promise, resolve }
  }

  it('shares one load among callers that miss together, then serves the kept page', async () => {
    const s = store()
    const d = deferred()
    let loads = 0
    const load = () => { loads++; return d.promise }
    const callers = Array.from({ length: 20 }, () => s.fetch(1, '1:list', load))
    d.resolve(page('[shared]'))
    const pages = await Promise.all(callers)
    expect(loads).toBe(1)
    expect(new Set(pages.map((p) => p.json))).toEqual(new Set(['[shared]']))
    expect(await s.fetch(1, '1:list', load)).toMatchObject(page('[shared]'))
    expect(loads).toBe(1)
  })

  it('a caller after a drop does not join a load begun before it, and the older load is not kept', async () => {
    const s = store()
    const before = deferred()
    const after = deferred()
    const early = s.fetch(1, '1:list', () => before.promise)
    s.forget(1)
    const late = s.fetch(1, '1:list', () => after.promise)
    before.resolve(page('[before the write]'))
    after.resolve(page('[after the write]'))
    expect((await early).json).toBe('[before the write]')
    expect((await late).json).toBe('[after the write]')
    expect(s.get('1:list')?.json).toBe('[after the write]')
  })

  it('keeps nothing when told not to, and a failed load reaches every caller and is retried next time', async () => {
    const s = store()
    await s.fetch(1, '1:a', async () => page('[x]'), () => false)
    expect(s.get('1:a')).toBeUndefined()
    const failing = () => Promise.reject(new Error('database away'))
    await expect(Promise.all([s.fetch(1, '1:b', failing), s.fetch(1, '1:b', failing)])).rejects.toThrow('database away')
    expect((await s.fetch(1, '1:b', async () => page('[back]'))).json).toBe('[back]')
  })
})
