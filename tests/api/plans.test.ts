import { beforeAll, describe, expect, it } from 'vitest'
import { createFarm, sql, waitForMail, type Client, type TestFarm } from './helpers'
import { equipment } from './route-rules'

interface Lot { id: number, lotNumber: string }

async function field(farm: TestFarm, name: string, acres: number) {
  const [f] = await sql<{ id: number }>('insert into fields (farm_id, name, acres) values ($1, $2, $3) returning id', [farm.farmId, name, acres])
  return f!.id
}

async function lot(farm: TestFarm, v: { crop: string, lotNumber: string, seedsPerLb: number, germinationPercent: number, unitKind: 'seeds' | 'lb', unitSize: number, unitsOnHand: number }): Promise<Lot> {
  const [l] = await sql<{ id: number }>(
    'insert into seed_lots (farm_id, crop, variety, lot_number, seeds_per_lb, germination_percent, unit_kind, unit_size, units_on_hand) values ($1, $2, $3, $4, $5, $6, $7, $8, $9) returning id',
    [farm.farmId, v.crop, `Test ${v.lotNumber}`, v.lotNumber, v.seedsPerLb, v.germinationPercent, v.unitKind, v.unitSize, v.unitsOnHand],
  )
  return { id: l!.id, lotNumber: v.lotNumber }
}

const cornLot = { crop: 'corn', lotNumber: 'C-1', seedsPerLb: 1600, germinationPercent: 95, unitKind: 'seeds' as const, unitSize: 80_000, unitsOnHand: 50 }
const soyLot = { crop: 'soybeans', lotNumber: 'S-1', seedsPerLb: 2800, germinationPercent: 90, unitKind: 'lb' as const, unitSize: 50, unitsOnHand: 100 }

describe('crop plans', () => {
  let farm: TestFarm
  let eq: Awaited<ReturnType<typeof equipment>>
  let owner: Client, agronomist: Client, operator: Client, foreman: Client
  let fieldId: number
  let corn: Lot

  beforeAll(async () => {
    farm = await createFarm()
    eq = await equipment(farm)
    ;[owner, agronomist, operator, foreman] = await Promise.all([farm.as('owner'), farm.as('agronomist'), farm.as('operator'), farm.as('foreman')])
    fieldId = await field(farm, 'North 100', 100)
    corn = await lot(farm, cornLot)
  })

  const newPlan = async (extra: Record<string, unknown> = {}) => {
    const res = await agronomist.post('/api/plans', { season: 2027, fieldId, crop: 'corn', seedLotId: corn.id, targetStand: 30_400, survivalPercent: 100, marginPercent: 3, rowSpacingIn: 30, planterId: eq.planter, ...extra })
    expect(res.status, JSON.stringify(res.data)).toBe(201)
    return res.data as { id: number, status: string }
  }

  it('the agronomist sets a target and the plan computes rate, seed and units; the operator may not create plans', async () => {
    const plan = await newPlan()
    expect(plan.status).toBe('draft')
    const res = await operator.get(`/api/plans/${plan.id}`)
    expect(res.status).toBe(200)
    // 30,400 ÷ (0.95 × 1.00) = 32,000 seeds/acre; × 100 acres × 1.03 = 3,296,000 seeds; ÷ 80,000 → 41.2 → 42 units.
    expect(res.data.seed.seedsPerAcre).toBeCloseTo(32_000, 6)
    expect(res.data.seed.seeds).toBeCloseTo(3_296_000, 3)
    expect(res.data.seed.units).toBe(42)
    expect(res.data.seed.lb).toBeCloseTo(2060, 6)
    expect(res.data.recommendation.choices.length).toBeGreaterThan(0)
    expect(res.data.recommendation.choices[0].plateCode).toMatch(/^M-/)
    expect(res.data.events).toHaveLength(1)
    expect((await operator.post('/api/plans', { season: 2027, fieldId, crop: 'corn', targetStand: 30_000, rowSpacingIn: 30 })).status).toBe(403)
    const list = await foreman.get('/api/plans?season=2027&status=draft')
    expect(list.data.items.map((p: { id: number }) => p.id)).toContain(plan.id)
    expect((await foreman.get('/api/plans?season=2026')).data.items).toEqual([])
  })

  it('refuses bad input with a message per field and writes nothing', async () => {
    const [before] = await sql<{ n: number }>('select count(*)::int as n from crop_plans where farm_id = $1', [farm.farmId])
    const bad = await agronomist.post('/api/plans', { season: 1999, fieldId, crop: 'rice', targetStand: 10, rowSpacingIn: 0, windowStart: '2027-05-10', windowEnd: '2027-05-01', extra: 1 })
    expect(bad.status).toBe(400)
    const f = bad.data.data.fields
    expect(f.season).toMatch(/2000 to 2100/)
    expect(f.crop).toMatch(/crop/)
    expect(f.targetStand).toMatch(/1,000 to 1,000,000/)
    expect(f.rowSpacingIn).toMatch(/more than 0/)
    expect(f.extra).toBe('Unknown field')
    const soy = await lot(farm, { ...soyLot, lotNumber: 'S-wrong' })
    const wrongLot = await agronomist.post('/api/plans', { season: 2027, fieldId, crop: 'corn', seedLotId: soy.id, targetStand: 30_000, rowSpacingIn: 30 })
    expect(wrongLot.status).toBe(400)
    expect(wrongLot.data.data.fields.seedLotId).toMatch(/soybeans/)
    const [after] = await sql<{ n: number }>('select count(*)::int as n from crop_plans where farm_id = $1', [farm.farmId])
    expect(after!.n).toBe(before!.n)
  })

  it('runs the review: submit with a setup, role rules, approval pins the revision and mails the operator', async () => {
    const plan = await newPlan()
    const path = `/api/plans/${plan.id}/transition`
    const noSetup = await operator.post(path, { to: 'submitted' })
    expect(noSetup.status).toBe(400)
    expect(noSetup.data.data.fields.setupId).toMatch(/setup/)
    expect((await agronomist.post(path, { to: 'approved' })).status).toBe(409)

    const submitted = await operator.post(path, { to: 'submitted', setupId: eq.setup, comment: 'Plates and sprockets from the solver' })
    expect(submitted.status, JSON.stringify(submitted.data)).toBe(200)
    expect(submitted.data).toMatchObject({ status: 'submitted', setupId: eq.setup, proposedBy: farm.users.operator.id })

    const byOperator = await operator.post(path, { to: 'approved' })
    expect(byOperator.status).toBe(403)
    expect(byOperator.data.message).toMatch(/agronomist or owner/)
    expect((await foreman.post(path, { to: 'changes-requested', comment: 'x' })).status).toBe(403)

    const noComment = await agronomist.post(path, { to: 'changes-requested' })
    expect(noComment.status).toBe(400)
    expect(noComment.data.data.fields.comment).toMatch(/change/)
    const changes = await agronomist.post(path, { to: 'changes-requested', comment: 'Go up one tooth on the driven sprocket' })
    expect(changes.data.status).toBe('changes-requested')
    await waitForMail((m) => m.to.includes(farm.users.operator.email) && /changes asked/i.test(m.subject) && m.text.includes('one tooth'))

    expect((await operator.post(path, { to: 'submitted' })).data.status).toBe('submitted')
    const approved = await agronomist.post(path, { to: 'approved', comment: 'Good to go' })
    expect(approved.status).toBe(200)
    expect(approved.data).toMatchObject({ status: 'approved', approvedRevision: 1, approvedBy: farm.users.agronomist.id, approverName: expect.stringContaining('agronomist') })
    const mail = await waitForMail((m) => m.to.includes(farm.users.operator.email) && /approved/i.test(m.subject))
    expect(mail.text).toContain('Good to go')
    expect(mail.text).toContain(`/plans/${plan.id}`)
    // Queued in the outbox with the move and sent from there; the agronomist who acted gets no copy.
    const queued = await sql<{ to: string }>(`select "to" from outbox where subject like '%: approved' and text like $1`, [`%/plans/${plan.id}%`])
    expect(queued.map((q) => q.to).sort()).toEqual([farm.users.operator.email, farm.users.owner.email].sort())
    await waitForMail((m) => m.to.includes(farm.users.owner.email) && /approved/i.test(m.subject) && m.text.includes(`/plans/${plan.id}`))

    const events = approved.data.events as { fromStatus: string | null, toStatus: string, userId: number, comment: string | null, setupRevision: number | null }[]
    expect(events.map((e) => e.toStatus)).toEqual(['draft', 'submitted', 'changes-requested', 'submitted', 'approved'])
    expect(events[4]).toMatchObject({ fromStatus: 'submitted', userId: farm.users.agronomist.id, comment: 'Good to go', setupRevision: 1 })
    const [audit] = await sql<{ n: number }>(`select count(*)::int as n from audit_log where entity = 'crop-plan' and entity_id = $1 and action = 'transition'`, [plan.id])
    expect(audit!.n).toBe(4)

    const early = await operator.post(path, { to: 'planted' })
    expect(early.status).toBe(409)
    expect(early.data.message).toMatch(/Planter set/)
  })

  it('nobody approves a setup they proposed', async () => {
    const plan = await newPlan()
    const path = `/api/plans/${plan.id}/transition`
    expect((await owner.post(path, { to: 'submitted', setupId: eq.setup })).status).toBe(200)
    const own = await owner.post(path, { to: 'approved' })
    expect(own.status).toBe(403)
    expect(own.data.message).toMatch(/You proposed this setup/)
    const [row] = await sql<{ status: string }>('select status from crop_plans where id = $1', [plan.id])
    expect(row!.status).toBe('submitted')
  })

  it('a new setup revision after approval sends the plan back to review; then set up and planted', async () => {
    const plan = await newPlan()
    const path = `/api/plans/${plan.id}/transition`
    await operator.post(path, { to: 'submitted', setupId: eq.setup })
    await agronomist.post(path, { to: 'approved' })
    const [{ latest_revision: base }] = await sql<{ latest_revision: number }>('select latest_revision from setups where id = $1', [eq.setup]) as [{ latest_revision: number }]
    const saved = await foreman.post(`/api/setups/${eq.setup}/revisions`, { baseRevision: base, config: { ...JSON.parse(eq.config), targetSeedsPerAcre: 33_000 }, note: 'Deeper in the wet spots' })
    expect(saved.status, JSON.stringify(saved.data)).toBe(201)

    const back = await agronomist.get(`/api/plans/${plan.id}`)
    expect(back.data).toMatchObject({ status: 'submitted', approvedRevision: null, proposedBy: farm.users.foreman.id })
    const last = back.data.events.at(-1)
    expect(last).toMatchObject({ fromStatus: 'approved', toStatus: 'submitted', setupRevision: base + 1, userId: farm.users.foreman.id })
    expect(last.comment).toMatch(/setup changed after approval/i)
    await waitForMail((m) => m.to.includes(farm.users.agronomist.email) && m.text.includes(`/plans/${plan.id}`) && /setup changed after approval/i.test(m.text))
    expect(back.data.setupRevisions.map((r: { revision: number }) => r.revision)[0]).toBe(base + 1)

    const again = await agronomist.post(path, { to: 'approved' })
    expect(again.data.approvedRevision).toBe(base + 1)
    expect((await agronomist.post(path, { to: 'set-up' })).status).toBe(403)
    expect((await operator.post(path, { to: 'set-up' })).data.status).toBe('set-up')
    const planted = await operator.post(path, { to: 'planted', plantedOn: '2027-04-28', plantedAcres: 98.5 })
    expect(planted.data).toMatchObject({ status: 'planted', plantedOn: '2027-04-28', plantedAcres: 98.5 })
    expect((await agronomist.patch(`/api/plans/${plan.id}`, { targetStand: 31_000 })).status).toBe(409)
    expect((await agronomist.delete(`/api/plans/${plan.id}`)).status).toBe(409)
  })

  it('approval names the revision reviewed, and never lands a setup on a plan that moved to another planter', async () => {
    const plan = await newPlan()
    const path = `/api/plans/${plan.id}/transition`
    await operator.post(path, { to: 'submitted', setupId: eq.setup })
    const [{ latest_revision: seen }] = await sql<{ latest_revision: number }>('select latest_revision from setups where id = $1', [eq.setup]) as [{ latest_revision: number }]
    // A revision saved while the plan waited: approving what was looked at is refused.
    expect((await foreman.post(`/api/setups/${eq.setup}/revisions`, { baseRevision: seen, config: { ...JSON.parse(eq.config), targetSeedsPerAcre: 33_500 }, note: 'While it waited' })).status).toBe(201)
    const waiting = (await agronomist.get(`/api/plans/${plan.id}`)).data
    expect(waiting.status).toBe('submitted')
    expect(waiting.events.at(-1)).toMatchObject({ fromStatus: 'submitted', toStatus: 'submitted', setupRevision: seen + 1, userId: farm.users.foreman.id })
    await waitForMail((m) => m.to.includes(farm.users.agronomist.email) && m.text.includes(`/plans/${plan.id}`) && m.text.includes(`revision ${seen + 1}`) && /while it waited/.test(m.text))
    const stale = await agronomist.post(path, { to: 'approved', setupRevision: seen })
    expect(stale.status).toBe(409)
    expect(stale.data.message).toContain(`Revision ${seen + 1}`)
    expect((await agronomist.post(path, { to: 'approved', setupRevision: seen + 1 })).data).toMatchObject({ status: 'approved', approvedRevision: seen + 1 })
    // Moved to another planter after approval: back to review, and the old planter's setup cannot be approved.
    const [other] = await sql<{ id: number }>(`insert into planters (farm_id, name, frame_kind, row_count, row_spacing_in, wheel_circumference_in) values ($1, 'Other bar', 'toolbar', 8, 30, 86) returning id`, [farm.farmId])
    expect((await agronomist.patch(`/api/plans/${plan.id}`, { planterId: other!.id })).data).toMatchObject({ status: 'submitted' })
    const mismatched = await owner.post(path, { to: 'approved' })
    expect(mismatched.status).toBe(409)
    expect(mismatched.data.message).toMatch(/another planter or crop/)
    const [row] = await sql<{ status: string, approved_revision: number | null }>('select status, approved_revision from crop_plans where id = $1', [plan.id])
    expect(row).toEqual({ status: 'submitted', approved_revision: null })
  })

  it('changing the target after approval also sends the plan back to review', async () => {
    const plan = await newPlan()
    const path = `/api/plans/${plan.id}/transition`
    await operator.post(path, { to: 'submitted', setupId: eq.setup })
    await agronomist.post(path, { to: 'approved' })
    expect((await agronomist.patch(`/api/plans/${plan.id}`, { notes: 'Watch the wet corner' })).data.status).toBe('approved')
    const changed = await agronomist.patch(`/api/plans/${plan.id}`, { targetStand: 32_000 })
    expect(changed.data).toMatchObject({ status: 'submitted', targetStand: 32_000, approvedRevision: null })
    expect((await agronomist.patch(`/api/plans/${plan.id}`, {})).status).toBe(400)
  })

  it('keeps a comment thread between the agronomist, the operator and the foreman', async () => {
    const plan = await newPlan()
    expect((await agronomist.post(`/api/plans/${plan.id}/comments`, { body: 'Low spot on the east end' })).status).toBe(201)
    expect((await operator.post(`/api/plans/${plan.id}/comments`, { body: 'I will slow down there' })).status).toBe(201)
    expect((await foreman.post(`/api/plans/${plan.id}/comments`, { body: ' ' })).status).toBe(400)
    const thread = await foreman.get(`/api/plans/${plan.id}/comments`)
    expect(thread.data.items.map((c: { body: string }) => c.body)).toEqual(['Low spot on the east end', 'I will slow down there'])
    expect(thread.data.items[1].authorName).toContain('operator')
    // Each comment is mailed to the others in the thread and to those the plan concerns, never to its writer.
    const mailed = await sql<{ to: string, subject: string }>(`select "to", subject from outbox where subject like '%a comment from%' and text like $1 order by id`, [`%/plans/${plan.id}%`])
    const fromOperator = mailed.filter((m) => m.subject.includes(`operator of ${farm.farmName}`)).map((m) => m.to).sort()
    expect(fromOperator).toEqual([farm.users.agronomist.email, farm.users.owner.email].sort())
    const fromAgronomist = mailed.filter((m) => m.subject.includes(`agronomist of ${farm.farmName}`)).map((m) => m.to)
    expect(fromAgronomist).toContain(farm.users.owner.email)
    expect(fromAgronomist).not.toContain(farm.users.agronomist.email)
  })

  it('answers 404 for another farm\'s plan and never touches it', async () => {
    const plan = await newPlan()
    const other = await createFarm()
    const stranger = await other.as('owner')
    expect((await stranger.get(`/api/plans/${plan.id}`)).status).toBe(404)
    expect((await stranger.patch(`/api/plans/${plan.id}`, { notes: 'x' })).status).toBe(404)
    expect((await stranger.post(`/api/plans/${plan.id}/transition`, { to: 'changes-requested', comment: 'x' })).status).toBe(404)
    expect((await stranger.post(`/api/plans/${plan.id}/comments`, { body: 'x' })).status).toBe(404)
    expect((await stranger.get('/api/plans?season=2027')).data.items).toEqual([])
    // Nor may a plan point at another farm's field.
    const theirs = await field(other, 'Theirs', 10)
    const bad = await agronomist.post('/api/plans', { season: 2027, fieldId: theirs, crop: 'corn', targetStand: 30_000, rowSpacingIn: 30 })
    expect(bad.status).toBe(400)
    expect(bad.data.data.fields.fieldId).toMatch(/this farm/)
  })
})

describe('seed and capacity planning', () => {
  it('capacity: a 40 ft planter (16 × 30 in) at 6 mph and 70 % covers 20.4 acres/h (Iowa State University Extension, Ag Decision Maker A3-24 / PM 696)', async () => {
    const farm = await createFarm()
    const c = await farm.as('operator')
    const res = await c.post('/api/calc/capacity', { rows: 16, rowSpacingIn: 30, speedMph: 6, efficiencyPercent: 70 })
    expect(res.status).toBe(200)
    expect(res.data.widthFt).toBe(40)
    expect(res.data.acresPerHour).toBeCloseTo(20.4, 1)
    const bad = await c.post('/api/calc/capacity', { rows: 0, rowSpacingIn: 30, speedMph: 'fast', efficiencyPercent: 120 })
    expect(bad.status).toBe(400)
    expect(Object.keys(bad.data.data.fields).sort()).toEqual(['efficiencyPercent', 'rows', 'speedMph'])
  })

  it('season totals match a season computed by hand, and the seed order CSV says what to buy', async () => {
    const farm = await createFarm()
    const e = await equipment(farm)
    await sql('update planters set row_count = 16, seed_hopper_lb = 50 where id = $1', [e.planter])
    const c = await lot(farm, cornLot)
    const s = await lot(farm, soyLot)
    const mk = async (name: string, acres: number, crop: string, lotId: number, targetStand: number, marginPercent: number, status: string, windowStart: string | null, sortOrder: number) => {
      const f = await field(farm, name, acres)
      await sql(`insert into crop_plans (farm_id, season, field_id, crop, seed_lot_id, target_stand, survival_percent, margin_percent, row_spacing_in, planter_id, speed_mph, status, window_start, sort_order)
        values ($1, 2027, $2, $3, $4, $5, 100, $6, 30, $7, 6, $8, $9, $10)`, [farm.farmId, f, crop, lotId, targetStand, marginPercent, e.planter, status, windowStart, sortOrder])
    }
    await mk('North', 100, 'corn', c.id, 30_400, 3, 'approved', '2027-04-21', 1)
    await mk('Creek', 45, 'corn', c.id, 30_400, 3, 'draft', '2027-04-26', 2)
    await mk('Hill', 80, 'soybeans', s.id, 126_000, 0, 'submitted', '2027-05-09', 3)
    await mk('Early', 40, 'corn', c.id, 30_400, 3, 'planted', null, 0)
    await mk('Last year', 500, 'corn', c.id, 30_400, 3, 'draft', '2026-04-20', 0)
    await sql(`update crop_plans set season = 2026 where field_id = (select id from fields where farm_id = $1 and name = 'Last year')`, [farm.farmId])

    const agronomist = await farm.as('agronomist')
    const res = await agronomist.get('/api/seasons/2027/summary?hoursPerDay=10&efficiencyPercent=70')
    expect(res.status).toBe(200)
    const sum = res.data
    // Corn: 32,000 seeds/acre × (100 + 45) acres × 1.03 = 4,779,200 seeds (the planted field left out) → 59.74 → 60 units of 80,000; 50 on hand → 10 short.
    // Soybeans: 126,000 ÷ 0.90 = 140,000 × 80 acres = 11,200,000 seeds ÷ 2,800 = 4,000 lb → 80 bags of 50 lb; 100 on hand.
    expect(sum.lots).toEqual([
      expect.objectContaining({ lotNumber: 'C-1', unitsNeeded: 60, unitsOnHand: 50, shortfall: 10 }),
      expect.objectContaining({ lotNumber: 'S-1', unitsNeeded: 80, unitsOnHand: 100, shortfall: 0 }),
    ])
    expect(sum.lots[0].seeds).toBeCloseTo(4_779_200, 3)
    expect(sum.lots[1].lb).toBeCloseTo(4000, 6)
    expect(sum.crops.map((x: { crop: string, acres: number }) => [x.crop, x.acres])).toEqual([['corn', 185], ['soybeans', 80]])
    expect(sum.totals.acres).toBe(265)
    const board = sum.planters[0]
    expect(board.fields.map((f: { fieldName: string }) => f.fieldName)).toEqual(['Early', 'North', 'Creek', 'Hill'])
    // 16 × 30 in = 40 ft at 6 mph and 70 % → 20.36 acres/h; 265 acres → 13.01 h → 1.30 days at 10 h.
    expect(board.widthFt).toBe(40)
    expect(board.hours).toBeCloseTo(265 / (6 * 40 * 0.7 / 8.25), 6)
    expect(board.days).toBeCloseTo(1.301, 3)
    // Hopper 50 lb × 1,600 seeds/lb ÷ 32,000 = 2.5 acres a row, 40 acres a fill; North's 100 acres → 2 refill stops.
    expect(board.fields[1]).toMatchObject({ acresPerFill: 40, refillStops: 2 })
    expect(sum.weeks).toEqual([{ weekStart: '2027-04-19', acres: 100 }, { weekStart: '2027-04-26', acres: 45 }, { weekStart: '2027-05-03', acres: 80 }])
    expect(sum.unscheduledAcres).toBe(40)

    const csv = await agronomist.get('/api/seasons/2027/seed-order.csv')
    expect(csv.status).toBe(200)
    expect(csv.headers.get('content-type')).toMatch(/text\/csv/)
    const lines = (csv.data as string).trim().split(/\r?\n/)
    expect(lines[0]).toBe('crop,variety,lot number,unit,seeds needed,units needed,units on hand,units to order')
    expect(lines[1]).toBe('corn,Test C-1,C-1,80000 seeds,4779200,60,50,10')
    expect(lines[2]).toBe('soybeans,Test S-1,S-1,50 lb,11200000,80,100,0')
    // A variety typed as a formula is written so a spreadsheet shows it as text (leading quote).
    await sql(`update seed_lots set variety = '=1+1' where id = $1`, [c.id])
    const escaped = ((await agronomist.get('/api/seasons/2027/seed-order.csv')).data as string).trim().split(/\r?\n/)
    expect(escaped[1]).toBe(`corn,"'=1+1",C-1,80000 seeds,4779200,60,50,10`)

    const bad = await agronomist.get('/api/seasons/2027/summary?hoursPerDay=0')
    expect(bad.status).toBe(400)
    expect(bad.data.data.fields.hoursPerDay).toMatch(/more than 0/)
  })
})
