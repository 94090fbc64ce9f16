import { describe, expect, it } from 'vitest'
import Papa from 'papaparse'
import { createFarm, sql, type Client, type TestFarm } from './helpers'
import { equipment } from './route-rules'
import { recordBody } from './routes-applications'

const count = async (table: string, farmId: number) => Number((await sql<{ n: string }>(`select count(*) as n from ${table} where farm_id = $1`, [farmId]))[0]!.n)

describe('rate calculators', () => {
  it('granular: 8 oz per 1,000 ft in 30 in rows → 8.712 lb/acre; a 10 lb/acre label on a 7 in band → 2.333 lb per field acre (OMAFRA, banded applications)', async () => {
    const c = await (await createFarm()).as('agronomist')
    const row = await c.post('/api/calc/granular', { rowSpacingIn: 30, ozPer1000Ft: 8 })
    expect(row.status).toBe(200)
    // lb/acre = oz × 43,560 ÷ (1,000 × 2.5 ft) ÷ 16 (computed).
    expect(row.data.lbPerFieldAcre).toBeCloseTo(8.712, 10)
    const band = await c.post('/api/calc/granular', { rowSpacingIn: 30, bandWidthIn: 7, bandRateLbPerAcre: 10 })
    expect(band.data.lbPerFieldAcre).toBeCloseTo(70 / 30, 10)
    expect(band.data.lbPerBandAcre).toBeCloseTo(10, 10)
  })

  it('catch test over a 1/128 acre course at 19 in (214.9 ft; oz × 8 = lb/acre, University of Georgia Extension, Sumner) gives setting 25 for 100 lb/acre', async () => {
    const c = await (await createFarm()).as('operator')
    const res = await c.post('/api/calc/catch-test', { points: [{ setting: 10, weightOz: 5 }, { setting: 20, weightOz: 10 }, { setting: 30, weightOz: 15 }], courseFt: 43_560 / 128 / (19 / 12), rowSpacingIn: 19, targetLbPerAcre: 100 })
    expect(res.status).toBe(200)
    expect(res.data.slope).toBeCloseTo(4, 9)
    expect(res.data.r2).toBeCloseTo(1, 9)
    expect(res.data.settingForTarget).toBeCloseTo(25, 9)
    expect(res.data.inRange).toBe(true)
    expect(res.data.rateAtSettings.map((r: { lbPerAcre: number }) => Math.round(r.lbPerAcre))).toEqual([40, 80, 120])
  })

  it('liquid: 0.3 GPM at 5 mph on 20 in → 17.82 GPA (EDIS WG013), × √1.28 for 28 % UAN (UNL CropWatch 2016)', async () => {
    const c = await (await createFarm()).as('foreman')
    const res = await c.post('/api/calc/liquid', { gpm: 0.3, mph: 5, widthIn: 20, specificGravity: 1.28 })
    expect(res.status).toBe(200)
    expect(res.data.gpa).toBeCloseTo(17.82, 10)
    expect(res.data.waterEquivalentGpa).toBeCloseTo(17.82 * Math.sqrt(1.28), 10)
  })

  it('course helper: 10 lb/acre at 40 in → 8 oz on 653 ft (University of Missouri Extension G1273, Fishel); 1/128 acre at 19 in → 214.9 ft; dry catch of 25 oz there → 200 lb/acre (Sumner)', async () => {
    const c = await (await createFarm()).as('operator')
    const course = await c.post('/api/calc/catch-course', { rowSpacingIn: 40, lbPerAcre: 10, revolutions: 10, wheelCircumferenceIn: 60 })
    expect(course.data).toEqual({ ouncesOn653Ft: 8, lengthFtForFraction: null, lengthFtFromRevolutions: 50 })
    const frac = await c.post('/api/calc/catch-course', { rowSpacingIn: 19, fractionOfAcre: 1 / 128 })
    expect(frac.data.lengthFtForFraction).toBeCloseTo(214.9, 1)
    const dry = await c.post('/api/calc/dry-rate', { ounces: 25, lengthFt: frac.data.lengthFtForFraction, widthIn: 19 })
    expect(dry.data.lbPerAcre).toBeCloseTo(200, 9)
  })

  it('fill planning: 3,000 lb at 150 lb/acre covers 20 acres; a 70 acre field takes 4 fills and 3 refill stops (computed)', async () => {
    const c = await (await createFarm()).as('operator')
    const res = await c.post('/api/calc/fill-plan', { containers: [{ name: 'Fertilizer hoppers', kind: 'fertilizer hopper', capacity: 3000, ratePerAcre: 150 }, { name: 'Boxes', kind: 'granular hopper', capacity: 420, ratePerAcre: 8.4 }], fields: [{ name: 'River 40', acres: 70 }] })
    expect(res.status).toBe(200)
    expect(res.data.containers.map((x: { acresPerFill: number }) => x.acresPerFill)).toEqual([20, 50])
    expect(res.data.fields[0].containers.map((x: { fills: number, refillStops: number }) => [x.fills, x.refillStops])).toEqual([[4, 3], [2, 1]])
    expect(res.data.fields[0].mostRefillStops).toBe(3)
  })

  it('answers 400 with a message per field: zero or negative weights, one setting only, zero speed or width, unknown fields', async () => {
    const c = await (await createFarm()).as('operator')
    const bad = await c.post('/api/calc/catch-test', { points: [{ setting: 10, weightOz: -1 }, { setting: 10, weightOz: 0 }], courseFt: 100, rowSpacingIn: 30, targetLbPerAcre: 8, extra: 1 })
    expect(bad.status).toBe(400)
    expect(bad.data.data.fields).toMatchObject({ 'points.0.weightOz': 'Catch weight must be more than 0', 'points.1.weightOz': 'Catch weight must be more than 0', extra: 'Unknown field' })
    const one = await c.post('/api/calc/catch-test', { points: [{ setting: 10, weightOz: 1 }, { setting: 10, weightOz: 2 }], courseFt: 100, rowSpacingIn: 30, targetLbPerAcre: 8 })
    expect(one.data.data.fields.points).toBe('Catch at two or more different settings')
    const liquid = await c.post('/api/calc/liquid', { gpm: 0.3, mph: 0, widthIn: 0 })
    expect(liquid.data.data.fields).toEqual({ mph: 'Speed must be more than 0', widthIn: 'Spacing must be more than 0' })
    const granular = await c.post('/api/calc/granular', { rowSpacingIn: 30, bandWidthIn: 40, bandRateLbPerAcre: 10 })
    expect(granular.data.data.fields.bandWidthIn).toBe('The band cannot be wider than the row spacing')
  })
})

// A setup whose rows 1 and 3 carry a granular applicator.
async function granularSetup(farm: TestFarm) {
  const e = await equipment(farm)
  const config = JSON.parse(e.config)
  config.rowUnits = config.rowUnits.map((u: { position: number }) => u.position % 2 ? { ...u, granular: 'insecticide', granularBandWidthIn: 7, granularDialSetting: 18 } : u)
  await sql('update setup_revisions set config = $2 where setup_id = $1', [e.setup, JSON.stringify(config)])
  return e.setup
}
const catchPoints = [{ setting: 10, weightOz: 1 }, { setting: 20, weightOz: 2 }, { setting: 30, weightOz: 3 }]

describe('catch tests on a setup', () => {
  it('stores the run with the revision it was caught on and saves the dial setting as the next revision', async () => {
    const farm = await createFarm()
    const setupId = await granularSetup(farm)
    const operator = await farm.as('operator')
    const res = await operator.post(`/api/setups/${setupId}/calibrations`, { baseRevision: 1, rows: [1], productName: 'Rowguard 15G', courseFt: 250, targetLbPerAcre: 10, points: catchPoints, dialSetting: 20, saveToSetup: true })
    expect(res.status).toBe(201)
    expect(res.data).toMatchObject({ revision: 1, appliedRevision: 2, savedRevision: 2, dialSetting: 20, rows: [1], courseFt: 250, rowSpacingIn: 30 })
    // 2 oz over 250 ft at 30 in = 8 oz per 1,000 ft = 8.712 lb/acre (computed); the line is rate = 0.4356 × setting.
    expect(res.data.fit.slope).toBeCloseTo(0.4356, 9)
    expect(res.data.fit.settingForTarget).toBeCloseTo(10 / 0.4356, 6)
    // Rate at the setting the rows had (18) on the fitted line.
    expect(res.data.fit.rateAtCurrentSetting).toBeCloseTo(0.4356 * 18, 9)
    const setup = await operator.get(`/api/setups/${setupId}`)
    expect(setup.data.latestRevision).toBe(2)
    const rev2 = setup.data.revisions.find((r: { revision: number }) => r.revision === 2)
    expect(rev2.config.rowUnits.map((u: { granularDialSetting: number | null }) => u.granularDialSetting)).toEqual([20, null, 20, null])
    expect(rev2.note).toMatch(/Granular dial set to 20 on rows 1, 3/)
    const agronomist = await farm.as('agronomist')
    const runs = await agronomist.get(`/api/setups/${setupId}/calibrations`)
    expect(runs.data.map((r: { revision: number, appliedRevision: number, runByName: string }) => [r.revision, r.appliedRevision, r.runByName])).toEqual([[1, 2, `operator of ${farm.farmName}`]])
    const audit = await sql<{ entity: string }>('select entity from audit_log where farm_id = $1 and entity in ($2, $3) order by id', [farm.farmId, 'setup', 'calibration_run'])
    expect(audit.map((a) => a.entity)).toEqual(['setup', 'calibration_run'])
  })

  it('refuses a stale base revision with 409 and a dial setting outside the caught range with 400, writing nothing', async () => {
    const farm = await createFarm()
    const setupId = await granularSetup(farm)
    const operator = await farm.as('operator')
    const body = { baseRevision: 1, rows: [1], revolutions: 10, targetLbPerAcre: 10, points: catchPoints, dialSetting: 20, saveToSetup: true }
    expect((await operator.post(`/api/setups/${setupId}/calibrations`, body)).status).toBe(201)
    const before = await count('calibration_runs', farm.farmId)
    const stale = await operator.post(`/api/setups/${setupId}/calibrations`, body)
    expect(stale.status).toBe(409)
    const wide = await operator.post(`/api/setups/${setupId}/calibrations`, { ...body, baseRevision: 2, dialSetting: 35 })
    expect(wide.status).toBe(400)
    expect(wide.data.data.fields.dialSetting).toMatch(/tested range is 10 to 30/)
    expect(await count('calibration_runs', farm.farmId)).toBe(before)
    // 10 revolutions of the 86.4 in wheel = 72 ft of course (computed).
    const runs = await operator.get(`/api/setups/${setupId}/calibrations`)
    expect(runs.data[0].courseFt).toBe(72)
    expect(runs.data[0].revolutions).toBe(10)
  })

  it('keeps a run without changing the setup, lets the agronomist read but not run one, and hides another farm\'s setup', async () => {
    const farm = await createFarm()
    const setupId = await granularSetup(farm)
    const foreman = await farm.as('foreman')
    const res = await foreman.post(`/api/setups/${setupId}/calibrations`, { baseRevision: 1, rows: [3], courseFt: 100, targetLbPerAcre: 5, points: catchPoints })
    expect(res.status).toBe(201)
    expect(res.data.appliedRevision).toBeNull()
    expect((await foreman.get(`/api/setups/${setupId}`)).data.latestRevision).toBe(1)
    const agronomist = await farm.as('agronomist')
    expect((await agronomist.post(`/api/setups/${setupId}/calibrations`, { baseRevision: 1, rows: [3], courseFt: 100, targetLbPerAcre: 5, points: catchPoints })).status).toBe(403)
    const other = await (await createFarm()).as('owner')
    expect((await other.get(`/api/setups/${setupId}/calibrations`)).status).toBe(404)
    expect((await other.post(`/api/setups/${setupId}/calibrations`, { baseRevision: 1, rows: [3], courseFt: 100, targetLbPerAcre: 5, points: catchPoints })).status).toBe(404)
    const bad = await foreman.post(`/api/setups/${setupId}/calibrations`, { baseRevision: 1, rows: [9], courseFt: 100, revolutions: 3, targetLbPerAcre: 5, points: catchPoints, saveToSetup: true })
    expect(bad.status).toBe(400)
    expect(bad.data.data.fields).toMatchObject({ courseFt: /one of them/, dialSetting: 'Choose the dial setting to save' })
  })
})

describe('application records', () => {
  async function farmWithRecord(): Promise<{ farm: TestFarm, operator: Client, id: number }> {
    const farm = await createFarm()
    const operator = await farm.as('operator')
    const res = await operator.post('/api/application-records', recordBody())
    expect(res.status).toBe(201)
    return { farm, operator, id: res.data.id }
  }

  it('lets the operator and owner write, the agronomist and foreman only read', async () => {
    const { farm, id } = await farmWithRecord()
    for (const role of ['agronomist', 'foreman'] as const) {
      const c = await farm.as(role)
      expect((await c.post('/api/application-records', recordBody())).status).toBe(403)
      expect((await c.post(`/api/application-records/${id}/corrections`, { reason: 'x', record: recordBody() })).status).toBe(403)
      const list = await c.get('/api/application-records?season=2026')
      expect(list.status).toBe(200)
      expect(list.data.items.map((r: { id: number }) => r.id)).toEqual([id])
    }
    expect((await (await farm.as('owner')).post('/api/application-records', { ...recordBody(), appliedOn: '2025-06-01' })).status).toBe(201)
    expect((await (await farm.as('owner')).get('/api/application-records')).data.seasons).toEqual([2026, 2025])
  })

  it('requires what 7 CFR 110.3 asks of a restricted-use record, and not of others', async () => {
    const farm = await createFarm()
    const operator = await farm.as('operator')
    const { epaRegNumber: _e, totalAmount: _t, certificationNumber: _c, ...bare } = recordBody()
    const before = await count('application_records', farm.farmId)
    const res = await operator.post('/api/application-records', { ...bare, totalUnit: undefined })
    expect(res.status).toBe(400)
    expect(res.data.data.fields).toEqual({
      epaRegNumber: 'A restricted-use record needs the EPA registration number',
      totalAmount: 'A restricted-use record needs the total amount applied',
      totalUnit: 'A restricted-use record needs the unit of the total amount',
      certificationNumber: 'A restricted-use record needs the applicator\'s certification number',
    })
    const future = await operator.post('/api/application-records', { ...recordBody(), appliedOn: '2999-01-01', epaRegNumber: 'ABC' })
    expect(future.data.data.fields).toMatchObject({ appliedOn: 'The application date cannot be in the future', epaRegNumber: /EPA registration number as on the label/ })
    expect(await count('application_records', farm.farmId)).toBe(before)
    const general = await operator.post('/api/application-records', { ...bare, restrictedUse: false })
    expect(general.status).toBe(201)
    expect(general.data).toMatchObject({ restrictedUse: false, epaRegNumber: null, certificationNumber: null, keepUntil: null })
  })

  it('flags a restricted-use record made more than 14 days after the application and keeps it 2 years', async () => {
    const farm = await createFarm()
    const operator = await farm.as('operator')
    const day = new Date(Date.now() - 20 * 86_400_000).toISOString().slice(0, 10)
    const res = await operator.post('/api/application-records', { ...recordBody(), appliedOn: day })
    expect(res.data.recordedLate).toBe(true)
    expect(res.data.recordedAfterDays).toBeGreaterThanOrEqual(19)
    expect(res.data.keepUntil).toBe(`${Number(day.slice(0, 4)) + 2}${day.slice(4)}`)
  })

  it('has no way to change or delete a record; a correction is a new record pointing at the original', async () => {
    const { farm, operator, id } = await farmWithRecord()
    const [orig] = await sql('select * from application_records where id = $1', [id])
    expect([404, 405]).toContain((await operator.patch(`/api/application-records/${id}`, { rate: 1 })).status)
    expect([404, 405]).toContain((await operator.delete(`/api/application-records/${id}`)).status)
    const fix = await operator.post(`/api/application-records/${id}/corrections`, { reason: 'Total was 78 lb, not 87', record: { ...recordBody(), totalAmount: 78 } })
    expect(fix.status).toBe(201)
    expect(fix.data).toMatchObject({ correctsId: id, correctionReason: 'Total was 78 lb, not 87', totalAmount: 78, current: true })
    expect(fix.data.history.map((h: { id: number, totalAmount: number, correctedById: number }) => [h.id, h.totalAmount, h.correctedById])).toEqual([[id, 87, fix.data.id]])
    // Recorded months after 2 May: the original is flagged late, the correction is not judged on its own date.
    expect([fix.data.history[0].recordedLate, fix.data.recordedLate]).toEqual([true, false])
    expect((await sql('select * from application_records where id = $1', [id]))[0]).toEqual(orig)
    const again = await operator.post(`/api/application-records/${id}/corrections`, { reason: 'again', record: recordBody() })
    expect(again.status).toBe(409)
    expect(again.data.message).toMatch(new RegExp(`already corrected by record ${fix.data.id}`))
    const list = await (await farm.as('foreman')).get('/api/application-records?season=2026')
    expect(list.data.items.map((r: { id: number, current: boolean, correctedById: number | null }) => [r.id, r.current, r.correctedById])).toEqual([[fix.data.id, true, null], [id, false, fix.data.id]])
    const audit = await sql<{ action: string }>('select action from audit_log where farm_id = $1 and entity = $2 order by id', [farm.farmId, 'application_record'])
    expect(audit.map((a) => a.action)).toEqual(['create', 'correct'])
  })

  it('links a field of the farm by id and snapshots its name; another farm\'s field, catch test or record is refused', async () => {
    const { farm, operator, id } = await farmWithRecord()
    const otherFarm = await createFarm()
    const [mine] = await sql<{ id: number }>(`insert into fields (farm_id, name, acres) values ($1, 'River 40', 40) returning id`, [farm.farmId])
    const [theirs] = await sql<{ id: number }>(`insert into fields (farm_id, name, acres) values ($1, 'Their field', 40) returning id`, [otherFarm.farmId])
    const linked = await operator.post('/api/application-records', { ...recordBody(), fieldId: mine!.id, fieldName: 'typed' })
    expect(linked.data).toMatchObject({ fieldId: mine!.id, fieldName: 'River 40' })
    const refused = await operator.post('/api/application-records', { ...recordBody(), fieldId: theirs!.id, calibrationRunId: 999_999 })
    expect(refused.status).toBe(400)
    expect(refused.data.data.fields).toEqual({ fieldId: 'Choose one of this farm\'s fields', calibrationRunId: 'Choose one of this farm\'s catch tests' })
    const other = await otherFarm.as('operator')
    expect((await other.get(`/api/application-records/${id}`)).status).toBe(404)
    expect((await other.post(`/api/application-records/${id}/corrections`, { reason: 'x', record: recordBody() })).status).toBe(404)
    expect((await other.get('/api/application-records')).data.items).toEqual([])
  })

  it('exports a season as CSV with the record values, corrections marked', async () => {
    const { farm, operator, id } = await farmWithRecord()
    const fix = await operator.post(`/api/application-records/${id}/corrections`, { reason: 'Area was 12 acres', record: { ...recordBody(), areaTreatedAcres: 12, totalAmount: 104.4 } })
    await operator.post('/api/application-records', { ...recordBody(), appliedOn: '2025-05-02' })
    await operator.post('/api/application-records', { ...recordBody(), appliedOn: '2026-06-01', notes: '=1+1' })
    const res = await (await farm.as('agronomist')).get('/api/application-records/export.csv?season=2026')
    expect(res.status).toBe(200)
    expect(res.headers.get('content-type')).toMatch(/text\/csv/)
    expect(res.headers.get('content-disposition')).toContain('application-records-2026.csv')
    const rows = Papa.parse<Record<string, string>>(String(res.data), { header: true, skipEmptyLines: true }).data
    // A note that would start a spreadsheet formula is written with a leading quote.
    expect(rows.pop()!.notes).toBe("'=1+1")
    expect(rows.map((r) => [r.record, r.date, r.time, r.field, r.product, r['EPA reg. no.'], r['restricted use'], r.rate, r['rate unit'], r['total amount'], r['area treated (acres)'], r['certification no.'], r['corrects record'], r['corrected by record']])).toEqual([
      [String(id), '2026-05-02', '09:30', 'Matrix field', 'Matrix 15G', '00000-15', 'yes', '8.7', 'lb/acre', '87', '10', 'PA-0000', '', String(fix.data.id)],
      [String(fix.data.id), '2026-05-02', '09:30', 'Matrix field', 'Matrix 15G', '00000-15', 'yes', '8.7', 'lb/acre', '104.4', '12', 'PA-0000', String(id), ''],
    ])
    expect(rows[1]!['correction reason']).toBe('Area was 12 acres')
    expect(rows[0]!.applicator).toBe('Matrix Applicator')
    const bad = await operator.get('/api/application-records/export.csv?season=nineteen')
    expect(bad.status).toBe(400)
  })
})
