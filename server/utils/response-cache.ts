import type { H3Event } from 'h3'
import { createHash } from 'node:crypto'
import type { Member } from './membership'
import { PageStore, type StoredPage } from './page-store'

// Signed-in GET responses (list pages, overviews) kept as JSON text per farm, member, role and URL.
// A list page costs a PostgreSQL round trip and serialising up to a few KB of JSON; from memory it
// costs less than a calculator (README, Performance). Freshness, in order of speed:
//   - a write request on this instance drops its farm's pages before its answer leaves (fresh-after-write),
//   - any committed write, from any instance or tool, drops every page on every instance via the
//     change feed (NOTIFY, milliseconds),
//   - nothing is cached while the change feed is down, and no page lives past TTL_MS (for pages that
//     show the date, such as what is due).
// A load that overlaps a drop is served but not kept (PageStore's ticket), so a page read before a
// commit can never be stored after it; requests that miss together share one load.
const TTL_MS = Number(process.env.ROWBENCH_RESPONSE_CACHE_TTL_MS || 30_000)
const MAX_BYTES = Number(process.env.ROWBENCH_RESPONSE_CACHE_MB || 64) * 1024 * 1024
const ENABLED = process.env.ROWBENCH_RESPONSE_CACHE !== 'off'
// A page larger than this is not worth holding: it would crowd out many small ones.
const MAX_ENTRY_BYTES = 2 * 1024 * 1024

const pages = new PageStore({ maxBytes: MAX_BYTES, ttlMs: TTL_MS, maxEntryBytes: MAX_ENTRY_BYTES })

export function forgetCachedResponses(farmId?: number) {
  pages.forget(farmId)
}

function answer(event: H3Event, page: StoredPage, state: 'hit' | 'miss') {
  setResponseHeaders(event, {
    // The browser keeps the page but asks each time; an unchanged page comes back as 304.
    'cache-control': 'private, no-cache',
    'etag': page.etag,
    'x-rowbench-cache': state,
  })
  if (getRequestHeader(event, 'if-none-match') === page.etag) {
    setResponseStatus(event, 304)
    return ''
  }
  setResponseHeader(event, 'content-type', 'application/json; charset=utf-8')
  return page.json
}

// Guard and validate first; `load` runs only when no fresh page is kept. The answer is typed as
// what `load` returns, so pages keep their inferred types; on the wire it is that value's JSON.
export async function cachedResponse<T>(event: H3Event, member: Member, load: () => Promise<T>): Promise<T> {
  if (!ENABLED || !changeFeedLive()) {
    setResponseHeader(event, 'x-rowbench-cache', 'off')
    return load()
  }
  const key = `${member.farmId}:${member.user.id}:${member.role}:${event.path}`
  const kept = pages.get(key)
  if (kept) return answer(event, kept, 'hit') as T
  const page = await pages.fetch(member.farmId, key, async () => {
    const json = JSON.stringify(await load())
    return { json, etag: `"${createHash('sha1').update(json).digest('base64url')}"` }
  }, changeFeedLive)
  return answer(event, page, 'miss') as T
}
