import { describe, expect, inject, it } from 'vitest'
import { readdir } from 'node:fs/promises'
import { join } from 'node:path'
import { baseUrl, createFarm, sql, type Client, type TestFarm } from './helpers'
import { equipment } from './route-rules'

// Every file under the uploads directory, however deep the storage driver nests them.
async function storedFiles(dir = inject('uploadsDir')): Promise<string[]> {
  const entries = await readdir(dir, { withFileTypes: true }).catch(() => [])
  const out: string[] = []
  for (const e of entries) {
    if (e.isDirectory()) out.push(...await storedFiles(join(dir, e.name)))
    else out.push(join(dir, e.name))
  }
  return out
}
const uploadCount = async () => Number((await sql<{ n: number }>('select count(*)::int as n from uploads'))[0]!.n)

async function sendFile(c: Client, bytes: Uint8Array | string, name = 'file.bin') {
  const res = await fetch(`${baseUrl()}/api/uploads?name=${encodeURIComponent(name)}`, { method: 'POST', headers: { cookie: c.cookie, 'content-type': 'application/octet-stream' }, body: typeof bytes === 'string' ? bytes : new Blob([bytes as Uint8Array<ArrayBuffer>]) })
  return { status: res.status, data: await res.json() as Record<string, unknown> & { id: number, contentType: string, message: string } }
}

async function farmWithSetup() {
  const farm = await createFarm()
  const e = await equipment(farm)
  return { farm, e, operator: await farm.as('operator') }
}

describe('field-check calculators', () => {
  it('computes the spacing indices of a small set, checked by hand from the published definitions (Kachman & Smith 1995; ISO 7256-1)', async () => {
    const c = await (await createFarm()).as('operator')
    // xref 6 in: multiples ≤ 3 (2, 3), misses > 9 (12, 9.5), singles 5, 6, 7, 6, 6, 6 with sample SD √0.4.
    const res = await c.post('/api/calc/spacing-quality', { spacingsIn: [5, 6, 7, 6, 6, 6, 2, 3, 12, 9.5], theoreticalIn: 6 })
    expect(res.status).toBe(200)
    expect(res.data.count).toBe(10)
    expect(res.data.meanIn).toBeCloseTo(6.25, 10)
    expect(res.data.multiplesIndex).toBeCloseTo(20, 10)
    expect(res.data.missIndex).toBeCloseTo(20, 10)
    expect(res.data.qualityOfFeedIndex).toBeCloseTo(60, 10)
    expect(res.data.precision).toBeCloseTo((Math.sqrt(0.4) / 6) * 100, 8)
    expect(Object.keys(res.data).sort()).toEqual(['count', 'meanIn', 'missIndex', 'multiplesIndex', 'precision', 'qualityOfFeedIndex', 'sdIn'])
  })

  it('gives seeds per acre from a count over 1/1000 acre (University of Tennessee Extension 2011: 17 ft 5 in at 30 in)', async () => {
    const c = await (await createFarm()).as('agronomist')
    const res = await c.post('/api/calc/seed-check', { seedsCounted: 34, lengthFt: 17.424, rowSpacingIn: 30 })
    expect(res.status).toBe(200)
    expect(res.data.seedsPerAcre).toBeCloseTo(34_000, 6)
    // 5 seeds/ft in 15 in rows → 174,240 seeds/acre (Iowa State University, Agron 212).
    expect((await c.post('/api/calc/seed-check', { seedsCounted: 50, lengthFt: 10, rowSpacingIn: 15 })).data.seedsPerAcre).toBeCloseTo(174_240, 6)
  })

  it('refuses empty lists, non-positive spacings and more than 100,000 values with a message per field', async () => {
    const c = await (await createFarm()).as('operator')
    const empty = await c.post('/api/calc/spacing-quality', { spacingsIn: [], theoreticalIn: 6 })
    expect(empty.status).toBe(400)
    expect(empty.data.data.fields.spacingsIn).toBe('Give at least one spacing')
    const zero = await c.post('/api/calc/spacing-quality', { spacingsIn: [6, 0, -1], theoreticalIn: 0 })
    expect(zero.status).toBe(400)
    expect(zero.data.data.fields['spacingsIn.1']).toBe('Each spacing must be more than 0')
    expect(zero.data.data.fields.theoreticalIn).toBe('Theoretical spacing must be more than 0')
    const many = await c.post('/api/calc/spacing-quality', { spacingsIn: Array.from({ length: 100_001 }, () => 6), theoreticalIn: 6 })
    expect(many.status).toBe(400)
    expect(many.data.data.fields.spacingsIn).toBe('Give at most 100,000 spacings')
    const seeds = await c.post('/api/calc/seed-check', { seedsCounted: -1, lengthFt: 0, rowSpacingIn: 30 })
    expect(seeds.status).toBe(400)
    expect(Object.keys(seeds.data.data.fields).sort()).toEqual(['lengthFt', 'seedsCounted'])
  })

  it('handles 100,000 spacings (the limit) in one request', async () => {
    const c = await (await createFarm()).as('operator')
    const xs = Array.from({ length: 100_000 }, (_, i) => [6, 6.5, 5.5, 2, 13][i % 5]!)
    const res = await c.post('/api/calc/spacing-quality', { spacingsIn: xs, theoreticalIn: 6 })
    expect(res.status).toBe(200)
    expect(res.data.count).toBe(100_000)
    expect(res.data.multiplesIndex).toBeCloseTo(20, 8)
    expect(res.data.missIndex).toBeCloseTo(20, 8)
  })

  it('summarises stand counts and weighs a replant from the PM 1885 table (Iowa State University)', async () => {
    const c = await (await createFarm()).as('operator')
    const stand = await c.post('/api/calc/stand-count', { counts: [30, 32, 34], lengthFt: 17.424, rowSpacingIn: 30 })
    expect(stand.data.meanPerAcre).toBeCloseTo(32_000, 6)
    expect(stand.data.cvPercent).toBeCloseTo(6.25, 8)
    // 16,000 planted May 1 → 74 %; 30,000 replanted May 29 → 90 % (PM 1885). 200 bu × 16 % = 32 bu × $4.50 − $60 = $84 (computed).
    const r = await c.post('/api/calc/replant', { currentStand: 16000, currentPlantingDate: '2026-05-01', replantStand: 30000, replantDate: '2026-05-29', expectedYieldBuPerAcre: 200, pricePerBu: 4.5, replantCostPerAcre: 60 })
    expect(r.data.currentYieldPercent).toBe(74)
    expect(r.data.replantYieldPercent).toBe(90)
    expect(r.data.netPerAcre).toBeCloseTo(84, 8)
    expect(r.data.advice).toMatch(/agronomist decides/)
  })
})

describe('stored checks', () => {
  it('stores a seed-drop check: rate per row and planter, errors, implied slip and the solver\'s corrected choice', async () => {
    const { farm, e, operator } = await farmWithSetup()
    // 32 and 33 seeds over 1/1000 acre at 30 in → 32,000 and 33,000; mean 32,500 against the setup's 34,000 at 0 % slip.
    const res = await operator.post('/api/checks', { kind: 'seed-drop', setupId: e.setup, rows: [{ row: 1, seedsCounted: 32 }, { row: 2, seedsCounted: 33 }], lengthFt: 17.424, checkedOn: '2026-05-02', note: 'Dug behind the planter' })
    expect(res.status).toBe(201)
    const r = res.data.results
    expect(r.rows.map((x: { seedsPerAcre: number }) => Math.round(x.seedsPerAcre))).toEqual([32_000, 33_000])
    expect(r.seedsPerAcre).toBeCloseTo(32_500, 6)
    expect(r.errorVsSetupPercent).toBeCloseTo((32_500 / 34_000 - 1) * 100, 8)
    expect(r.errorVsTargetPercent).toBeCloseTo((32_500 / 34_000 - 1) * 100, 8)
    // Implied slip = (1 − 32,500 ÷ 34,000) × 100 = 4.4118 % (meter formula, computed).
    expect(r.impliedSlipPercent).toBeCloseTo(4.41176, 4)
    expect(r.slipStorable).toBe(true)
    // The solver is asked for 34,000 × 34,000 ÷ 32,500 so the seed on the ground lands on the target.
    expect(r.fix.solverTargetSeedsPerAcre).toBeCloseTo(34_000 * 34_000 / 32_500, 4)
    // The fixture planter's sizes on hand reach only part of the range; each choice is measured against that target.
    expect(r.fix.choices.length).toBeGreaterThan(0)
    for (const choice of r.fix.choices) expect(choice.errorPercent).toBeCloseTo((choice.seedsPerAcre / r.fix.solverTargetSeedsPerAcre - 1) * 100, 6)
    const [row] = await sql<{ farm_id: number, setup_revision: number, rows: number[], author_id: number }>('select farm_id, setup_revision, rows, author_id from field_checks where id = $1', [res.data.id])
    expect(row).toEqual({ farm_id: farm.farmId, setup_revision: 1, rows: [1, 2], author_id: farm.users.operator.id })
    const audit = await sql('select action from audit_log where entity = $1 and entity_id = $2', ['field_check', res.data.id])
    expect(audit).toEqual([{ action: 'create' }])
    const list = await operator.get(`/api/checks?setupId=${e.setup}`)
    expect(list.data.items.map((i: { id: number }) => i.id)).toEqual([res.data.id])
  })

  it('takes the target from the crop plan and links the plan\'s field', async () => {
    const { farm, e, operator } = await farmWithSetup()
    const [field] = await sql<{ id: number }>('insert into fields (farm_id, name, acres) values ($1, $2, 80) returning id', [farm.farmId, `Bottoms ${Date.now()}`])
    const [plan] = await sql<{ id: number }>(`insert into crop_plans (farm_id, season, field_id, crop, target_stand, survival_percent, row_spacing_in, setup_id) values ($1, 2026, $2, 'corn', 32000, 95, 30, $3) returning id`, [farm.farmId, field!.id, e.setup])
    const res = await operator.post('/api/checks', { kind: 'seed-drop', setupId: e.setup, planId: plan!.id, rows: [{ row: 1, seedsCounted: 34 }], lengthFt: 17.424 })
    expect(res.status).toBe(201)
    expect(res.data.fieldId).toBe(field!.id)
    // Seeding rate = stand ÷ (germination × survival) (Ohio State University): 32,000 ÷ (1.00 × 0.95) = 33,684.2 (no seed lot, so 100 % germination).
    expect(res.data.results.targetFrom).toBe('plan')
    expect(res.data.results.targetSeedsPerAcre).toBeCloseTo(32_000 / 0.95, 6)
    expect(res.data.results.errorVsTargetPercent).toBeCloseTo((34_000 / (32_000 / 0.95) - 1) * 100, 8)
    const stand = await operator.post('/api/checks', { kind: 'stand-count', planId: plan!.id, counts: [31], lengthFt: 17.424, rowSpacingIn: 30 })
    expect(stand.data.results).toMatchObject({ targetStand: 32000, targetFrom: 'plan' })
    expect((await operator.get(`/api/checks?planId=${plan!.id}`)).data.items).toHaveLength(2)
    const other = await (await createFarm()).as('operator')
    const foreign = await other.post('/api/checks', { kind: 'stand-count', planId: plan!.id, counts: [31], lengthFt: 17.424, rowSpacingIn: 30 })
    expect(foreign.status).toBe(400)
    expect(foreign.data.data.fields.planId).toBe('Unknown crop plan')
  })

  it('counts over wheel revolutions check the drive at 0 % slip and imply no slip', async () => {
    const { e, operator } = await farmWithSetup()
    // 10 turns of an 86.4 in wheel = 72 ft; 140 seeds at 30 in → 140 × 43,560 ÷ 180 = 33,880 (computed).
    const res = await operator.post('/api/checks', { kind: 'seed-drop', setupId: e.setup, rows: [{ row: 3, seedsCounted: 140 }], wheelRevolutions: 10 })
    expect(res.status).toBe(201)
    expect(res.data.results.lengthFt).toBeCloseTo(72, 8)
    expect(res.data.results.seedsPerAcre).toBeCloseTo(33_880, 6)
    expect(res.data.results.impliedSlipPercent).toBeNull()
    expect(res.data.results.slipStorable).toBe(false)
    const both = await operator.post('/api/checks', { kind: 'seed-drop', setupId: e.setup, rows: [{ row: 3, seedsCounted: 140 }], wheelRevolutions: 10, lengthFt: 20 })
    expect(both.status).toBe(400)
    expect(both.data.data.fields.lengthFt).toMatch(/either/)
  })

  it('stores a stand count against the target and the seed dropped (survival)', async () => {
    const { e, operator } = await farmWithSetup()
    await operator.post('/api/checks', { kind: 'seed-drop', setupId: e.setup, rows: [{ row: 1, seedsCounted: 33 }], lengthFt: 17.424 })
    const res = await operator.post('/api/checks', { kind: 'stand-count', setupId: e.setup, counts: [30, 32, 34], lengthFt: 17.424, targetStand: 32000 })
    expect(res.status).toBe(201)
    expect(res.data.results.meanPerAcre).toBeCloseTo(32_000, 6)
    expect(res.data.results.errorVsTargetPercent).toBeCloseTo(0, 8)
    // 32,000 plants from 33,000 seeds dropped (the seed-drop check above) → 96.97 % (computed).
    expect(res.data.results.seedsDroppedPerAcre).toBeCloseTo(33_000, 6)
    expect(res.data.results.survivalPercent).toBeCloseTo(32_000 / 33_000 * 100, 8)
  })

  it('reads a spacing CSV upload, reports junk lines by number and stores nothing for them', async () => {
    const { e, operator } = await farmWithSetup()
    const junk = await sendFile(operator, 'spacing\n6.1\nabc\n5.9\n-2\n', 'run.csv')
    expect(junk.status).toBe(201)
    const before = await sql('select count(*)::int as n from field_checks')
    const bad = await operator.post('/api/checks', { kind: 'spacing', setupId: e.setup, csvUploadId: junk.data.id, theoreticalIn: 6 })
    expect(bad.status).toBe(400)
    expect(bad.data.message).toMatch(/line 3: "abc" is not a number; line 5: A spacing must be more than 0/)
    expect(bad.data.data.lines).toEqual([{ line: 3, message: '"abc" is not a number' }, { line: 5, message: 'A spacing must be more than 0' }])
    expect(await sql('select count(*)::int as n from field_checks')).toEqual(before)
    const good = await sendFile(operator, 'spacing\n5\n6\n7\n6\n6\n6\n2\n3\n12\n9.5\n', 'run.csv')
    const res = await operator.post('/api/checks', { kind: 'spacing', setupId: e.setup, csvUploadId: good.data.id, theoreticalIn: 6, row: 4 })
    expect(res.status).toBe(201)
    expect(res.data.results.qualityOfFeedIndex).toBeCloseTo(60, 10)
    expect(res.data.results.histogram).toHaveLength(31)
    // Corn: sample SD of these spacings is 2.9402 in → (2.9402 − 2) × 2.5 bu (Nielsen 1991, as cited by UW Extension 2000; computed).
    const sd = Math.sqrt([5, 6, 7, 6, 6, 6, 2, 3, 12, 9.5].reduce((a, x) => a + (x - 6.25) ** 2, 0) / 9)
    expect(res.data.results.cornYieldLossBuPerAcre).toBeCloseTo((sd - 2) * 2.5, 8)
    expect(res.data.csvUploadId).toBe(good.data.id)
  })

  it('lets only the owner and the agronomist review a check, and audits it', async () => {
    const { farm, e, operator } = await farmWithSetup()
    const check = await operator.post('/api/checks', { kind: 'stand-count', setupId: e.setup, counts: [25], lengthFt: 17.424 })
    expect((await operator.post(`/api/checks/${check.data.id}/review`, { status: 'accepted' })).status).toBe(403)
    expect((await (await farm.as('foreman')).post(`/api/checks/${check.data.id}/review`, { status: 'accepted' })).status).toBe(403)
    const agronomist = await farm.as('agronomist')
    const bad = await agronomist.post(`/api/checks/${check.data.id}/review`, { status: 'fine' })
    expect(bad.status).toBe(400)
    expect(bad.data.data.fields.status).toMatch(/accepted/)
    const res = await agronomist.post(`/api/checks/${check.data.id}/review`, { status: 'replant-considered', comment: 'Stand of 25k; weigh a replant on the low end.' })
    expect(res.status).toBe(200)
    const got = await operator.get(`/api/checks/${check.data.id}`)
    expect(got.data).toMatchObject({ reviewStatus: 'replant-considered', reviewComment: 'Stand of 25k; weigh a replant on the low end.', reviewerName: `agronomist of ${farm.farmName}` })
    expect(await sql('select action, after->>\'reviewStatus\' as status from audit_log where entity = $1 and entity_id = $2 and action = $3', ['field_check', check.data.id, 'review'])).toEqual([{ action: 'review', status: 'replant-considered' }])
  })

  it('stores the slip a check implies on the planter, records the check it came from, and refuses it twice', async () => {
    const { farm, e, operator } = await farmWithSetup()
    const check = await operator.post('/api/checks', { kind: 'seed-drop', setupId: e.setup, rows: [{ row: 1, seedsCounted: 32 }, { row: 2, seedsCounted: 33 }], lengthFt: 17.424 })
    expect((await operator.post(`/api/checks/${check.data.id}/apply-slip`, {})).status).toBe(403)
    const foreman = await farm.as('foreman')
    const res = await foreman.post(`/api/checks/${check.data.id}/apply-slip`, {})
    expect(res.status).toBe(200)
    expect(res.data).toMatchObject({ planterId: e.planter, slipPercent: 4.41, fromCheckId: check.data.id })
    const [p] = await sql<{ slip_percent: string }>('select slip_percent from planters where id = $1', [e.planter])
    expect(Number(p!.slip_percent)).toBe(4.41)
    const [audit] = await sql<{ after: { slipPercent: number, fromCheckId: number } }>('select after from audit_log where entity = $1 and entity_id = $2 order by id desc limit 1', ['planter', e.planter])
    expect(audit!.after).toEqual({ slipPercent: 4.41, fromCheckId: check.data.id })
    const got = await foreman.get(`/api/checks/${check.data.id}`)
    expect(got.data.slipAppliedPercent).toBe(4.41)
    expect((await foreman.post(`/api/checks/${check.data.id}/apply-slip`, {})).status).toBe(409)
    const stand = await operator.post('/api/checks', { kind: 'stand-count', setupId: e.setup, counts: [30], lengthFt: 17.424 })
    expect((await foreman.post(`/api/checks/${stand.data.id}/apply-slip`, {})).status).toBe(409)
  })

  it('answers 404 for another farm\'s check and refuses another farm\'s setup or photo', async () => {
    const { e, operator } = await farmWithSetup()
    const check = await operator.post('/api/checks', { kind: 'stand-count', setupId: e.setup, counts: [30], lengthFt: 17.424 })
    const other: TestFarm = await createFarm()
    const stranger = await other.as('owner')
    expect((await stranger.get(`/api/checks/${check.data.id}`)).status).toBe(404)
    expect((await stranger.post(`/api/checks/${check.data.id}/review`, { status: 'accepted' })).status).toBe(404)
    const foreignSetup = await stranger.post('/api/checks', { kind: 'stand-count', setupId: e.setup, counts: [30], lengthFt: 17.424 })
    expect(foreignSetup.status).toBe(400)
    expect(foreignSetup.data.data.fields.setupId).toBe('Unknown setup')
    const photo = await sendFile(operator, new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]), 'gap.png')
    const foreignPhoto = await stranger.post('/api/checks', { kind: 'stand-count', counts: [30], lengthFt: 17.424, rowSpacingIn: 30, photoUploadIds: [photo.data.id] })
    expect(foreignPhoto.status).toBe(400)
    expect(foreignPhoto.data.data.fields.photoUploadIds).toMatch(/Unknown file/)
    const mine = await operator.post('/api/checks', { kind: 'stand-count', counts: [30], lengthFt: 17.424, rowSpacingIn: 30, photoUploadIds: [photo.data.id] })
    expect(mine.status).toBe(201)
    expect(mine.data.photoUploadIds).toEqual([photo.data.id])
  })
})

describe('photos added to a check after it was taken', () => {
  const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52])

  it('lets the author, the owner or an agronomist add this farm\'s photos, audits it, and refuses the rest without a change', async () => {
    const { farm, operator } = await farmWithSetup()
    const first = await sendFile(operator, png, 'dig.png')
    const made = await operator.post('/api/checks', { kind: 'stand-count', counts: [30, 32], lengthFt: 17.424, rowSpacingIn: 30, photoUploadIds: [first.data.id] })
    expect(made.status).toBe(201)
    const checkId = made.data.id as number
    const later = await sendFile(operator, png, 'gap.png')
    const added = await operator.post(`/api/checks/${checkId}/photos`, { uploadIds: [later.data.id, first.data.id] })
    expect(added.status).toBe(200)
    expect(added.data.photoUploadIds).toEqual([first.data.id, later.data.id])
    expect((await operator.get(`/api/checks/${checkId}`)).data.photoUploadIds).toEqual([first.data.id, later.data.id])
    const [audit] = await sql<{ action: string, user_id: number, before: unknown, after: unknown }>(`select action, user_id, before, after from audit_log where entity = 'field_check' and entity_id = $1 order by id desc limit 1`, [checkId])
    expect(audit).toEqual({ action: 'add-photos', user_id: farm.users.operator.id, before: { photoUploadIds: [first.data.id] }, after: { photoUploadIds: [first.data.id, later.data.id] } })

    const agronomist = await farm.as('agronomist')
    const third = await sendFile(agronomist, png, 'leaf.png')
    expect((await agronomist.post(`/api/checks/${checkId}/photos`, { uploadIds: [third.data.id] })).data.photoUploadIds).toHaveLength(3)

    // An operator may add photos to their own checks only; the foreman takes no checks.
    const agronomists = await agronomist.post('/api/checks', { kind: 'stand-count', counts: [31], lengthFt: 17.424, rowSpacingIn: 30 })
    const notMine = await operator.post(`/api/checks/${agronomists.data.id}/photos`, { uploadIds: [later.data.id] })
    expect(notMine.status).toBe(403)
    expect(notMine.data.message).toBe('Only the author of the check, the owner or an agronomist can add photos to it')
    expect((await operator.get(`/api/checks/${agronomists.data.id}`)).data.photoUploadIds).toEqual([])
    const auditCount = async () => (await sql<{ n: number }>(`select count(*)::int as n from audit_log where entity = 'field_check' and entity_id = $1`, [checkId]))[0]!.n
    const before = await auditCount()
    const forbidden = await (await farm.as('foreman')).post(`/api/checks/${checkId}/photos`, { uploadIds: [third.data.id] })
    expect(forbidden.status).toBe(403)
    const csv = await sendFile(operator, 'spacing\n6\n', 'run.csv')
    const stranger = await (await createFarm()).as('owner')
    const theirs = await sendFile(stranger, png, 'theirs.png')
    const refusals: [unknown, string, string][] = [
      [{ uploadIds: [csv.data.id] }, 'uploadIds', 'Unknown file or wrong type'],
      [{ uploadIds: [theirs.data.id] }, 'uploadIds', 'Unknown file or wrong type'],
      [{ uploadIds: [] }, 'uploadIds', 'Choose at least one photo'],
      [{ uploadIds: ['x'] }, 'uploadIds.0', 'Photo must be a record id'],
      [{ uploadIds: [third.data.id], extra: 1 }, 'extra', ''],
    ]
    for (const [body, field, message] of refusals) {
      const res = await operator.post(`/api/checks/${checkId}/photos`, body)
      expect(res.status, JSON.stringify(body)).toBe(400)
      expect(Object.keys(res.data.data.fields)).toContain(field)
      if (message) expect(res.data.data.fields[field]).toBe(message)
    }
    // Ten photos at most on a check: it has 3, so 8 more are refused.
    const more = []
    for (let i = 0; i < 8; i++) more.push((await sendFile(operator, png, `more-${i}.png`)).data.id)
    const full = await operator.post(`/api/checks/${checkId}/photos`, { uploadIds: more })
    expect(full.status).toBe(400)
    expect(full.data.data.fields.uploadIds).toBe('This check has 3; add at most 7')
    expect((await stranger.post(`/api/checks/${checkId}/photos`, { uploadIds: [theirs.data.id] })).status).toBe(404)
    expect((await operator.get(`/api/checks/${checkId}`)).data.photoUploadIds).toHaveLength(3)
    expect(await auditCount()).toBe(before)
  })
})

describe('uploads', () => {
  it('refuses a file over 10 MB with a 413 and stores nothing (by Content-Length and by the bytes read)', async () => {
    const c = await (await createFarm()).as('operator')
    const rowsBefore = await uploadCount()
    const filesBefore = await storedFiles()
    const big = new Uint8Array(10 * 1024 * 1024 + 1).fill(0x36)
    const declared = await sendFile(c, big, 'big.csv')
    expect(declared.status).toBe(413)
    expect(declared.data.message).toMatch(/larger than 10 MB; nothing was stored/)
    // Streamed without a length: the server counts what it reads.
    const stream = new ReadableStream({
      start(ctl) {
        for (let i = 0; i < 11; i++) ctl.enqueue(new Uint8Array(1024 * 1024).fill(0x37))
        ctl.close()
      },
    })
    const res = await fetch(`${baseUrl()}/api/uploads`, { method: 'POST', headers: { cookie: c.cookie }, body: stream, duplex: 'half' } as RequestInit)
    expect(res.status).toBe(413)
    expect(await uploadCount()).toBe(rowsBefore)
    expect(await storedFiles()).toEqual(filesBefore)
    // Exactly 10 MB is accepted.
    const edge = await sendFile(c, new Uint8Array(10 * 1024 * 1024).fill(0x36), 'edge.csv')
    expect(edge.status).toBe(201)
    expect(edge.data.sizeBytes).toBe(10 * 1024 * 1024)
    expect((await storedFiles()).length).toBe(filesBefore.length + 1)
  })

  it('takes the type from the content, not the name, and refuses other content', async () => {
    const c = await (await createFarm()).as('foreman')
    const png = await sendFile(c, new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 1, 2, 3]), 'looks-like.csv')
    expect(png.data.contentType).toBe('image/png')
    expect((await sendFile(c, new Uint8Array([0xff, 0xd8, 0xff, 0xe0, 0, 0x10]), 'dig.jpg')).data.contentType).toBe('image/jpeg')
    const webp = new Uint8Array([0x52, 0x49, 0x46, 0x46, 4, 0, 0, 0, 0x57, 0x45, 0x42, 0x50, 0x56, 0x50])
    expect((await sendFile(c, webp, 'gap.webp')).data.contentType).toBe('image/webp')
    expect((await sendFile(c, 'plot;spacing\r\n1;6.2\r\n', 'x.png')).data.contentType).toBe('text/csv')
    const rowsBefore = await uploadCount()
    const pdf = await sendFile(c, new TextEncoder().encode('%PDF-1.7\n\u0000\u0001binary'), 'report.csv')
    expect(pdf.status).toBe(415)
    expect(pdf.data.message).toBe('This file is not CSV or text, JPEG, PNG or WebP; nothing was stored')
    expect((await sendFile(c, new Uint8Array([0xc3, 0x28, 0x41]), 'bad-utf8.csv')).status).toBe(415)
    expect((await sendFile(c, new Uint8Array(0), 'empty.csv')).status).toBe(400)
    // A caller can narrow the types: a CSV where a photo is expected is refused before it is stored.
    const notPhoto = await fetch(`${baseUrl()}/api/uploads?kind=photo`, { method: 'POST', headers: { cookie: c.cookie }, body: 'spacing\n6\n' })
    expect(notPhoto.status).toBe(415)
    expect((await notPhoto.json()).message).toMatch(/not JPEG, PNG or WebP; nothing was stored/)
    expect(await uploadCount()).toBe(rowsBefore)
  })

  it('serves a file only to members of the farm that owns it', async () => {
    const farm = await createFarm()
    const c = await farm.as('operator')
    const up = await sendFile(c, 'spacing\n6.0\n6.2\n', 'run.csv')
    const [row] = await sql<{ farm_id: number, uploaded_by: number, size_bytes: number, file_name: string }>('select farm_id, uploaded_by, size_bytes, file_name from uploads where id = $1', [up.data.id])
    expect(row).toEqual({ farm_id: farm.farmId, uploaded_by: farm.users.operator.id, size_bytes: 16, file_name: 'run.csv' })
    const mine = await fetch(`${baseUrl()}/api/uploads/${up.data.id}`, { headers: { cookie: (await farm.as('agronomist')).cookie } })
    expect(mine.status).toBe(200)
    expect(mine.headers.get('content-type')).toMatch(/^text\/csv/)
    expect(await mine.text()).toBe('spacing\n6.0\n6.2\n')
    const stranger = await (await createFarm()).as('owner')
    const theirs = await stranger.get(`/api/uploads/${up.data.id}`)
    expect(theirs.status).toBe(404)
    expect((await fetch(`${baseUrl()}/api/uploads/${up.data.id}`)).status).toBe(401)
  })
})
