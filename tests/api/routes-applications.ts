import type { Role } from '../../shared/types/roles'
import type { RouteRule } from './route-rules'
import { equipment } from './route-rules'
import { sql, type TestFarm } from './helpers'

const ALL: Role[] = ['owner', 'agronomist', 'operator', 'foreman']
const RECORD_WRITERS: Role[] = ['owner', 'operator']
const CALIBRATORS: Role[] = ['owner', 'operator', 'foreman']

export const recordBody = () => ({
  appliedOn: '2026-05-02', appliedTime: '09:30', fieldName: 'Matrix field', crop: 'corn', productName: 'Matrix 15G', epaRegNumber: '00000-15',
  restrictedUse: true, rate: 8.7, rateUnit: 'lb/acre', totalAmount: 87, totalUnit: 'lb', areaTreatedAcres: 10, bandWidthIn: 7, rowSpacingIn: 30,
  applicatorName: 'Matrix Applicator', certificationNumber: 'PA-0000', weatherNotes: 'calm',
})

// One application record of the farm, made in SQL.
async function record(farm: TestFarm) {
  const [r] = await sql<{ id: number }>(`insert into application_records (farm_id, season, applied_on, field_name, crop, product_name, rate, rate_unit, area_treated_acres, applicator_name)
    values ($1, 2026, '2026-05-01', 'Matrix field', 'corn', 'Matrix 15G', 8, 'lb/acre', 10, 'Matrix Applicator') returning id`, [farm.farmId])
  return { id: r!.id }
}

const catchBody = (ids: Record<string, number | string>) => ({
  baseRevision: Number(ids.revision ?? 1), rows: [1], productName: 'Matrix 15G', courseFt: 100, targetLbPerAcre: 8,
  points: [{ setting: 10, weightOz: 1 }, { setting: 20, weightOz: 2 }, { setting: 30, weightOz: 3 }],
})

export const APPLICATIONS_ROUTES: Record<string, RouteRule> = {
  'POST /api/calc/granular': { roles: ALL, body: () => ({ rowSpacingIn: 30, ozPer1000Ft: 8 }) },
  'POST /api/calc/catch-test': { roles: ALL, body: () => ({ points: [{ setting: 10, weightOz: 5 }, { setting: 20, weightOz: 10 }], courseFt: 214.9, rowSpacingIn: 19, targetLbPerAcre: 60 }) },
  'POST /api/calc/liquid': { roles: ALL, body: () => ({ gpm: 0.3, mph: 5, widthIn: 20 }) },
  'POST /api/calc/dry-rate': { roles: ALL, body: () => ({ ounces: 25, lengthFt: 214.9, widthIn: 19 }) },
  'POST /api/calc/catch-course': { roles: ALL, body: () => ({ rowSpacingIn: 30, lbPerAcre: 10 }) },
  'POST /api/calc/fill-plan': { roles: ALL, body: () => ({ containers: [{ name: 'Boxes', kind: 'granular hopper', capacity: 420, ratePerAcre: 8.7 }], fields: [{ name: 'F', acres: 80 }] }) },
  'GET /api/application-records': { roles: ALL },
  'POST /api/application-records': { roles: RECORD_WRITERS, body: recordBody },
  'GET /api/application-records/choices': { roles: ALL },
  'GET /api/application-records/export.csv': { roles: ALL },
  'GET /api/application-records/:id': { roles: ALL, fixture: record },
  // A new record per role so each can correct one that has no correction yet.
  'POST /api/application-records/:id/corrections': { roles: RECORD_WRITERS, fixture: record, body: () => ({ reason: 'matrix', record: recordBody() }) },
  'GET /api/setups/:id/calibrations': { roles: ALL, fixture: async (f) => ({ id: (await equipment(f)).setup }) },
  'POST /api/setups/:id/calibrations': { roles: CALIBRATORS, fixture: async (f) => ({ id: (await equipment(f)).setup }), body: catchBody },
}
