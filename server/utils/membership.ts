import type { H3Event } from 'h3'
import { and, eq } from 'drizzle-orm'
import type { Role } from '#shared/types/roles'

export interface Member {
  user: { id: number, email: string, name: string }
  farmId: number
  farmName: string
  role: Role
}

// The member's role is cached for a few seconds per instance; a role change or removal clears the
// entry here at once, other instances as soon as the change feed tells them, and within the TTL
// at worst (the feed down).
const ROLE_TTL_MS = Number(process.env.ROWBENCH_ROLE_TTL_MS || 5_000)
const roleCache = new Map<string, { role: Role | null, farmName: string, at: number }>()

export function forgetMembership(userId: number, farmId: number) {
  roleCache.delete(`${userId}:${farmId}`)
}

// Called by the change feed when memberships or farms change anywhere, or the feed is down.
export function forgetAllMemberships() {
  roleCache.clear()
}

async function lookupRole(userId: number, farmId: number) {
  const key = `${userId}:${farmId}`
  const hit = roleCache.get(key)
  if (hit && Date.now() - hit.at < ROLE_TTL_MS) return hit
  const [row] = await useDb()
    .select({ role: schema.memberships.role, farmName: schema.farms.name })
    .from(schema.memberships)
    .innerJoin(schema.farms, eq(schema.farms.id, schema.memberships.farmId))
    .where(and(eq(schema.memberships.userId, userId), eq(schema.memberships.farmId, farmId)))
  const entry = { role: row?.role ?? null, farmName: row?.farmName ?? '', at: Date.now() }
  if (roleCache.size > 10_000) roleCache.clear()
  roleCache.set(key, entry)
  return entry
}

// Guard for every farm route: a session (401) and a membership of the current farm (403).
export async function requireMember(event: H3Event): Promise<Member> {
  const session = await requireSessionUser(event)
  const farmId = session.farmId
  if (!farmId) throw createError({ statusCode: 403, message: 'You are not a member of any farm yet' })
  const { role, farmName } = await lookupRole(session.user.id, farmId)
  if (!role) throw createError({ statusCode: 403, message: 'You are no longer a member of this farm' })
  const member = { user: session.user, farmId, farmName, role }
  event.context.member = member
  return member
}

export async function requireRole(event: H3Event, roles: readonly Role[]): Promise<Member> {
  const member = await requireMember(event)
  if (!roles.includes(member.role)) {
    throw createError({ statusCode: 403, message: `This needs the role of ${roles.join(' or ')}` })
  }
  return member
}

declare module 'h3' {
  interface H3EventContext {
    member?: Member
  }
}
