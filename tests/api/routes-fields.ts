import type { Role } from '../../shared/types/roles'
import type { RouteRule } from './route-rules'
import { sql, type TestFarm } from './helpers'

const ALL: Role[] = ['owner', 'agronomist', 'operator', 'foreman']

// A field and a seed lot of the farm, made in SQL with unique names.
export async function fieldAndLot(farm: TestFarm) {
  const tag = `${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 8)}`
  const [f] = await sql<{ id: number }>(`insert into fields (farm_id, name, acres, tillage) values ($1, $2, 80, 'no-till') returning id`, [farm.farmId, `Matrix field ${tag}`])
  const [l] = await sql<{ id: number }>(`insert into seed_lots (farm_id, crop, variety, lot_number, seeds_per_lb, germination_percent, units_on_hand, unit_kind, unit_size) values ($1, 'corn', 'Matrix 110', $2, 1500, 95, 10, 'seeds', 80000) returning id`, [farm.farmId, `MX-${tag}`])
  return { field: f!.id, lot: l!.id }
}
const field = async (f: TestFarm) => ({ id: (await fieldAndLot(f)).field })
const lot = async (f: TestFarm) => ({ id: (await fieldAndLot(f)).lot })

export const FIELDS_ROUTES: Record<string, RouteRule> = {
  'GET /api/fields': { roles: ALL },
  'GET /api/fields/:id': { roles: ALL, fixture: field },
  'GET /api/seed-lots': { roles: ALL },
  'GET /api/seed-lots/:id': { roles: ALL, fixture: lot },
}
