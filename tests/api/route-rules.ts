import type { Role } from '../../shared/types/roles'
import { sql, type TestFarm } from './helpers'

export interface RouteRule {
  // Roles allowed; the others must get 403.
  roles: Role[]
  public?: boolean
  // Creates the records the path's :params point at, in the given farm.
  fixture?: (farm: TestFarm) => Promise<Record<string, number | string>>
  body?: (ids: Record<string, number | string>) => unknown
}

const ALL: Role[] = ['owner', 'agronomist', 'operator', 'foreman']

// A throw-away member, so destructive routes leave the test farm's people alone.
async function extraMember(farm: TestFarm) {
  const [u] = await sql<{ id: number }>('insert into users (email, name) values ($1, $2) returning id', [`extra-${Date.now()}-${Math.random()}@test.example`, 'Extra'])
  const [m] = await sql<{ id: number }>('insert into memberships (farm_id, user_id, role) values ($1, $2, $3) returning id', [farm.farmId, u!.id, 'operator'])
  return { id: m!.id }
}

async function membershipOf(farm: TestFarm, role: Role) {
  const [row] = await sql<{ id: number }>('select id from memberships where farm_id = $1 and user_id = $2', [farm.farmId, farm.users[role].id])
  return { id: row!.id }
}

export const ROUTES: Record<string, RouteRule> = {
  'GET /api/health': { roles: ALL, public: true },
  'POST /api/auth/login': { roles: ALL, public: true, body: () => ({ email: 'nobody@test.example', password: 'x' }) },
  'POST /api/auth/logout': { roles: ALL, public: true },
  'POST /api/auth/forgot': { roles: ALL, public: true, body: () => ({ email: 'nobody@test.example' }) },
  'POST /api/auth/reset': { roles: ALL, public: true, body: () => ({ token: 'x'.repeat(30), password: 'long-enough-1' }) },
  'POST /api/invitations/accept': { roles: ALL, public: true, body: () => ({ token: 'x'.repeat(30), password: 'long-enough-1' }) },
  'POST /api/invitations/lookup': { roles: ALL, public: true, body: () => ({ token: 'x'.repeat(30) }) },
  'GET /api/auth/me': { roles: ALL },
  'POST /api/auth/switch-farm': { roles: ALL, body: () => ({ farmId: 999_999 }) },
  'GET /api/members': { roles: ALL },
  'POST /api/members/invite': { roles: ['owner'], body: () => ({ email: `matrix-${Date.now()}@test.example`, name: 'Matrix', role: 'operator' }) },
  'PATCH /api/members/:id': { roles: ['owner'], fixture: (f) => membershipOf(f, 'foreman'), body: () => ({ role: 'foreman' }) },
  'DELETE /api/members/:id': { roles: ['owner'], fixture: extraMember },
  'GET /api/mailbox': { roles: ['owner'] },
}
