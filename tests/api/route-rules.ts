import type { Role } from '../../shared/types/roles'
import { sql, type TestFarm } from './helpers'
import { FIELDS_ROUTES } from './routes-fields'
import { PLANS_ROUTES } from './routes-plans'
import { SHOP_ROUTES } from './routes-shop'
import { CHECKS_ROUTES } from './routes-checks'
import { APPLICATIONS_ROUTES } from './routes-applications'

export interface RouteRule {
  // Roles allowed; the others must get 403.
  roles: Role[]
  public?: boolean
  // Creates the records the path's :params point at, in the given farm.
  fixture?: (farm: TestFarm) => Promise<Record<string, number | string>>
  body?: (ids: Record<string, number | string>) => unknown
  // A state-changing route that stores nothing of the farm's (a calculation, a search) says so here;
  // every other accepted POST, PATCH, PUT or DELETE must add to the audit log.
  audit?: false
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

// A planter with a section, a stage, a row unit, a plate, a sprocket and a setup, made in SQL.
export async function equipment(farm: TestFarm) {
  const [p] = await sql<{ id: number }>(`insert into planters (farm_id, name, frame_kind, row_count, row_spacing_in, wheel_circumference_in) values ($1, 'Matrix', 'mounted', 4, 30, 86.4) returning id`, [farm.farmId])
  const [s] = await sql<{ id: number }>(`insert into drive_sections (planter_id, name, rows) values ($1, 'Main drive', '{1,2,3,4}') returning id`, [p!.id])
  await sql(`insert into drive_sections (planter_id, name, rows, sort_order) values ($1, 'Spare', '{}', 1)`, [p!.id])
  const [st] = await sql<{ id: number }>(`insert into drive_stages (section_id, position, driver_teeth, driven_teeth, driver_options, driven_options) values ($1, 1, 20, 20, '{18,22}', '{18,22}') returning id`, [s!.id])
  await sql(`insert into drive_stages (section_id, position, driver_teeth, driven_teeth, driver_options, driven_options) values ($1, 2, 20, 20, '{}', '{}')`, [s!.id])
  const [u] = await sql<{ id: number }>(`insert into row_units (planter_id, position) select $1, g from generate_series(1, 4) g returning id`, [p!.id])
  const [pl] = await sql<{ id: number }>(`insert into seed_plates (farm_id, code, crops, cells_per_plate, quantity_on_hand) values ($1, 'M-' || floor(random() * 1e9)::text, '{corn}', 30, 5) returning id`, [farm.farmId])
  const [sp] = await sql<{ id: number }>(`insert into sprockets (farm_id, teeth, chain_pitch, quantity_on_hand) values ($1, (random() * 150 + 20)::int, '#' || floor(random() * 1e9)::text, 2) returning id`, [farm.farmId])
  const config = { crop: 'corn', targetSeedsPerAcre: 34000, rowSpacingIn: 30, speedMph: 5, wheelCircumferenceIn: 86.4, slipPercent: 0, meterRatio: 1, sections: [{ sectionId: s!.id, name: 'Main drive', rows: [1, 2, 3, 4], seedPlateId: null, plateCode: null, cellsPerPlate: 30, stages: [{ position: 1, driverTeeth: 20, drivenTeeth: 20 }] }], rowUnits: [1, 2, 3, 4].map((position) => ({ position, opener: 'double-disc', gaugeWheels: null, depthIn: 1.75, depthBand: null, downPressureLb: null, pressWheel: 'open-center', pressWheelWidthIn: null, covering: 'none', furrower: false, seedPlateId: null, granular: 'none', granularBandWidthIn: null, granularDialSetting: null, fertilizerSetting: null, planting: true })) }
  const [set] = await sql<{ id: number }>(`insert into setups (farm_id, planter_id, name, crop) values ($1, $2, 'Matrix setup', 'corn') returning id`, [farm.farmId, p!.id])
  await sql(`insert into setup_revisions (setup_id, revision, config, results) values ($1, 1, $2, '{"sections":[],"seedsPerAcre":34000,"seedSpacingIn":6.1,"errorPercent":0,"checkLengthFt":17.4,"warnings":[]}')`, [set!.id, JSON.stringify(config)])
  return { planter: p!.id, section: s!.id, stage: st!.id, unit: u!.id, plate: pl!.id, sprocket: sp!.id, setup: set!.id, config: JSON.stringify(config) }
}

const EDIT: Role[] = ['owner', 'foreman']
const SAVE: Role[] = ['owner', 'operator', 'foreman']
const withId = (k: keyof Awaited<ReturnType<typeof equipment>>) => async (f: TestFarm) => {
  const e = await equipment(f)
  return { id: e[k], config: e.config, planter: e.planter }
}

export const ROUTES: Record<string, RouteRule> = {
  'POST /api/calc/meter': { roles: ALL, body: () => ({ wheelCircumferenceIn: 60, slipPercent: 0, stages: [{ driverTeeth: 20, drivenTeeth: 20 }], meterRatio: 1, cellsPerPlate: 10, rowSpacingIn: 30 }) },
  'POST /api/calc/row-length': { roles: ALL, body: () => ({ rowSpacingIn: 30 }) },
  'POST /api/calc/seeding-rate': { roles: ALL, body: () => ({ targetStand: 32000, germinationPercent: 95, survivalPercent: 90 }) },
  'GET /api/planters': { roles: ALL },
  'POST /api/planters': { roles: EDIT, body: () => ({ name: 'M', frameKind: 'mounted', rowCount: 4, rowSpacingIn: 30, wheelCircumferenceIn: 80 }) },
  'GET /api/planters/:id': { roles: ALL, fixture: withId('planter') },
  'PATCH /api/planters/:id': { roles: EDIT, fixture: withId('planter'), body: () => ({ notes: 'matrix' }) },
  'DELETE /api/planters/:id': { roles: EDIT, fixture: withId('planter') },
  'POST /api/planters/:id/sections': { roles: EDIT, fixture: withId('planter'), body: () => ({ name: 'Split', rows: [2] }) },
  'PATCH /api/planters/:id/row-units': { roles: EDIT, fixture: withId('planter'), body: () => ({ positions: [1], changes: { depthIn: 2 } }) },
  'POST /api/planters/:id/solve': { roles: ALL, fixture: withId('planter'), body: () => ({ targetSeedsPerAcre: 34000 }), audit: false },
  'GET /api/planters/:id/rate-chart': { roles: ALL, fixture: withId('planter') },
  'GET /api/planters/:id/rate-chart.csv': { roles: ALL, fixture: withId('planter') },
  'GET /api/planters/:id/setup-draft': { roles: ALL, fixture: withId('planter') },
  'PATCH /api/sections/:id': { roles: EDIT, fixture: withId('section'), body: () => ({ name: 'Renamed' }) },
  'DELETE /api/sections/:id': { roles: EDIT, fixture: withId('section') },
  'POST /api/sections/:id/stages': { roles: EDIT, fixture: withId('section'), body: () => ({ driverTeeth: 20, drivenTeeth: 22 }) },
  'PATCH /api/stages/:id': { roles: EDIT, fixture: withId('stage'), body: () => ({ driverTeeth: 22 }) },
  'DELETE /api/stages/:id': { roles: EDIT, fixture: withId('stage') },
  'PATCH /api/row-units/:id': { roles: EDIT, fixture: withId('unit'), body: () => ({ depthIn: 2 }) },
  'GET /api/plates': { roles: ALL },
  'POST /api/plates': { roles: EDIT, body: () => ({ code: `MX-${Date.now()}-${Math.random()}`, crops: ['corn'], cellsPerPlate: 24 }) },
  'PATCH /api/plates/:id': { roles: EDIT, fixture: withId('plate'), body: () => ({ quantityOnHand: 3 }) },
  'DELETE /api/plates/:id': { roles: EDIT, fixture: withId('plate') },
  'GET /api/sprockets': { roles: ALL },
  'POST /api/sprockets': { roles: EDIT, body: () => ({ teeth: 1 + Math.floor(Math.random() * 199), chainPitch: `#${Date.now()}${Math.random()}`.slice(0, 20) }) },
  'PATCH /api/sprockets/:id': { roles: EDIT, fixture: withId('sprocket'), body: () => ({ quantityOnHand: 4 }) },
  'DELETE /api/sprockets/:id': { roles: EDIT, fixture: withId('sprocket') },
  'GET /api/setups': { roles: ALL },
  'POST /api/setups': { roles: SAVE, fixture: withId('planter'), body: (ids) => ({ planterId: ids.id, name: 'Matrix', config: JSON.parse(String(ids.config)) }) },
  'GET /api/setups/:id': { roles: ALL, fixture: withId('setup') },
  'POST /api/setups/:id/revisions': { roles: SAVE, fixture: withId('setup'), body: (ids) => ({ baseRevision: 1, config: JSON.parse(String(ids.config)) }) },
  'GET /api/setups/:id/diff': { roles: ALL, fixture: async (f) => ({ id: (await equipment(f)).setup, query: '?from=1&to=1' }) },
  'POST /api/setups/:id/comments': { roles: ALL, fixture: withId('setup'), body: () => ({ body: 'matrix comment' }) },
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
  ...FIELDS_ROUTES,
  ...PLANS_ROUTES,
  ...SHOP_ROUTES,
  ...CHECKS_ROUTES,
  ...APPLICATIONS_ROUTES,
}
