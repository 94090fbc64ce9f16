import type { H3Event } from 'h3'

// Failed sign-in attempts per key in a sliding window (per instance; behind several instances the
// limit applies per instance, which still bounds guessing).
const WINDOW_MS = 15 * 60_000
const attempts = new Map<string, number[]>()

const PER_EMAIL = Number(process.env.ROWBENCH_LOGIN_LIMIT || 10)
// One address may be a whole farm office behind NAT, so it gets more room than one account.
const PER_IP = Number(process.env.ROWBENCH_LOGIN_IP_LIMIT || 50)

function recent(key: string, now: number) {
  const list = (attempts.get(key) ?? []).filter((t) => now - t < WINDOW_MS)
  attempts.set(key, list)
  return list
}

export function loginKeys(event: H3Event, email: string) {
  const trustProxy = process.env.ROWBENCH_TRUST_PROXY === '1'
  const ip = getRequestIP(event, { xForwardedFor: trustProxy }) ?? 'unknown'
  return { email: `email:${email}`, ip: `ip:${ip}` }
}

export function isLimited(keys: { email: string, ip: string }) {
  const now = Date.now()
  return recent(keys.email, now).length >= PER_EMAIL || recent(keys.ip, now).length >= PER_IP
}

export function recordFailure(keys: { email: string, ip: string }) {
  const now = Date.now()
  if (attempts.size > 50_000) attempts.clear()
  recent(keys.email, now).push(now)
  recent(keys.ip, now).push(now)
}

export function clearFailures(key: string) {
  attempts.delete(key)
}
