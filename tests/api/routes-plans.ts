import type { Role } from '../../shared/types/roles'
import { sql, type TestFarm } from './helpers'
import { equipment, type RouteRule } from './route-rules'

const ALL: Role[] = ['owner', 'agronomist', 'operator', 'foreman']
const REVIEW: Role[] = ['owner', 'agronomist']

// A field, a corn lot and a draft plan on the planter of the equipment fixture, made in SQL.
export async function planFixture(farm: TestFarm, status = 'draft') {
  const e = await equipment(farm)
  const tag = `${Date.now()}-${Math.random()}`
  const [f] = await sql<{ id: number }>(`insert into fields (farm_id, name, acres) values ($1, $2, 80) returning id`, [farm.farmId, `Matrix ${tag}`])
  const [l] = await sql<{ id: number }>(`insert into seed_lots (farm_id, crop, variety, lot_number, seeds_per_lb, germination_percent, units_on_hand, unit_kind, unit_size) values ($1, 'corn', 'Matrix 1', $2, 1600, 95, 10, 'seeds', 80000) returning id`, [farm.farmId, `M-${tag}`])
  const [p] = await sql<{ id: number }>(`insert into crop_plans (farm_id, season, field_id, crop, seed_lot_id, target_stand, row_spacing_in, planter_id, setup_id, status, window_start) values ($1, 2027, $2, 'corn', $3, 32000, 30, $4, $5, $6, '2027-04-20') returning id`, [farm.farmId, f!.id, l!.id, e.planter, e.setup, status])
  return { id: p!.id, field: f!.id, lot: l!.id, planter: e.planter, setup: e.setup }
}

export const PLANS_ROUTES: Record<string, RouteRule> = {
  'POST /api/calc/capacity': { roles: ALL, body: () => ({ rows: 16, rowSpacingIn: 30, speedMph: 6, efficiencyPercent: 70 }) },
  'GET /api/plans': { roles: ALL },
  'POST /api/plans': { roles: REVIEW, fixture: (f) => planFixture(f), body: (ids) => ({ season: 2027, fieldId: ids.field, crop: 'corn', seedLotId: ids.lot, targetStand: 32000, rowSpacingIn: 30 }) },
  'GET /api/plans/:id': { roles: ALL, fixture: (f) => planFixture(f) },
  'PATCH /api/plans/:id': { roles: REVIEW, fixture: (f) => planFixture(f), body: () => ({ notes: 'matrix' }) },
  'DELETE /api/plans/:id': { roles: REVIEW, fixture: (f) => planFixture(f) },
  // Asking for changes is the reviewers' move; the rules of the other moves are tested in plans.test.ts.
  'POST /api/plans/:id/transition': { roles: REVIEW, fixture: (f) => planFixture(f, 'submitted'), body: () => ({ to: 'changes-requested', comment: 'matrix' }) },
  'GET /api/plans/:id/comments': { roles: ALL, fixture: (f) => planFixture(f) },
  'POST /api/plans/:id/comments': { roles: ALL, fixture: (f) => planFixture(f), body: () => ({ body: 'matrix comment' }) },
  'GET /api/seasons/:season/summary': { roles: ALL },
  'GET /api/seasons/:season/seed-order.csv': { roles: ALL },
}
