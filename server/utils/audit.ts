import type { Db, Tx } from './db'

// Written inside the same transaction as the change it records.
export async function writeAudit(tx: Tx | Db, entry: {
  farmId: number | null
  userId: number | null
  action: string
  entity: string
  entityId?: number | null
  before?: unknown
  after?: unknown
}) {
  await tx.insert(schema.auditLog).values({
    farmId: entry.farmId,
    userId: entry.userId,
    action: entry.action,
    entity: entry.entity,
    entityId: entry.entityId ?? null,
    before: scrub(entry.before),
    after: scrub(entry.after),
  })
}

// Secrets never reach the log.
function scrub(value: unknown): unknown {
  if (value == null || typeof value !== 'object') return value ?? null
  if (Array.isArray(value)) return value.map(scrub)
  const out: Record<string, unknown> = {}
  for (const [k, v] of Object.entries(value)) {
    if (/password|token|secret/i.test(k)) continue
    out[k] = scrub(v)
  }
  return out
}
