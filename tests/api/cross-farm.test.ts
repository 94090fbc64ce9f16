import { beforeAll, describe, expect, it } from 'vitest'
import { baseUrl, createFarm, sql, type Client, type TestFarm } from './helpers'
import { equipment } from './route-rules'
import { planFixture } from './routes-plans'
import { fieldAndLot } from './routes-fields'
import { recordBody } from './routes-applications'
import type { Role } from '../../shared/types/roles'

// The route matrix proves another farm's id in the PATH is a 404. These cases put another farm's
// id in the BODY or the QUERY of a request of farm A: each must be refused (400 naming the field,
// or 404), write nothing anywhere (row counts and audit log unchanged) and leave both farms'
// records as they were. The same request with farm A's own id then succeeds, so the refusal is
// down to the foreign id and nothing else.

const TABLES = [
  'audit_log', 'outbox', 'memberships', 'checklist_templates', 'inspections', 'inspection_items', 'work_items', 'service_events',
  'setups', 'setup_revisions', 'setup_comments', 'calibration_runs', 'application_records', 'planters', 'drive_sections', 'drive_stages',
  'seed_plates', 'sprockets', 'row_units', 'fields', 'seed_lots', 'crop_plans', 'plan_events', 'plan_comments', 'uploads', 'field_checks',
] as const

type Watch = [table: (typeof TABLES)[number], id: number]

async function counts() {
  const [row] = await sql<Record<string, number>>(`select ${TABLES.map((t) => `(select count(*)::int from ${t}) as ${t}`).join(', ')}`)
  return row!
}

// Whole rows (every column, updated_at included) of the records a case must leave alone.
async function rows(watch: Watch[]) {
  const out: Record<string, unknown> = {}
  for (const [table, id] of watch) {
    const [r] = await sql<{ row: unknown }>(`select to_jsonb(t) as row from ${table} t where id = $1`, [id])
    expect(r, `${table} ${id} exists before the request`).toBeTruthy()
    out[`${table}:${id}`] = r!.row
  }
  return out
}

const snapshot = async (watch: Watch[]) => ({ counts: await counts(), rows: await rows(watch) })

const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52])

async function upload(c: Client, bytes: Uint8Array | string, name: string): Promise<number> {
  const res = await fetch(`${baseUrl()}/api/uploads?name=${encodeURIComponent(name)}`, {
    method: 'POST', headers: { 'cookie': c.cookie, 'content-type': 'application/octet-stream' },
    body: typeof bytes === 'string' ? bytes : new Blob([bytes as Uint8Array<ArrayBuffer>]),
  })
  const data = await res.json() as { id: number }
  expect(res.status, `upload ${name}`).toBeLessThan(300)
  return data.id
}

async function membershipId(farm: TestFarm, role: Role) {
  const [m] = await sql<{ id: number }>('select id from memberships where farm_id = $1 and user_id = $2', [farm.farmId, farm.users[role].id])
  return m!.id
}

async function template(farm: TestFarm) {
  const [t] = await sql<{ id: number }>(`insert into checklist_templates (farm_id, name, items) values ($1, 'Cross list', '[{"area":"Drive","label":"Chains","hint":null}]') returning id`, [farm.farmId])
  return t!.id
}

async function inspectionItem(farm: TestFarm, planter: number) {
  const [i] = await sql<{ id: number }>(`insert into inspections (farm_id, planter_id, template_name) values ($1, $2, 'Cross') returning id`, [farm.farmId, planter])
  const [item] = await sql<{ id: number }>(`insert into inspection_items (inspection_id, position, area, label) values ($1, 1, 'Drive', 'Chains') returning id`, [i!.id])
  return { inspection: i!.id, item: item!.id }
}

async function check(farm: TestFarm, setup: number, fieldId: number | null = null, planId: number | null = null) {
  const [c] = await sql<{ id: number }>(`insert into field_checks (farm_id, kind, setup_id, setup_revision, field_id, plan_id, rows, checked_on, inputs, results) values ($1, 'stand-count', $2, 1, $3, $4, '{1}', '2026-05-02', '{}', '{}') returning id`, [farm.farmId, setup, fieldId, planId])
  return c!.id
}

async function workItem(farm: TestFarm, planter: number) {
  const [w] = await sql<{ id: number }>(`insert into work_items (farm_id, planter_id, title) values ($1, $2, 'Cross fix') returning id`, [farm.farmId, planter])
  return w!.id
}

const catchBody = (extra: Record<string, unknown> = {}) => ({
  baseRevision: 1, rows: [1], productName: 'Cross 15G', courseFt: 100, targetLbPerAcre: 8,
  points: [{ setting: 10, weightOz: 1 }, { setting: 20, weightOz: 2 }, { setting: 30, weightOz: 3 }], ...extra,
})

// A catch test of the farm, run through the API by its operator.
async function calibrationRun(farm: TestFarm, setup: number) {
  const res = await (await farm.as('operator')).post(`/api/setups/${setup}/calibrations`, catchBody())
  expect(res.status).toBeLessThan(300)
  return res.data.id as number
}

const configOf = (e: Awaited<ReturnType<typeof equipment>>) => JSON.parse(e.config)

interface Prepared {
  method: string
  path: string
  // The request of farm A with the other farm's id, and the same request with farm A's own.
  foreign: unknown
  own?: unknown
  ownPath?: string
  watch: Watch[]
}

interface Case {
  // The id field the case puts another farm's id in, when no 400 names it.
  covers?: string
  role: Role
  // The field the 400 must name; null when the answer is a 404.
  field: string | null
  status?: number
  prepare: (a: TestFarm, b: TestFarm) => Promise<Prepared>
}

// A new setup of farm A's planter whose config names one record of farm B (a plate or a drive
// section) at `field`; the same request with A's own record is the control.
function newSetupNaming(field: string, key: 'plate' | 'section', table: Watch[0], put: (config: ReturnType<typeof configOf>, id: number) => void): Case {
  return {
    role: 'operator', field,
    prepare: async (a, b) => {
      const [ea, eb] = [await equipment(a), await equipment(b)]
      const body = (id: number) => {
        const config = configOf(ea)
        put(config, id)
        return { planterId: ea.planter, name: 'Cross', config }
      }
      return { method: 'POST', path: '/api/setups', foreign: body(eb[key]), own: body(ea[key]), watch: [[table, eb[key]]] }
    },
  }
}

const CASES: Record<string, Case> = {
  'POST /api/checks with another farm\'s setupId': {
    role: 'operator', field: 'setupId',
    prepare: async (a, b) => {
      const [ea, eb] = [await equipment(a), await equipment(b)]
      const body = (setupId: number) => ({ kind: 'stand-count', setupId, counts: [31, 33], lengthFt: 17.424 })
      return { method: 'POST', path: '/api/checks', foreign: body(eb.setup), own: body(ea.setup), watch: [['setups', eb.setup], ['setups', ea.setup]] }
    },
  },
  'POST /api/checks (seed drop) with another farm\'s setupId': {
    role: 'operator', field: 'setupId',
    prepare: async (a, b) => {
      const [ea, eb] = [await equipment(a), await equipment(b)]
      const body = (setupId: number) => ({ kind: 'seed-drop', setupId, rows: [{ row: 1, seedsCounted: 33 }], lengthFt: 17.424 })
      return { method: 'POST', path: '/api/checks', foreign: body(eb.setup), own: body(ea.setup), watch: [['setups', eb.setup], ['planters', eb.planter], ['planters', ea.planter]] }
    },
  },
  'POST /api/checks with another farm\'s fieldId': {
    role: 'operator', field: 'fieldId',
    prepare: async (a, b) => {
      const [fa, fb] = [await fieldAndLot(a), await fieldAndLot(b)]
      const body = (fieldId: number) => ({ kind: 'stand-count', fieldId, counts: [31, 33], lengthFt: 17.424, rowSpacingIn: 30 })
      return { method: 'POST', path: '/api/checks', foreign: body(fb.field), own: body(fa.field), watch: [['fields', fb.field]] }
    },
  },
  'POST /api/checks with another farm\'s planId': {
    role: 'operator', field: 'planId',
    prepare: async (a, b) => {
      const [pa, pb] = [await planFixture(a), await planFixture(b)]
      const body = (planId: number) => ({ kind: 'stand-count', planId, counts: [31, 33], lengthFt: 17.424, rowSpacingIn: 30 })
      return { method: 'POST', path: '/api/checks', foreign: body(pb.id), own: body(pa.id), watch: [['crop_plans', pb.id], ['crop_plans', pa.id]] }
    },
  },
  'POST /api/checks with another farm\'s photoUploadIds': {
    role: 'operator', field: 'photoUploadIds',
    prepare: async (a, b) => {
      const mine = await upload(await a.as('operator'), png, 'mine.png')
      const theirs = await upload(await b.as('operator'), png, 'theirs.png')
      const body = (id: number) => ({ kind: 'stand-count', counts: [31, 33], lengthFt: 17.424, rowSpacingIn: 30, photoUploadIds: [mine, id] })
      return { method: 'POST', path: '/api/checks', foreign: body(theirs), own: body(mine), watch: [['uploads', theirs], ['uploads', mine]] }
    },
  },
  'POST /api/checks (spacing) with another farm\'s csvUploadId': {
    role: 'operator', field: 'csvUploadId',
    prepare: async (a, b) => {
      const mine = await upload(await a.as('operator'), 'spacing\n6.1\n5.8\n6.4\n', 'mine.csv')
      const theirs = await upload(await b.as('operator'), 'spacing\n6.1\n5.8\n6.4\n', 'theirs.csv')
      const body = (id: number) => ({ kind: 'spacing', csvUploadId: id, theoreticalIn: 6 })
      return { method: 'POST', path: '/api/checks', foreign: body(theirs), own: body(mine), watch: [['uploads', theirs]] }
    },
  },
  'POST /api/checks/:id/photos with another farm\'s uploadIds': {
    role: 'owner', field: 'uploadIds',
    prepare: async (a, b) => {
      const ea = await equipment(a)
      const id = await check(a, ea.setup)
      const mine = await upload(await a.as('operator'), png, 'mine.png')
      const theirs = await upload(await b.as('operator'), png, 'theirs.png')
      return { method: 'POST', path: `/api/checks/${id}/photos`, foreign: { uploadIds: [mine, theirs] }, own: { uploadIds: [mine] }, watch: [['field_checks', id], ['uploads', theirs]] }
    },
  },
  'POST /api/plans with another farm\'s fieldId': {
    role: 'agronomist', field: 'fieldId',
    prepare: async (a, b) => {
      const [fa, fb] = [await fieldAndLot(a), await fieldAndLot(b)]
      const body = (fieldId: number) => ({ season: 2027, fieldId, crop: 'corn', seedLotId: fa.lot, targetStand: 32000, rowSpacingIn: 30 })
      return { method: 'POST', path: '/api/plans', foreign: body(fb.field), own: body(fa.field), watch: [['fields', fb.field], ['seed_lots', fa.lot]] }
    },
  },
  'POST /api/plans with another farm\'s seedLotId': {
    role: 'agronomist', field: 'seedLotId',
    prepare: async (a, b) => {
      const [fa, fb] = [await fieldAndLot(a), await fieldAndLot(b)]
      const body = (seedLotId: number) => ({ season: 2027, fieldId: fa.field, crop: 'corn', seedLotId, targetStand: 32000, rowSpacingIn: 30 })
      return { method: 'POST', path: '/api/plans', foreign: body(fb.lot), own: body(fa.lot), watch: [['seed_lots', fb.lot]] }
    },
  },
  'POST /api/plans with another farm\'s planterId': {
    role: 'agronomist', field: 'planterId',
    prepare: async (a, b) => {
      const [fa, ea, eb] = [await fieldAndLot(a), await equipment(a), await equipment(b)]
      const body = (planterId: number) => ({ season: 2027, fieldId: fa.field, crop: 'corn', planterId, targetStand: 32000, rowSpacingIn: 30 })
      return { method: 'POST', path: '/api/plans', foreign: body(eb.planter), own: body(ea.planter), watch: [['planters', eb.planter]] }
    },
  },
  'PATCH /api/plans/:id with another farm\'s fieldId': {
    role: 'agronomist', field: 'fieldId',
    prepare: async (a, b) => {
      const [pa, fa, fb] = [await planFixture(a), await fieldAndLot(a), await fieldAndLot(b)]
      return { method: 'PATCH', path: `/api/plans/${pa.id}`, foreign: { fieldId: fb.field }, own: { fieldId: fa.field }, watch: [['crop_plans', pa.id], ['fields', fb.field]] }
    },
  },
  'PATCH /api/plans/:id with another farm\'s seedLotId': {
    role: 'agronomist', field: 'seedLotId',
    prepare: async (a, b) => {
      const [pa, fa, fb] = [await planFixture(a), await fieldAndLot(a), await fieldAndLot(b)]
      return { method: 'PATCH', path: `/api/plans/${pa.id}`, foreign: { seedLotId: fb.lot }, own: { seedLotId: fa.lot }, watch: [['crop_plans', pa.id], ['seed_lots', fb.lot]] }
    },
  },
  'PATCH /api/plans/:id with another farm\'s planterId': {
    role: 'agronomist', field: 'planterId',
    prepare: async (a, b) => {
      const [pa, ea, eb] = [await planFixture(a), await equipment(a), await equipment(b)]
      return { method: 'PATCH', path: `/api/plans/${pa.id}`, foreign: { planterId: eb.planter }, own: { planterId: ea.planter }, watch: [['crop_plans', pa.id], ['planters', eb.planter]] }
    },
  },
  'POST /api/plans/:id/transition with another farm\'s setupId': {
    role: 'owner', field: 'setupId',
    prepare: async (a, b) => {
      const pa = await planFixture(a)
      // Without a planter the plan takes the setup's: the only refusal left is the farm.
      await sql('update crop_plans set planter_id = null, setup_id = null where id = $1', [pa.id])
      const eb = await equipment(b)
      const body = (setupId: number) => ({ to: 'submitted', setupId, comment: 'cross' })
      return { method: 'POST', path: `/api/plans/${pa.id}/transition`, foreign: body(eb.setup), own: body(pa.setup), watch: [['crop_plans', pa.id], ['setups', eb.setup]] }
    },
  },
  'POST /api/setups with another farm\'s planterId': {
    role: 'operator', field: 'planterId',
    prepare: async (a, b) => {
      const [ea, eb] = [await equipment(a), await equipment(b)]
      // Farm B's planter is a copy of A's, so only its farm is wrong.
      const config = configOf(ea)
      config.sections[0].sectionId = null
      const body = (planterId: number) => ({ planterId, name: 'Cross', config })
      return { method: 'POST', path: '/api/setups', foreign: body(eb.planter), own: body(ea.planter), watch: [['planters', eb.planter]] }
    },
  },
  'POST /api/setups with another farm\'s seedPlateId on a section': newSetupNaming('config.sections.0.seedPlateId', 'plate', 'seed_plates', (c, id) => { c.sections[0].seedPlateId = id }),
  'POST /api/setups with another farm\'s seedPlateId on a row unit': newSetupNaming('config.rowUnits.0.seedPlateId', 'plate', 'seed_plates', (c, id) => { c.rowUnits[0].seedPlateId = id }),
  'POST /api/setups with another farm\'s sectionId': newSetupNaming('config.sections.0.sectionId', 'section', 'drive_sections', (c, id) => { c.sections[0].sectionId = id }),
  'POST /api/setups/:id/revisions with another farm\'s seedPlateId': {
    role: 'operator', field: 'config.sections.0.seedPlateId',
    prepare: async (a, b) => {
      const [ea, eb] = [await equipment(a), await equipment(b)]
      const body = (plate: number) => {
        const config = configOf(ea)
        config.sections[0].seedPlateId = plate
        config.rowUnits[1].seedPlateId = plate
        return { baseRevision: 1, config }
      }
      return { method: 'POST', path: `/api/setups/${ea.setup}/revisions`, foreign: body(eb.plate), own: body(ea.plate), watch: [['setups', ea.setup], ['seed_plates', eb.plate]] }
    },
  },
  'POST /api/setups/:id/revisions with another farm\'s sectionId': {
    role: 'operator', field: 'config.sections.0.sectionId',
    prepare: async (a, b) => {
      const [ea, eb] = [await equipment(a), await equipment(b)]
      const body = (section: number) => {
        const config = configOf(ea)
        config.sections[0].sectionId = section
        return { baseRevision: 1, config }
      }
      return { method: 'POST', path: `/api/setups/${ea.setup}/revisions`, foreign: body(eb.section), own: body(ea.section), watch: [['setups', ea.setup], ['drive_sections', eb.section]] }
    },
  },
  'POST /api/setups/:id/calibrations on another farm\'s setup, saved to it': {
    role: 'operator', field: null,
    prepare: async (a, b) => {
      const [ea, eb] = [await equipment(a), await equipment(b)]
      const body = catchBody({ saveToSetup: true, dialSetting: 20 })
      return { method: 'POST', path: `/api/setups/${eb.setup}/calibrations`, foreign: body, own: body, ownPath: `/api/setups/${ea.setup}/calibrations`, watch: [['setups', eb.setup]] }
    },
  },
  'POST /api/application-records with another farm\'s fieldId': {
    role: 'owner', field: 'fieldId',
    prepare: async (a, b) => {
      const [fa, fb] = [await fieldAndLot(a), await fieldAndLot(b)]
      return { method: 'POST', path: '/api/application-records', foreign: { ...recordBody(), fieldId: fb.field }, own: { ...recordBody(), fieldId: fa.field }, watch: [['fields', fb.field]] }
    },
  },
  'POST /api/application-records with another farm\'s calibrationRunId': {
    role: 'owner', field: 'calibrationRunId',
    prepare: async (a, b) => {
      const [ea, eb] = [await equipment(a), await equipment(b)]
      const [ra, rb] = [await calibrationRun(a, ea.setup), await calibrationRun(b, eb.setup)]
      return { method: 'POST', path: '/api/application-records', foreign: { ...recordBody(), calibrationRunId: rb }, own: { ...recordBody(), calibrationRunId: ra }, watch: [['calibration_runs', rb]] }
    },
  },
  'POST /api/application-records/:id/corrections with another farm\'s fieldId': {
    role: 'owner', field: 'fieldId',
    prepare: async (a, b) => {
      const [fa, fb] = [await fieldAndLot(a), await fieldAndLot(b)]
      const created = await (await a.as('owner')).post('/api/application-records', recordBody())
      expect(created.status).toBeLessThan(300)
      const body = (fieldId: number) => ({ reason: 'cross', record: { ...recordBody(), fieldId } })
      return { method: 'POST', path: `/api/application-records/${created.data.id}/corrections`, foreign: body(fb.field), own: body(fa.field), watch: [['application_records', created.data.id], ['fields', fb.field]] }
    },
  },
  'POST /api/application-records/:id/corrections with another farm\'s calibrationRunId': {
    role: 'owner', field: 'calibrationRunId',
    prepare: async (a, b) => {
      const [ea, eb] = [await equipment(a), await equipment(b)]
      const [ra, rb] = [await calibrationRun(a, ea.setup), await calibrationRun(b, eb.setup)]
      const created = await (await a.as('owner')).post('/api/application-records', recordBody())
      expect(created.status).toBeLessThan(300)
      const body = (calibrationRunId: number) => ({ reason: 'cross', record: { ...recordBody(), calibrationRunId } })
      return { method: 'POST', path: `/api/application-records/${created.data.id}/corrections`, foreign: body(rb), own: body(ra), watch: [['application_records', created.data.id], ['calibration_runs', rb]] }
    },
  },
  'POST /api/setups/:id/sheet/send to another farm\'s member': {
    role: 'foreman', field: 'memberId',
    prepare: async (a, b) => {
      const ea = await equipment(a)
      const [ma, mb] = [await membershipId(a, 'operator'), await membershipId(b, 'operator')]
      return { method: 'POST', path: `/api/setups/${ea.setup}/sheet/send`, foreign: { memberId: mb }, own: { memberId: ma }, watch: [['memberships', mb]] }
    },
  },
  'POST /api/inspections with another farm\'s planterId': {
    role: 'operator', field: 'planterId',
    prepare: async (a, b) => {
      const [ea, eb] = [await equipment(a), await equipment(b)]
      return { method: 'POST', path: '/api/inspections', foreign: { planterId: eb.planter }, own: { planterId: ea.planter }, watch: [['planters', eb.planter]] }
    },
  },
  'POST /api/inspections with another farm\'s templateId': {
    role: 'operator', field: 'templateId',
    prepare: async (a, b) => {
      const ea = await equipment(a)
      const [ta, tb] = [await template(a), await template(b)]
      return { method: 'POST', path: '/api/inspections', foreign: { planterId: ea.planter, templateId: tb }, own: { planterId: ea.planter, templateId: ta }, watch: [['checklist_templates', tb]] }
    },
  },
  'PATCH /api/inspection-items/:id with another farm\'s photoUploadIds': {
    role: 'operator', field: 'photoUploadIds',
    prepare: async (a, b) => {
      const ea = await equipment(a)
      const { item } = await inspectionItem(a, ea.planter)
      const mine = await upload(await a.as('operator'), png, 'mine.png')
      const theirs = await upload(await b.as('operator'), png, 'theirs.png')
      return { method: 'PATCH', path: `/api/inspection-items/${item}`, foreign: { result: 'ok', photoUploadIds: [mine, theirs] }, own: { result: 'ok', photoUploadIds: [mine] }, watch: [['inspection_items', item], ['uploads', theirs]] }
    },
  },
  'PATCH /api/work-items/:id assigned to another farm\'s user': {
    role: 'foreman', field: 'assignedTo',
    prepare: async (a, b) => {
      const ea = await equipment(a)
      const id = await workItem(a, ea.planter)
      return { method: 'PATCH', path: `/api/work-items/${id}`, foreign: { assignedTo: b.users.operator.id }, own: { assignedTo: a.users.operator.id }, watch: [['work_items', id]] }
    },
  },
  'PATCH /api/row-units/:id with another farm\'s seedPlateId': {
    role: 'foreman', field: 'seedPlateId',
    prepare: async (a, b) => {
      const [ea, eb] = [await equipment(a), await equipment(b)]
      return { method: 'PATCH', path: `/api/row-units/${ea.unit}`, foreign: { seedPlateId: eb.plate }, own: { seedPlateId: ea.plate }, watch: [['row_units', ea.unit], ['seed_plates', eb.plate], ['planters', ea.planter]] }
    },
  },
  'PATCH /api/planters/:id/row-units with another farm\'s seedPlateId': {
    role: 'foreman', field: 'seedPlateId',
    prepare: async (a, b) => {
      const [ea, eb] = [await equipment(a), await equipment(b)]
      const body = (seedPlateId: number) => ({ positions: [1, 2], changes: { seedPlateId } })
      return { method: 'PATCH', path: `/api/planters/${ea.planter}/row-units`, foreign: body(eb.plate), own: body(ea.plate), watch: [['row_units', ea.unit], ['seed_plates', eb.plate], ['planters', ea.planter]] }
    },
  },
  'POST /api/auth/switch-farm to a farm the user is not a member of': {
    covers: 'farmId', role: 'operator', field: null,
    prepare: async (a, b) => {
      // A farm of A's operator's own, to switch to for the control.
      const [own] = await sql<{ id: number }>(`insert into farms (name) values ('Cross second farm') returning id`)
      await sql('insert into memberships (farm_id, user_id, role) values ($1, $2, $3)', [own!.id, a.users.operator.id, 'operator'])
      return { method: 'POST', path: '/api/auth/switch-farm', foreign: { farmId: b.farmId }, own: { farmId: own!.id }, watch: [] }
    },
  },
}

// Farm B's own owner sees each of these, so the filter would match if the farm were not applied.
const LISTS: [string, (ids: { setup: number, planter: number, field: number, plan: number }) => string][] = [
  ['GET /api/checks?setupId', (i) => `/api/checks?setupId=${i.setup}`],
  ['GET /api/checks?fieldId', (i) => `/api/checks?fieldId=${i.field}`],
  ['GET /api/checks?planId', (i) => `/api/checks?planId=${i.plan}`],
  ['GET /api/plans?fieldId', (i) => `/api/plans?fieldId=${i.field}`],
  ['GET /api/plans?planterId', (i) => `/api/plans?planterId=${i.planter}`],
  ['GET /api/setups?planterId', (i) => `/api/setups?planterId=${i.planter}`],
  ['GET /api/inspections?planterId', (i) => `/api/inspections?planterId=${i.planter}`],
  ['GET /api/work-items?planterId', (i) => `/api/work-items?planterId=${i.planter}`],
]

describe('ids of another farm in a write\'s body', () => {
  let a: TestFarm
  let b: TestFarm
  const clients = {} as Record<Role, Client>
  beforeAll(async () => {
    a = await createFarm()
    b = await createFarm()
  })

  it.each(Object.keys(CASES))('%s is refused and writes nothing', async (name) => {
    const c = CASES[name]!
    const p = await c.prepare(a, b)
    // A fresh session each time: switching farms must not carry over to the next case.
    clients[c.role] = await a.as(c.role)
    const before = await snapshot(p.watch)
    const res = await clients[c.role].request(p.method, p.path, p.foreign)
    const said = `${res.status} ${JSON.stringify(res.data).slice(0, 300)}`
    if (c.field) {
      expect(res.status, said).toBe(400)
      expect(res.data.message, said).toMatch(/\w/)
      expect(res.data.data?.fields?.[c.field], `message for ${c.field}: ${said}`).toMatch(/\w/)
    } else {
      expect(res.status, said).toBe(c.status ?? 404)
    }
    expect(await snapshot(p.watch), 'nothing changed').toEqual(before)
    if (p.own !== undefined) {
      const ok = await clients[c.role].request(p.method, p.ownPath ?? p.path, p.own)
      expect(ok.status, `the same request with farm A's own id: ${JSON.stringify(ok.data).slice(0, 300)}`).toBeLessThan(300)
    }
  })
})

describe('install of a revision that names another farm\'s plate', () => {
  it('is refused, moves no stock of either farm and changes no row unit', async () => {
    const a = await createFarm()
    const b = await createFarm()
    const [ea, eb] = [await equipment(a), await equipment(b)]
    // A revision cannot be saved with a foreign plate (see above); one written straight into the
    // database stands for data from before that check, and the install must still refuse it.
    const config = configOf(ea)
    config.sections[0].seedPlateId = eb.plate
    config.sections[0].plateCode = 'THEIRS'
    config.rowUnits = config.rowUnits.map((u: Record<string, unknown>) => ({ ...u, seedPlateId: eb.plate }))
    await sql(`insert into setup_revisions (setup_id, revision, config, results) select setup_id, 2, $2, results from setup_revisions where setup_id = $1 and revision = 1`, [ea.setup, JSON.stringify(config)])
    await sql('update setups set latest_revision = 2 where id = $1', [ea.setup])
    const watch: Watch[] = [['seed_plates', eb.plate], ['seed_plates', ea.plate], ['planters', ea.planter], ['setups', ea.setup], ['row_units', ea.unit]]
    const before = await snapshot(watch)
    const foreman = await a.as('foreman')
    const res = await foreman.post(`/api/setups/${ea.setup}/install`, { revision: 2, planterConfigVersion: 1 })
    expect(res.status, JSON.stringify(res.data)).toBe(409)
    expect(res.data.message).toMatch(/not in the inventory/)
    expect(await snapshot(watch)).toEqual(before)
    const units = await sql<{ n: number }>('select count(*)::int as n from row_units where seed_plate_id = $1', [eb.plate])
    expect(units[0]!.n).toBe(0)
    // The pick list of that revision does not count the other farm's shelf either.
    const pick = await foreman.get(`/api/setups/${ea.setup}/pick-list?revision=2`)
    expect(pick.status).toBe(200)
    expect(JSON.stringify(pick.data)).not.toContain(`"inventoryId":${eb.plate}`)
    // Revision 1 carries farm A's parts only and goes on.
    const own = await foreman.post(`/api/setups/${ea.setup}/install`, { revision: 1, planterConfigVersion: 1 })
    expect(own.status, JSON.stringify(own.data)).toBe(200)
    expect(own.data.installedRevision).toBe(1)
  })
})

describe('reads with another farm\'s ids in the query', () => {
  let a: TestFarm
  let b: TestFarm
  let reader: Client
  let eb: Awaited<ReturnType<typeof equipment>>
  let pb: Awaited<ReturnType<typeof planFixture>>
  let ea: Awaited<ReturnType<typeof equipment>>
  beforeAll(async () => {
    a = await createFarm()
    b = await createFarm()
    ea = await equipment(a)
    pb = await planFixture(b)
    eb = await equipment(b)
    await sql('update crop_plans set planter_id = $2, setup_id = $3 where id = $1', [pb.id, eb.planter, eb.setup])
    await check(b, eb.setup, pb.field, pb.id)
    const [ib] = await sql<{ id: number }>(`insert into inspections (farm_id, planter_id, template_name) values ($1, $2, 'Theirs') returning id`, [b.farmId, eb.planter])
    expect(ib).toBeTruthy()
    await workItem(b, eb.planter)
    reader = await a.as('owner')
  })


  it.each(LISTS)('%s of another farm lists nothing of theirs', async (_name, path) => {
    const ids = { setup: eb.setup, planter: eb.planter, field: pb.field, plan: pb.id }
    const theirs = await (await b.as('owner')).get(path(ids))
    expect(theirs.status).toBe(200)
    const theirItems = Array.isArray(theirs.data) ? theirs.data : theirs.data.items
    expect(theirItems.length, 'farm B sees its own record through this filter').toBeGreaterThan(0)
    const res = await reader.get(path(ids))
    expect(res.status).toBe(200)
    const items = Array.isArray(res.data) ? res.data : res.data.items
    expect(items).toEqual([])
  })

  it('refuses a rate chart of farm A\'s planter with farm B\'s plate or section', async () => {
    const plate = await reader.get(`/api/planters/${ea.planter}/rate-chart?plateId=${eb.plate}`)
    expect(plate.status).toBe(404)
    const csv = await reader.get(`/api/planters/${ea.planter}/rate-chart.csv?plateId=${eb.plate}`)
    expect(csv.status).toBe(404)
    const section = await reader.get(`/api/planters/${ea.planter}/rate-chart?sectionId=${eb.section}`)
    expect(section.status).toBe(404)
    const own = await reader.get(`/api/planters/${ea.planter}/rate-chart?plateId=${ea.plate}&sectionId=${ea.section}`)
    expect(own.status).toBe(200)
    expect(own.data.cellsPerPlate).toBe(30)
  })

  it('refuses to solve farm A\'s planter for farm B\'s drive section', async () => {
    const res = await reader.post(`/api/planters/${ea.planter}/solve`, { targetSeedsPerAcre: 34000, sectionId: eb.section })
    expect(res.status).toBe(404)
    const own = await reader.post(`/api/planters/${ea.planter}/solve`, { targetSeedsPerAcre: 34000, sectionId: ea.section })
    expect(own.status).toBe(200)
    expect(own.data.sectionId).toBe(ea.section)
  })
})

// Every id field of a body or query schema has a case above, so a new one without a case fails here.
describe('coverage of the id fields in shared/schemas', () => {
  it('has a case for each', async () => {
    const { readdir, readFile } = await import('node:fs/promises')
    const dir = new URL('../../shared/schemas/', import.meta.url)
    const found = new Set<string>()
    for (const f of await readdir(dir)) {
      const text = await readFile(new URL(f, dir), 'utf8')
      for (const m of text.matchAll(/\b(\w+Ids?|assignedTo)\s*:/g)) found.add(m[1]!)
    }
    const covered = new Set<string>([
      ...Object.values(CASES).flatMap((c) => c.covers ?? c.field?.split('.').pop() ?? []),
      ...LISTS.map(([name]) => name.split('?')[1]!),
      // The rate chart and solver reads below.
      'plateId', 'sectionId',
    ])
    expect(found.size).toBeGreaterThan(10)
    expect([...found].filter((k) => !covered.has(k)).sort()).toEqual([])
  })
})
