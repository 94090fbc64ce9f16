import type { Role } from '../../shared/types/roles'
import { sql, type TestFarm } from './helpers'
import { equipment, type RouteRule } from './route-rules'

const ALL: Role[] = ['owner', 'agronomist', 'operator', 'foreman']
const TAKE: Role[] = ['owner', 'agronomist', 'operator']
const REVIEW: Role[] = ['owner', 'agronomist']

// A seed-drop check made in SQL on the fixture setup, implying 4 % slip so the slip can be stored.
async function seedDropCheck(farm: TestFarm) {
  const e = await equipment(farm)
  const results = { basis: 'length', rows: [], lengthFt: 17.424, rowSpacingIn: 30, seedsPerAcre: 32640, setupSeedsPerAcre: 34000, errorVsSetupPercent: -4, targetSeedsPerAcre: 34000, targetFrom: 'setup', errorVsTargetPercent: -4, setupSlipPercent: 0, impliedSlipPercent: 4, slipStorable: true, fix: { solverTargetSeedsPerAcre: 35416, choices: [], message: null } }
  const [c] = await sql<{ id: number }>(`insert into field_checks (farm_id, kind, setup_id, setup_revision, rows, checked_on, inputs, results) values ($1, 'seed-drop', $2, 1, '{1}', '2026-05-02', '{}', $3) returning id`, [farm.farmId, e.setup, JSON.stringify(results)])
  return { id: c!.id, setup: e.setup }
}

async function upload(farm: TestFarm) {
  const [u] = await sql<{ id: number }>(`insert into uploads (farm_id, storage_key, content_type, size_bytes) values ($1::int, 'farm-' || $1::text || ':missing-' || floor(random() * 1e9)::text, 'text/csv', 4) returning id`, [farm.farmId])
  return { id: u!.id }
}

// A check with no author (so only the owner and agronomists may add to it) and a photo of the farm.
async function checkAndPhoto(farm: TestFarm) {
  const c = await seedDropCheck(farm)
  const [u] = await sql<{ id: number }>(`insert into uploads (farm_id, storage_key, content_type, size_bytes) values ($1::int, 'farm-' || $1::text || ':photo-' || floor(random() * 1e9)::text, 'image/png', 16) returning id`, [farm.farmId])
  return { id: c.id, photo: u!.id }
}

export const CHECKS_ROUTES: Record<string, RouteRule> = {
  'POST /api/calc/spacing-quality': { roles: ALL, body: () => ({ spacingsIn: [5, 6, 7, 2, 12], theoreticalIn: 6 }) },
  'POST /api/calc/seed-check': { roles: ALL, body: () => ({ seedsCounted: 34, lengthFt: 17.424, rowSpacingIn: 30 }) },
  'POST /api/calc/stand-count': { roles: ALL, body: () => ({ counts: [30, 32, 34], lengthFt: 17.424, rowSpacingIn: 30 }) },
  'POST /api/calc/replant': { roles: ALL, body: () => ({ currentStand: 16000, currentPlantingDate: '2026-05-01', replantStand: 30000, replantDate: '2026-05-29', expectedYieldBuPerAcre: 200, pricePerBu: 4.5, replantCostPerAcre: 60 }) },
  'GET /api/checks': { roles: ALL },
  'POST /api/checks': { roles: TAKE, fixture: async (f) => ({ setup: (await equipment(f)).setup }), body: (ids) => ({ kind: 'stand-count', setupId: ids.setup, counts: [31, 33], lengthFt: 17.424 }) },
  'GET /api/checks/:id': { roles: ALL, fixture: seedDropCheck },
  'POST /api/checks/:id/review': { roles: REVIEW, fixture: seedDropCheck, body: () => ({ status: 'accepted', comment: 'Fine' }) },
  'POST /api/checks/:id/photos': { roles: REVIEW, fixture: checkAndPhoto, body: (ids) => ({ uploadIds: [ids.photo] }) },
  'POST /api/checks/:id/apply-slip': { roles: ['owner', 'foreman'], fixture: seedDropCheck, body: () => ({}) },
  'POST /api/uploads': { roles: ALL, body: () => 'spacing\n6.1\n5.8\n' },
  'GET /api/uploads/:id': { roles: ALL, fixture: upload },
}
