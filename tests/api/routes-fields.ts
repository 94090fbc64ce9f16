import type { Role } from '../../shared/types/roles'
import type { RouteRule } from './route-rules'
import { sql, type TestFarm } from './helpers'

const ALL: Role[] = ['owner', 'agronomist', 'operator', 'foreman']
const EDIT: Role[] = ['owner', 'agronomist']
export const SQUARE = { type: 'Polygon', coordinates: [[[-97.6, 40.88], [-97.59, 40.88], [-97.59, 40.89], [-97.6, 40.89], [-97.6, 40.88]]] }
const tag = () => `${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 8)}`

// A field and a seed lot of the farm, made in SQL with unique names.
export async function fieldAndLot(farm: TestFarm) {
  const t = tag()
  const [f] = await sql<{ id: number }>(`insert into fields (farm_id, name, acres, tillage) values ($1, $2, 80, 'no-till') returning id`, [farm.farmId, `Matrix field ${t}`])
  const [l] = await sql<{ id: number }>(`insert into seed_lots (farm_id, crop, variety, lot_number, seeds_per_lb, germination_percent, units_on_hand, unit_kind, unit_size) values ($1, 'corn', 'Matrix 110', $2, 1500, 95, 10, 'seeds', 80000) returning id`, [farm.farmId, `MX-${t}`])
  return { field: f!.id, lot: l!.id }
}
const field = async (f: TestFarm) => ({ id: (await fieldAndLot(f)).field })
const outlined = async (f: TestFarm) => {
  const id = (await fieldAndLot(f)).field
  await sql('update fields set boundary = $2, boundary_acres = 190 where id = $1', [id, JSON.stringify(SQUARE)])
  return { id }
}
const lot = async (f: TestFarm) => ({ id: (await fieldAndLot(f)).lot })

export const FIELDS_ROUTES: Record<string, RouteRule> = {
  'GET /api/fields': { roles: ALL },
  'GET /api/fields/:id': { roles: ALL, fixture: field },
  'POST /api/fields': { roles: EDIT, body: () => ({ name: `Matrix new ${tag()}`, acres: 40 }) },
  'PATCH /api/fields/:id': { roles: EDIT, fixture: field, body: () => ({ notes: 'matrix' }) },
  'DELETE /api/fields/:id': { roles: EDIT, fixture: field },
  'PUT /api/fields/:id/boundary': { roles: EDIT, fixture: field, body: () => SQUARE },
  'DELETE /api/fields/:id/boundary': { roles: EDIT, fixture: outlined },
  'POST /api/fields/import': { roles: EDIT, body: () => ({ csv: `name,acres\nMatrix import ${tag()},40\n`, mode: 'all-or-nothing' }) },
  'GET /api/seed-lots': { roles: ALL },
  'POST /api/seed-lots': { roles: EDIT, body: () => ({ crop: 'soybeans', variety: 'Matrix 2.5', lotNumber: `MXN-${tag()}`, seedsPerLb: 2800, germinationPercent: 92, unitSize: 140000 }) },
  'PATCH /api/seed-lots/:id': { roles: [...EDIT, 'foreman'], fixture: lot, body: () => ({ unitsOnHand: 3 }) },
  'DELETE /api/seed-lots/:id': { roles: EDIT, fixture: lot },
  'GET /api/seed-lots/:id': { roles: ALL, fixture: lot },
}
