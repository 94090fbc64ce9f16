import { describe, expect, it } from 'vitest'
import { PDFParse } from 'pdf-parse'
import { baseUrl, createFarm, sql, waitForMail, type Client, type TestFarm } from './helpers'

interface Ctx { farm: TestFarm, foreman: Client, planterId: number, setupId: number, c30: number, s48: number, config: Record<string, unknown> }

// An invented farm: a 4-row, 30 in planter on plate P-C30 with a 19/23 + 17/26 drive; the setup moves
// it to plate P-S48 and a 17/23 first stage, dual-rib press wheels on rows 1-2 and granular on row 1.
async function shopFarm(s48OnHand = 3): Promise<Ctx> {
  const farm = await createFarm()
  const foreman = await farm.as('foreman')
  const c30 = (await foreman.post('/api/plates', { code: 'P-C30', crops: ['corn', 'soybeans'], cellsPerPlate: 30, quantityOnHand: 2 })).data.id
  const s48 = (await foreman.post('/api/plates', { code: 'P-S48', crops: ['soybeans'], cellsPerPlate: 48, quantityOnHand: s48OnHand })).data.id
  expect((await foreman.post('/api/sprockets', { teeth: 17, chainPitch: '#40', quantityOnHand: 1 })).status).toBe(201)
  const planter = (await foreman.post('/api/planters', {
    name: 'Shop 4', frameKind: 'mounted', rowCount: 4, rowSpacingIn: 30, wheelCircumferenceIn: 86.4,
    stages: [{ driverTeeth: 19, drivenTeeth: 23 }, { driverTeeth: 17, drivenTeeth: 26 }],
  })).data
  await foreman.patch(`/api/planters/${planter.id}/row-units`, { positions: [1, 2, 3, 4], changes: { seedPlateId: c30 } })
  const draft = (await foreman.get(`/api/planters/${planter.id}/setup-draft?crop=soybeans&target=140000`)).data
  const config = draft.config
  config.sections[0].seedPlateId = s48
  config.sections[0].stages[0].driverTeeth = 17
  config.rowUnits = config.rowUnits.map((u: Record<string, unknown>) => ({
    ...u, seedPlateId: s48, depthIn: 1.5, pressWheel: (u.position as number) <= 2 ? 'dual-rib' : 'open-center',
    ...(u.position === 1 ? { granular: 'insecticide', granularDialSetting: 18, granularBandWidthIn: 7 } : {}), fertilizerSetting: '2x2 at 5 gal/acre',
  }))
  const setup = await foreman.post('/api/setups', { planterId: planter.id, name: 'Shop 4 beans', config })
  expect(setup.status).toBe(201)
  return { farm, foreman, planterId: planter.id, setupId: setup.data.id, c30, s48, config }
}

// The smallest file the server takes for a PNG photo: the 8-byte signature and a chunk header.
const PNG_BYTES = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52])

async function sendFile(c: Client, body: Uint8Array | string, kind = 'any') {
  const res = await fetch(`${baseUrl()}/api/uploads?kind=${kind}`, { method: 'POST', headers: { cookie: c.cookie }, body: typeof body === 'string' ? body : new Blob([body as Uint8Array<ArrayBuffer>]) })
  expect(res.status).toBe(201)
  return (await res.json() as { id: number }).id
}

async function pdfText(c: Client, path: string) {
  const res = await fetch(`${baseUrl()}${path}`, { headers: { cookie: c.cookie } })
  expect(res.status).toBe(200)
  expect(res.headers.get('content-type')).toBe('application/pdf')
  const data = new Uint8Array(await res.arrayBuffer())
  expect(Buffer.from(data.slice(0, 5)).toString()).toBe('%PDF-')
  const parser = new PDFParse({ data })
  const { text } = await parser.getText()
  await parser.destroy()
  return text
}

const counts = async (ctx: Ctx) => ({
  plates: await sql<{ code: string, q: number }>('select code, quantity_on_hand as q from seed_plates where farm_id = $1 order by code', [ctx.farm.farmId]),
  sprockets: await sql<{ teeth: number, q: number }>('select teeth, quantity_on_hand as q from sprockets where farm_id = $1 order by teeth', [ctx.farm.farmId]),
  planter: await sql<{ v: number }>('select config_version as v from planters where id = $1', [ctx.planterId]),
  units: await sql<{ p: number, plate: number, press: string, depth: string }>('select position as p, seed_plate_id as plate, press_wheel as press, depth_in as depth from row_units where planter_id = $1 order by position', [ctx.planterId]),
  stages: await sql<{ driver: number, driven: number }>('select driver_teeth as driver, driven_teeth as driven from drive_stages s join drive_sections d on d.id = s.section_id where d.planter_id = $1 order by s.position', [ctx.planterId]),
  setup: await sql<{ rev: number | null }>('select installed_revision as rev from setups where id = $1', [ctx.setupId]),
})

describe('setup sheets', () => {
  it('renders a PDF whose text carries the row table, parts to pull, cautions and sign lines', async () => {
    const ctx = await shopFarm()
    const text = await pdfText(ctx.foreman, `/api/setups/${ctx.setupId}/sheet.pdf`)
    expect(text).toContain('SETUP SHEET')
    expect(text).toContain('Shop 4 beans')
    expect(text).toContain('Press wheel: open-center to dual-rib on rows 1, 2')
    expect(text).toContain(ctx.farm.farmName)
    for (const v of ['P-S48', '17/23 · 17/26', '1.5 in', 'dual-rib', 'open-center', 'insecticide · dial 18 · 7 in band', '2x2 at 5 gal/acre']) expect(text).toContain(v)
    // 1/1000 acre of 30 in rows is 17 ft 5 in = 17.4 ft (University of Tennessee Extension, "Checking corn populations", 2011).
    expect(text).toContain('17.4 ft of row')
    expect(text).toMatch(/Plate P-S48: pull 4, put back 0 · on the shelf 3, then -1 · SHORT 1/)
    expect(text).toContain('product label')
    for (const s of ['Prepared by', 'Checked by', 'Date']) expect(text).toContain(s)
  })

  it('prints another revision with ?revision=N and answers 404 for one that does not exist', async () => {
    const ctx = await shopFarm()
    const config = { ...ctx.config, rowUnits: (ctx.config.rowUnits as Record<string, unknown>[]).map((u) => ({ ...u, depthIn: 2.25 })) }
    expect((await ctx.foreman.post(`/api/setups/${ctx.setupId}/revisions`, { baseRevision: 1, config })).status).toBe(201)
    expect(await pdfText(ctx.foreman, `/api/setups/${ctx.setupId}/sheet.pdf`)).toContain('2.25 in')
    const first = await pdfText(ctx.foreman, `/api/setups/${ctx.setupId}/sheet.pdf?revision=1`)
    expect(first).toContain('Revision 1 of 2')
    expect(first).not.toContain('2.25 in')
    expect((await ctx.foreman.get(`/api/setups/${ctx.setupId}/sheet.pdf?revision=9`)).status).toBe(404)
    const json = (await ctx.foreman.get(`/api/setups/${ctx.setupId}/sheet?revision=1`)).data
    expect(json.rows[0]).toMatchObject({ row: 1, plate: 'P-S48', depth: '1.5 in', pressWheel: 'dual-rib' })
    expect(json.url).toMatch(new RegExp(`/setups/${ctx.setupId}$`))
    expect(json.qrDataUrl).toMatch(/^data:image\/png;base64,/)
  })

  it('mails the PDF to a member of the farm, and refuses someone from another farm', async () => {
    const ctx = await shopFarm()
    const [op] = await sql<{ id: number }>('select id from memberships where farm_id = $1 and user_id = $2', [ctx.farm.farmId, ctx.farm.users.operator.id])
    const res = await ctx.foreman.post(`/api/setups/${ctx.setupId}/sheet/send`, { memberId: op!.id, message: 'Sheet for the bean field' })
    expect(res.status).toBe(202)
    const mail = await waitForMail((m) => m.to.includes(ctx.farm.users.operator.email) && m.subject.includes('Shop 4 beans'))
    expect(mail.text).toContain('Sheet for the bean field')
    expect(mail.attachments).toHaveLength(1)
    expect(mail.attachments[0]).toMatchObject({ contentType: 'application/pdf', filename: 'setup-sheet-shop-4-beans-rev1.pdf' })
    const attached = new PDFParse({ data: new Uint8Array(Buffer.from(mail.attachments[0]!.contentBase64, 'base64')) })
    expect((await attached.getText()).text).toContain('dual-rib')
    await attached.destroy()
    const other = await createFarm()
    const [foreign] = await sql<{ id: number }>('select id from memberships where farm_id = $1 limit 1', [other.farmId])
    const bad = await ctx.foreman.post(`/api/setups/${ctx.setupId}/sheet/send`, { memberId: foreign!.id })
    expect(bad.status).toBe(400)
    expect(bad.data.data.fields.memberId).toMatch(/Not a member/)
  })
})

describe('parts to pull and the install', () => {
  it('lists what moves between shelf and planter against a hand-made inventory, with the shortfall', async () => {
    const ctx = await shopFarm()
    const pick = (await ctx.foreman.get(`/api/setups/${ctx.setupId}/pick-list`)).data
    expect(pick.planterConfigVersion).toBeGreaterThan(0)
    expect(pick.plates.map((l: Record<string, unknown>) => [l.label, l.pull, l.putBack, l.onHand, l.after, l.short])).toEqual([['P-C30', 0, 4, 2, 6, 0], ['P-S48', 4, 0, 3, -1, 1]])
    expect(pick.sprockets.map((l: Record<string, unknown>) => [l.label, l.pull, l.putBack, l.onHand, l.after])).toEqual([['17 teeth #40', 1, 0, 1, 0], ['19 teeth #40', 0, 1, 0, 1]])
    expect(pick.parts).toEqual([{ part: 'Press wheel', from: 'open-center', to: 'dual-rib', rows: [1, 2] }])
    expect(pick.adjustments).toContainEqual({ part: 'Depth', from: '1.75 in', to: '1.5 in', rows: [1, 2, 3, 4] })
    expect(pick.shortCount).toBe(1)
  })

  it('rolls the install back on a shortfall and on a stale planter version, leaving counts and planter as they were', async () => {
    const ctx = await shopFarm()
    const before = await counts(ctx)
    const version = before.planter[0]!.v
    const short = await ctx.foreman.post(`/api/setups/${ctx.setupId}/install`, { revision: 1, planterConfigVersion: version })
    expect(short.status).toBe(409)
    expect(short.data.message).toMatch(/Not enough of plate P-S48 on the shelf: 4 to pull, 0 to put back, 3 there\. Nothing was changed\./)
    expect(await counts(ctx)).toEqual(before)

    // Someone changes the planter after the pick list was read.
    await ctx.foreman.patch(`/api/plates/${ctx.s48}`, { quantityOnHand: 4 })
    await ctx.foreman.patch(`/api/planters/${ctx.planterId}`, { notes: 'touched' })
    const mid = await counts(ctx)
    const stale = await ctx.foreman.post(`/api/setups/${ctx.setupId}/install`, { revision: 1, planterConfigVersion: version })
    expect(stale.status).toBe(409)
    expect(stale.data.message).toMatch(/changed Shop 4 after you opened the pick list/)
    expect(await counts(ctx)).toEqual(mid)
  })

  it('installs in one go: row units, stages, shelf counts, planter version and the installed revision', async () => {
    const ctx = await shopFarm(4)
    const { planterConfigVersion } = (await ctx.foreman.get(`/api/setups/${ctx.setupId}/pick-list`)).data
    const res = await ctx.foreman.post(`/api/setups/${ctx.setupId}/install`, { revision: 1, planterConfigVersion })
    expect(res.status).toBe(200)
    const after = await counts(ctx)
    expect(after.plates).toEqual([{ code: 'P-C30', q: 6 }, { code: 'P-S48', q: 0 }])
    expect(after.sprockets).toEqual([{ teeth: 17, q: 0 }, { teeth: 19, q: 1 }])
    expect(after.planter[0]!.v).toBe(planterConfigVersion + 1)
    expect(after.units.map((u) => [u.p, u.plate, u.press, Number(u.depth)])).toEqual([[1, ctx.s48, 'dual-rib', 1.5], [2, ctx.s48, 'dual-rib', 1.5], [3, ctx.s48, 'open-center', 1.5], [4, ctx.s48, 'open-center', 1.5]])
    expect(after.stages).toEqual([{ driver: 17, driven: 23 }, { driver: 17, driven: 26 }])
    expect(after.setup[0]!.rev).toBe(1)
    expect((await ctx.foreman.get(`/api/setups/${ctx.setupId}/pick-list`)).data.unchanged).toBe(true)
    const [audit] = await sql<{ n: number }>(`select count(*)::int as n from audit_log where farm_id = $1 and action = 'install' and entity_id = $2`, [ctx.farm.farmId, ctx.setupId])
    expect(audit!.n).toBe(1)
  })

  it('moves the crop plans that approved the installed revision to "planter set", and no others', async () => {
    const ctx = await shopFarm(4)
    const [field] = await sql<{ id: number }>('insert into fields (farm_id, name, acres) values ($1, $2, 80) returning id', [ctx.farm.farmId, 'Install 80'])
    const plan = async (status: string, approvedRevision: number | null) => (await sql<{ id: number }>(
      `insert into crop_plans (farm_id, season, field_id, crop, target_stand, row_spacing_in, planter_id, setup_id, status, approved_revision)
       values ($1, 2027, $2, 'soybeans', 130000, 30, $3, $4, $5, $6) returning id`, [ctx.farm.farmId, field!.id, ctx.planterId, ctx.setupId, status, approvedRevision]))[0]!.id
    const approved = await plan('approved', 1)
    const waiting = await plan('submitted', null)
    const { planterConfigVersion } = (await ctx.foreman.get(`/api/setups/${ctx.setupId}/pick-list`)).data
    const res = await ctx.foreman.post(`/api/setups/${ctx.setupId}/install`, { revision: 1, planterConfigVersion })
    expect(res.status).toBe(200)
    expect(res.data.plansSetUp).toEqual([approved])
    const rows = await sql<{ id: number, status: string }>('select id, status from crop_plans where id = any($1) order by id', [[approved, waiting]])
    expect(rows).toEqual([{ id: approved, status: 'set-up' }, { id: waiting, status: 'submitted' }])
    const [event] = await sql<{ to: string, comment: string }>('select to_status as to, comment from plan_events where plan_id = $1', [approved])
    expect(event).toEqual({ to: 'set-up', comment: 'Revision 1 was installed on the planter' })
  })

  it('lets only the foreman and the owner mark a setup installed', async () => {
    const ctx = await shopFarm(4)
    const before = await counts(ctx)
    for (const role of ['operator', 'agronomist'] as const) {
      const c = await ctx.farm.as(role)
      expect((await c.post(`/api/setups/${ctx.setupId}/install`, { revision: 1, planterConfigVersion: before.planter[0]!.v })).status).toBe(403)
    }
    expect(await counts(ctx)).toEqual(before)
    const owner = await ctx.farm.as('owner')
    expect((await owner.post(`/api/setups/${ctx.setupId}/install`, { revision: 1, planterConfigVersion: before.planter[0]!.v })).status).toBe(200)
    const bad = await owner.post(`/api/setups/${ctx.setupId}/install`, { revision: 'one' })
    expect(bad.status).toBe(400)
    expect(Object.keys(bad.data.data.fields).sort()).toEqual(['planterConfigVersion', 'revision'])
  })
})

describe('checklists, inspections and the work board', () => {
  it('lets only the foreman and the owner edit checklists, with a message per field for bad ones', async () => {
    const ctx = await shopFarm()
    const list = (await ctx.foreman.get('/api/checklists')).data
    expect(list.defaultItems.map((i: { label: string }) => i.label)).toContain('Drive tire pressure')
    for (const role of ['operator', 'agronomist'] as const) {
      const c = await ctx.farm.as(role)
      expect((await c.post('/api/checklists', { name: 'Mine', items: [{ area: 'Drive', label: 'Chains' }] })).status).toBe(403)
    }
    const made = await ctx.foreman.post('/api/checklists', { name: 'Spring', items: [{ area: 'Drive', label: 'Chains' }] })
    expect(made.status).toBe(201)
    const owner = await ctx.farm.as('owner')
    expect((await owner.patch(`/api/checklists/${made.data.id}`, { name: 'Spring list' })).data.name).toBe('Spring list')
    expect((await (await ctx.farm.as('operator')).patch(`/api/checklists/${made.data.id}`, { name: 'x' })).status).toBe(403)
    const bad = await ctx.foreman.post('/api/checklists', { name: '', items: [{ area: '', label: 'x' }] })
    expect(bad.status).toBe(400)
    expect(bad.data.data.fields).toMatchObject({ 'name': 'Name the checklist', 'items.0.area': 'Name the area' })
  })

  it('runs an inspection: every item answered before completing, needs-fixing items become work items', async () => {
    const ctx = await shopFarm()
    const t = (await ctx.foreman.post('/api/checklists', { name: 'Short', items: [{ area: 'Drive', label: 'Chains' }, { area: 'Row units', label: 'Press wheels' }, { area: 'Meters', label: 'Plates' }] })).data
    const ins = (await ctx.foreman.post('/api/inspections', { planterId: ctx.planterId, templateId: t.id })).data
    expect(ins.items.map((i: { label: string }) => i.label)).toEqual(['Chains', 'Press wheels', 'Plates'])
    const [a, b, c] = ins.items as { id: number }[]
    await ctx.foreman.patch(`/api/inspection-items/${a!.id}`, { result: 'ok' })
    const photo = await sendFile(ctx.foreman, PNG_BYTES, 'photo')
    expect((await ctx.foreman.patch(`/api/inspection-items/${b!.id}`, { result: 'needs-fixing', notes: 'Row 3 bearing rough', photoUploadIds: [photo] })).data.photoUploadIds).toEqual([photo])
    const early = await ctx.foreman.post(`/api/inspections/${ins.id}/complete`, {})
    expect(early.status).toBe(400)
    expect(early.data.data.fields['items.3']).toBe('Check “Plates”')
    await ctx.foreman.patch(`/api/inspection-items/${c!.id}`, { result: 'replaced' })
    const done = await ctx.foreman.post(`/api/inspections/${ins.id}/complete`, {})
    expect(done.status).toBe(200)
    expect(done.data.status).toBe('completed')
    expect(done.data.workItems.map((w: { title: string, notes: string }) => [w.title, w.notes])).toEqual([['Row units: Press wheels', 'Row 3 bearing rough']])
    expect((await ctx.foreman.patch(`/api/inspection-items/${a!.id}`, { result: 'replaced' })).status).toBe(409)

    const board = (await ctx.foreman.get('/api/work-items?status=open')).data
    expect(board).toHaveLength(1)
    const w = board[0]
    // The work item shows the photos of the item it came from.
    expect(w.photoUploadIds).toEqual([photo])
    expect((await (await ctx.farm.as('agronomist')).patch(`/api/work-items/${w.id}`, { status: 'closed' })).status).toBe(403)
    expect((await ctx.foreman.patch(`/api/work-items/${w.id}`, { status: 'in-progress' })).data.status).toBe('in-progress')
    const closed = (await ctx.foreman.patch(`/api/work-items/${w.id}`, { status: 'closed' })).data
    expect(closed.closedAt).not.toBeNull()
    expect((await ctx.foreman.get('/api/shop/overview')).data.openWorkItems).toEqual([])
    const other = await (await createFarm()).as('owner')
    expect((await other.get(`/api/inspections/${ins.id}`)).status).toBe(404)
    expect((await other.patch(`/api/work-items/${w.id}`, { status: 'open' })).status).toBe(404)
  })
})

describe('photos on inspection items', () => {
  it('links only this farm\'s photos, keeps each once, removes one and changes nothing on a refusal', async () => {
    const ctx = await shopFarm()
    const ins = (await ctx.foreman.post('/api/inspections', { planterId: ctx.planterId })).data
    const item = ins.items[0] as { id: number }
    const operator = await ctx.farm.as('operator')
    const p1 = await sendFile(operator, PNG_BYTES, 'photo')
    const p2 = await sendFile(ctx.foreman, PNG_BYTES, 'photo')
    const csv = await sendFile(ctx.foreman, 'spacing\n6\n', 'csv')
    const stranger = await (await createFarm()).as('foreman')
    const theirs = await sendFile(stranger, PNG_BYTES, 'photo')

    const both = await operator.patch(`/api/inspection-items/${item.id}`, { photoUploadIds: [p1, p2, p1] })
    expect(both.status).toBe(200)
    expect(both.data.photoUploadIds).toEqual([p1, p2])
    const auditBefore = (await sql<{ n: number }>(`select count(*)::int as n from audit_log where entity = 'inspection_item' and entity_id = $1`, [item.id]))[0]!.n
    expect(auditBefore).toBe(1)

    for (const bad of [[p1, theirs], [csv], [p1, 2_000_000_000]]) {
      const res = await ctx.foreman.patch(`/api/inspection-items/${item.id}`, { photoUploadIds: bad, notes: 'should not be saved' })
      expect(res.status).toBe(400)
      expect(res.data.data.fields.photoUploadIds).toBe('Unknown file or wrong type')
    }
    const tooMany = await ctx.foreman.patch(`/api/inspection-items/${item.id}`, { photoUploadIds: Array.from({ length: 11 }, () => p1) })
    expect(tooMany.status).toBe(400)
    expect(tooMany.data.data.fields.photoUploadIds).toBe('At most 10 photos')
    const [kept] = await sql<{ photo_upload_ids: number[], notes: string | null }>('select photo_upload_ids, notes from inspection_items where id = $1', [item.id])
    expect(kept).toEqual({ photo_upload_ids: [p1, p2], notes: null })
    expect((await sql<{ n: number }>(`select count(*)::int as n from audit_log where entity = 'inspection_item' and entity_id = $1`, [item.id]))[0]!.n).toBe(1)

    // Served to members of the farm only, with the type found in the bytes.
    const served = await fetch(`${baseUrl()}/api/uploads/${p2}`, { headers: { cookie: operator.cookie } })
    expect(served.status).toBe(200)
    expect(served.headers.get('content-type')).toBe('image/png')
    expect(new Uint8Array(await served.arrayBuffer())).toEqual(PNG_BYTES)
    expect((await stranger.get(`/api/uploads/${p2}`)).status).toBe(404)
    expect((await stranger.patch(`/api/inspection-items/${item.id}`, { photoUploadIds: [theirs] })).status).toBe(404)

    const removed = await ctx.foreman.patch(`/api/inspection-items/${item.id}`, { photoUploadIds: [p2] })
    expect(removed.data.photoUploadIds).toEqual([p2])
    const [audit] = await sql<{ before: { photoUploadIds: number[] }, after: { photoUploadIds: number[] } }>(`select before, after from audit_log where entity = 'inspection_item' and entity_id = $1 order by id desc limit 1`, [item.id])
    expect([audit!.before.photoUploadIds, audit!.after.photoUploadIds]).toEqual([[p1, p2], [p2]])
    expect((await (await ctx.farm.as('agronomist')).patch(`/api/inspection-items/${item.id}`, { photoUploadIds: [] })).status).toBe(403)
  })
})

describe('maintenance log', () => {
  it('counts acres from crop plans marked planted since each service and says when service is due', async () => {
    const ctx = await shopFarm()
    const [f1] = await sql<{ id: number }>('insert into fields (farm_id, name, acres) values ($1, $2, 80) returning id', [ctx.farm.farmId, 'River 80'])
    const [f2] = await sql<{ id: number }>('insert into fields (farm_id, name, acres) values ($1, $2, 160) returning id', [ctx.farm.farmId, 'Upland 160'])
    const plan = (field: number, status: string, plantedOn: string | null, plantedAcres: number | null) => sql(
      `insert into crop_plans (farm_id, season, field_id, crop, target_stand, row_spacing_in, planter_id, status, planted_on, planted_acres) values ($1, 2026, $2, 'soybeans', 130000, 30, $3, $4, $5, $6)`,
      [ctx.farm.farmId, field, ctx.planterId, status, plantedOn, plantedAcres],
    )
    await plan(f1!.id, 'planted', '2026-04-20', null)
    await plan(f2!.id, 'planted', '2026-05-02', 150)
    await plan(f2!.id, 'approved', null, null)
    const bad = await ctx.foreman.post(`/api/planters/${ctx.planterId}/service-events`, { servicedOn: '2026-13-40', task: '', nextDueOn: '2020-01-01' })
    expect(bad.status).toBe(400)
    expect(Object.keys(bad.data.data.fields).sort()).toEqual(['nextDueOn', 'servicedOn', 'task'])
    // 31 February passes Date.parse; it must be a 400 with the field named, not a 500 from PostgreSQL.
    const noSuchDay = await ctx.foreman.post(`/api/planters/${ctx.planterId}/service-events`, { servicedOn: '2026-02-31', task: 'Chains oiled', nextDueOn: '2027-02-29' })
    expect(noSuchDay.status).toBe(400)
    expect(noSuchDay.data.data.fields).toEqual({ servicedOn: 'Give a date that exists, as YYYY-MM-DD', nextDueOn: 'Give a date that exists, as YYYY-MM-DD' })
    expect((await (await ctx.farm.as('operator')).post(`/api/planters/${ctx.planterId}/service-events`, { servicedOn: '2026-04-01', task: 'x' })).status).toBe(403)
    expect((await ctx.foreman.post(`/api/planters/${ctx.planterId}/service-events`, { servicedOn: '2026-04-01', task: 'Chains oiled', intervalAcres: 200 })).status).toBe(201)
    expect((await ctx.foreman.post(`/api/planters/${ctx.planterId}/service-events`, { servicedOn: '2026-04-25', task: 'Bearings greased', intervalAcres: 200 })).status).toBe(201)
    const log = (await ctx.foreman.get(`/api/planters/${ctx.planterId}/maintenance`)).data
    // 80 ac (field acres when no planted acres were entered) + 150 ac entered = 230 ac planted.
    expect(log.acresPlanted).toBe(230)
    const byTask = Object.fromEntries(log.due.map((d: { task: string }) => [d.task, d]))
    expect(byTask['Chains oiled']).toMatchObject({ acresSinceService: 230, acresLeft: -30, state: 'due' })
    expect(byTask['Bearings greased']).toMatchObject({ acresSinceService: 150, acresLeft: 50, state: 'ok' })
    const overview = (await ctx.foreman.get('/api/shop/overview')).data
    expect(overview.due.filter((d: { state: string }) => d.state === 'due').map((d: { task: string, planterName: string }) => [d.planterName, d.task])).toEqual([['Shop 4', 'Chains oiled']])
  })
})
