import type { H3Event } from 'h3'
import type { UserSession } from '#auth-utils'

// Unsealing the session cookie costs about ten times a calculator's work, so a verified session is
// remembered for a short time, keyed by the sealed cookie itself (a digest cost 2 % of a calculator
// request; 20,000 keys of ~500 bytes stay within 10 MB). Sealed cookies are stateless, so
// this weakens nothing: the same cookie would unseal to the same session until it expires, and the
// cache never outlives that expiry.
const TTL_MS = 30_000
const MAX_ENTRIES = 20_000
const cache = new Map<string, { session: UserSession, until: number }>()

function cookieName() {
  return (useRuntimeConfig().session as { name?: string }).name ?? 'nuxt-session'
}

export async function requireSessionUser(event: H3Event): Promise<UserSession & { user: NonNullable<UserSession['user']> }> {
  const sealed = getCookie(event, cookieName())
  if (!sealed) throw createError({ statusCode: 401, message: 'Sign in to continue' })
  const key = sealed
  const now = Date.now()
  const hit = cache.get(key)
  if (hit && hit.until > now) return hit.session as never
  const session = await requireUserSession(event, { message: 'Sign in to continue' })
  const maxAgeMs = ((useRuntimeConfig().session as { maxAge?: number }).maxAge ?? 0) * 1000
  const createdAt = (session as { createdAt?: number }).createdAt
  const expiry = createdAt && maxAgeMs ? createdAt + maxAgeMs : now + TTL_MS
  if (cache.size >= MAX_ENTRIES) cache.delete(cache.keys().next().value!)
  cache.set(key, { session, until: Math.min(now + TTL_MS, expiry) })
  return session as never
}
