import type { Role } from '../../shared/types/roles'
import { sql, type TestFarm } from './helpers'
import { equipment, type RouteRule } from './route-rules'

const ALL: Role[] = ['owner', 'agronomist', 'operator', 'foreman']
const EDIT: Role[] = ['owner', 'foreman']
const SHOP: Role[] = ['owner', 'operator', 'foreman']

async function setupOf(f: TestFarm) {
  const e = await equipment(f)
  return { id: e.setup, planter: e.planter }
}

async function checklist(f: TestFarm) {
  const [t] = await sql<{ id: number }>(`insert into checklist_templates (farm_id, name, items) values ($1, 'Matrix list', '[{"area":"Drive","label":"Chains","hint":null}]') returning id`, [f.farmId])
  return { id: t!.id }
}

async function inspection(f: TestFarm) {
  const e = await equipment(f)
  const [i] = await sql<{ id: number }>(`insert into inspections (farm_id, planter_id, template_name) values ($1, $2, 'Matrix') returning id`, [f.farmId, e.planter])
  const [item] = await sql<{ id: number }>(`insert into inspection_items (inspection_id, position, area, label, result) values ($1, 1, 'Drive', 'Chains', 'ok') returning id`, [i!.id])
  return { id: i!.id, item: item!.id, planter: e.planter }
}

async function workItem(f: TestFarm) {
  const e = await equipment(f)
  const [w] = await sql<{ id: number }>(`insert into work_items (farm_id, planter_id, title) values ($1, $2, 'Matrix fix') returning id`, [f.farmId, e.planter])
  return { id: w!.id }
}

async function memberOf(f: TestFarm) {
  const e = await equipment(f)
  const [m] = await sql<{ id: number }>('select id from memberships where farm_id = $1 and user_id = $2', [f.farmId, f.users.operator.id])
  return { id: e.setup, member: m!.id }
}

export const SHOP_ROUTES: Record<string, RouteRule> = {
  'GET /api/setups/:id/sheet': { roles: ALL, fixture: setupOf },
  'GET /api/setups/:id/sheet.pdf': { roles: ALL, fixture: setupOf },
  'POST /api/setups/:id/sheet/send': { roles: SHOP, fixture: memberOf, body: (ids) => ({ memberId: ids.member }) },
  'GET /api/setups/:id/pick-list': { roles: ALL, fixture: setupOf },
  'POST /api/setups/:id/install': { roles: EDIT, fixture: setupOf, body: () => ({ revision: 1, planterConfigVersion: 1 }) },
  'GET /api/checklists': { roles: ALL },
  'POST /api/checklists': { roles: EDIT, body: () => ({ name: 'Matrix', items: [{ area: 'Drive', label: 'Chains' }] }) },
  'PATCH /api/checklists/:id': { roles: EDIT, fixture: checklist, body: () => ({ name: 'Renamed' }) },
  'DELETE /api/checklists/:id': { roles: EDIT, fixture: checklist },
  'GET /api/inspections': { roles: ALL },
  'POST /api/inspections': { roles: SHOP, fixture: setupOf, body: (ids) => ({ planterId: ids.planter }) },
  'GET /api/inspections/:id': { roles: ALL, fixture: inspection },
  'POST /api/inspections/:id/complete': { roles: SHOP, fixture: inspection, body: () => ({}) },
  'PATCH /api/inspection-items/:id': { roles: SHOP, fixture: async (f) => ({ id: (await inspection(f)).item }), body: () => ({ result: 'needs-fixing', notes: 'matrix' }) },
  'GET /api/work-items': { roles: ALL },
  'PATCH /api/work-items/:id': { roles: SHOP, fixture: workItem, body: () => ({ status: 'in-progress' }) },
  'GET /api/planters/:id/maintenance': { roles: ALL, fixture: async (f) => ({ id: (await equipment(f)).planter }) },
  'POST /api/planters/:id/service-events': { roles: EDIT, fixture: async (f) => ({ id: (await equipment(f)).planter }), body: () => ({ servicedOn: '2026-03-01', task: 'Chains oiled', intervalAcres: 500 }) },
  'GET /api/shop/overview': { roles: ALL },
}
