// Failed sign-in attempts per key in a sliding window (per instance; behind several instances the
// limit applies per instance, which still bounds guessing).
const WINDOW_MS = 15 * 60_000
const attempts = new Map<string, number[]>()

export const LOGIN_FAILURES_ALLOWED = Number(process.env.ROWBENCH_LOGIN_LIMIT || 10)

function recent(key: string, now: number) {
  const list = (attempts.get(key) ?? []).filter((t) => now - t < WINDOW_MS)
  attempts.set(key, list)
  return list
}

export function isLimited(keys: string[]) {
  const now = Date.now()
  return keys.some((k) => recent(k, now).length >= LOGIN_FAILURES_ALLOWED)
}

export function recordFailure(keys: string[]) {
  const now = Date.now()
  if (attempts.size > 50_000) attempts.clear()
  for (const k of keys) recent(k, now).push(now)
}

export function clearFailures(keys: string[]) {
  for (const k of keys) attempts.delete(k)
}
