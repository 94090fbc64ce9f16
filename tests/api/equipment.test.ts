import { describe, expect, it } from 'vitest'
import { Client, createFarm, sql, type TestFarm } from './helpers'

const planterBody = {
  name: 'Test 12', frameKind: 'folding', rowCount: 12, rowSpacingIn: 30, circumferenceRun: { revolutions: 10, distanceFt: 72 }, slipPercent: 3, meterRatio: 1,
  stages: [
    { driverTeeth: 19, drivenTeeth: 23, driverOptions: [15, 17, 19, 21, 23, 25, 27], drivenOptions: [15, 17, 19, 21, 23, 25] },
    { driverTeeth: 17, drivenTeeth: 28, driverOptions: [17, 19, 22], drivenOptions: [20, 24, 26, 28] },
  ],
}

async function farmWithPlanter(): Promise<{ farm: TestFarm, foreman: Client, planter: { id: number, sections: { id: number, stages: { id: number }[] }[], rowUnits: { id: number, position: number }[], configVersion: number }, plateId: number }> {
  const farm = await createFarm()
  const foreman = await farm.as('foreman')
  const plate = await foreman.post('/api/plates', { code: 'T-C30', crops: ['corn'], cellsPerPlate: 30, quantityOnHand: 12 })
  expect(plate.status).toBe(201)
  const res = await foreman.post('/api/planters', planterBody)
  expect(res.status).toBe(201)
  await foreman.patch(`/api/planters/${res.data.id}/row-units`, { positions: Array.from({ length: 12 }, (_, i) => i + 1), changes: { seedPlateId: plate.data.id } })
  return { farm, foreman, planter: res.data, plateId: plate.data.id }
}

describe('planters and inventory', () => {
  it('creates a planter with a drive train and one row unit per row, the circumference from a measured run', async () => {
    const { planter } = await farmWithPlanter()
    expect(planter).toMatchObject({ rowCount: 12, wheelCircumferenceIn: 86.4, circumferenceRevolutions: 10, circumferenceDistanceFt: 72 })
    expect(planter.sections).toHaveLength(1)
    expect(planter.sections[0]!.stages).toHaveLength(2)
    expect(planter.rowUnits.map((u) => u.position)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12])
  })

  it('lets only the foreman and the owner edit equipment', async () => {
    const { farm, planter } = await farmWithPlanter()
    for (const role of ['operator', 'agronomist'] as const) {
      const c = await farm.as(role)
      expect((await c.post('/api/planters', planterBody)).status).toBe(403)
      expect((await c.patch(`/api/planters/${planter.id}`, { name: 'Nope' })).status).toBe(403)
      expect((await c.post('/api/sprockets', { teeth: 20 })).status).toBe(403)
      expect((await c.get(`/api/planters/${planter.id}`)).status).toBe(200)
    }
    const owner = await farm.as('owner')
    expect((await owner.patch(`/api/planters/${planter.id}`, { name: 'Renamed' })).data.name).toBe('Renamed')
  })

  it('answers 400 with a message per field and changes nothing', async () => {
    const { foreman, planter } = await farmWithPlanter()
    const before = await sql('select count(*)::int as n from planters')
    const bad = await foreman.post('/api/planters', {
      ...planterBody, slipPercent: 60, rowSpacingIn: 0, extra: true,
      stages: [{ driverTeeth: 0, drivenTeeth: 'twenty' }, ...Array.from({ length: 6 }, () => ({ driverTeeth: 20, drivenTeeth: 20 }))],
    })
    expect(bad.status).toBe(400)
    const f = bad.data.data.fields
    expect(f.slipPercent).toMatch(/0 to 50/)
    expect(f.rowSpacingIn).toMatch(/more than 0/)
    expect(f.extra).toBe('Unknown field')
    expect(f.stages).toMatch(/at most 6/)
    expect(f['stages.0.driverTeeth']).toMatch(/1 to 200/)
    expect(f['stages.0.drivenTeeth']).toMatch(/number/)
    expect(await sql('select count(*)::int as n from planters')).toEqual(before)
    const stage = planter.sections[0]!.stages[0]!
    expect((await foreman.patch(`/api/stages/${stage.id}`, { driverTeeth: -3 })).status).toBe(400)
  })

  it('answers 404 for another farm\'s planter, stage and row unit', async () => {
    const { planter } = await farmWithPlanter()
    const other = await (await createFarm()).as('owner')
    expect((await other.get(`/api/planters/${planter.id}`)).status).toBe(404)
    expect((await other.patch(`/api/stages/${planter.sections[0]!.stages[0]!.id}`, { driverTeeth: 20 })).status).toBe(404)
    expect((await other.patch(`/api/row-units/${planter.rowUnits[0]!.id}`, { depthIn: 2 })).status).toBe(404)
    expect((await other.post(`/api/planters/${planter.id}/solve`, { targetSeedsPerAcre: 34000 })).status).toBe(404)
  })

  it('edits several row units at once and bumps the planter\'s configuration version', async () => {
    const { foreman, planter } = await farmWithPlanter()
    const res = await foreman.patch(`/api/planters/${planter.id}/row-units`, { positions: [1, 2, 3], changes: { depthIn: 2.25, pressWheel: 'dual-rib', downPressureLb: 200 } })
    expect(res.status).toBe(200)
    const rows = await sql<{ position: number, depth_in: string, press_wheel: string }>('select position, depth_in, press_wheel from row_units where planter_id = $1 and position <= 4 order by position', [planter.id])
    expect(rows.map((r) => [r.position, Number(r.depth_in), r.press_wheel])).toEqual([[1, 2.25, 'dual-rib'], [2, 2.25, 'dual-rib'], [3, 2.25, 'dual-rib'], [4, 1.75, 'open-center']])
    const [{ config_version }] = await sql<{ config_version: number }>('select config_version from planters where id = $1', [planter.id]) as [{ config_version: number }]
    expect(config_version).toBeGreaterThan(planter.configVersion)
    expect((await foreman.patch(`/api/planters/${planter.id}/row-units`, { positions: [13], changes: { depthIn: 2 } })).status).toBe(400)
  })

  it('splits a row bar into a second drive section with its own stage', async () => {
    const { foreman, planter } = await farmWithPlanter()
    const res = await foreman.post(`/api/planters/${planter.id}/sections`, { name: 'Split bar', rows: [2, 4, 6] })
    expect(res.status).toBe(201)
    expect(res.data.sections.map((s: { name: string, rows: number[] }) => [s.name, s.rows])).toEqual([
      ['Main drive', [1, 3, 5, 7, 8, 9, 10, 11, 12]],
      ['Split bar', [2, 4, 6]],
    ])
  })
})

describe('solver and rate chart over the farm\'s parts', () => {
  it('returns ranked plate and sprocket choices with the parts to swap', async () => {
    const { foreman, planter } = await farmWithPlanter()
    const res = await foreman.post(`/api/planters/${planter.id}/solve`, { targetSeedsPerAcre: 34_000, limit: 5 })
    expect(res.status).toBe(200)
    const [best] = res.data.choices
    // 17/23 × 17/26 with 30 cells on an 86.4 in wheel at 3 % slip (computed with the meter formula).
    expect(best.stages).toEqual([{ position: 1, driverTeeth: 17, drivenTeeth: 23 }, { position: 2, driverTeeth: 17, drivenTeeth: 26 }])
    expect(Math.round(best.seedsPerAcre)).toBe(34_033)
    expect(best.swaps).toEqual([{ part: 'driver', stage: 1, from: '19T', to: '17T' }, { part: 'driven', stage: 2, from: '28T', to: '26T' }])
    expect(res.data.choices).toHaveLength(5)
  })

  it('serves the rate chart as JSON and CSV', async () => {
    const { foreman, planter, plateId } = await farmWithPlanter()
    const chart = await foreman.get(`/api/planters/${planter.id}/rate-chart?plateId=${plateId}&rowSpacings=20`)
    expect(chart.status).toBe(200)
    expect(chart.data.rowSpacingsIn).toEqual([30, 20])
    expect(chart.data.rows.length).toBe(chart.data.total)
    const csv = await foreman.get(`/api/planters/${planter.id}/rate-chart.csv?plateId=${plateId}`)
    expect(csv.headers.get('content-type')).toMatch(/text\/csv/)
    expect(String(csv.data).split('\n')[0]).toContain('seeds/acre at 30 in')
    expect((await foreman.get(`/api/planters/${planter.id}/rate-chart?rowSpacings=abc`)).status).toBe(400)
  })
})

describe('versioned setups', () => {
  async function withSetup() {
    const ctx = await farmWithPlanter()
    const draft = await ctx.foreman.get(`/api/planters/${ctx.planter.id}/setup-draft?crop=corn&target=34000`)
    const operator = await ctx.farm.as('operator')
    const created = await operator.post('/api/setups', { planterId: ctx.planter.id, name: 'Corn 34k', config: draft.data.config, note: 'first' })
    expect(created.status).toBe(201)
    return { ...ctx, operator, setupId: created.data.id as number, config: draft.data.config }
  }

  it('stores the results the server computed, not the client\'s', async () => {
    const { operator, planter, config } = await withSetup()
    const withResults = await operator.post('/api/setups', { planterId: planter.id, name: 'x', config, results: { seedsPerAcre: 1 } })
    expect(withResults.status).toBe(400)
    const { setupId } = await withSetup()
    const [rev] = await sql<{ results: { seedsPerAcre: number } }>('select results from setup_revisions where setup_id = $1', [setupId])
    // 19/23 × 17/28, 30 cells, 86.4 in, 3 % slip → 35,320 seeds/acre (computed).
    expect(Math.round(rev!.results.seedsPerAcre)).toBe(35_320)
  })

  it('saves revisions, refuses a stale one with 409 and overwrites nothing', async () => {
    const { operator, setupId, config } = await withSetup()
    const next = { ...config, sections: [{ ...config.sections[0], stages: [{ position: 1, driverTeeth: 17, drivenTeeth: 23 }, { position: 2, driverTeeth: 17, drivenTeeth: 26 }] }] }
    expect((await operator.post(`/api/setups/${setupId}/revisions`, { baseRevision: 1, config: next, note: 'closer' })).status).toBe(201)
    const stale = await operator.post(`/api/setups/${setupId}/revisions`, { baseRevision: 1, config, note: 'stale' })
    expect(stale.status).toBe(409)
    expect(stale.data.message).toMatch(/Revision 2 was saved after the revision 1/)
    const detail = await operator.get(`/api/setups/${setupId}`)
    expect(detail.data.latestRevision).toBe(2)
    expect(detail.data.revisions.map((r: { revision: number, note: string }) => [r.revision, r.note])).toEqual([[2, 'closer'], [1, 'first']])
    const diff = await operator.get(`/api/setups/${setupId}/diff?from=1&to=2`)
    expect(diff.data.changes).toEqual([
      { path: 'sections.0.stages.0.driverTeeth', label: 'Main drive: stage 1 driver teeth', from: 19, to: 17 },
      { path: 'sections.0.stages.1.drivenTeeth', label: 'Main drive: stage 2 driven teeth', from: 28, to: 26 },
    ])
  })

  it('two users saving on the same revision at once: one 201, one 409, no lost update', async () => {
    const { farm, operator, setupId, config } = await withSetup()
    const foreman = await farm.as('foreman')
    const a = { ...config, targetSeedsPerAcre: 33_000 }
    const b = { ...config, targetSeedsPerAcre: 35_000 }
    const results = await Promise.all([
      operator.post(`/api/setups/${setupId}/revisions`, { baseRevision: 1, config: a }),
      foreman.post(`/api/setups/${setupId}/revisions`, { baseRevision: 1, config: b }),
    ])
    expect(results.map((r) => r.status).sort()).toEqual([201, 409])
    const revs = await sql<{ revision: number }>('select revision from setup_revisions where setup_id = $1 order by revision', [setupId])
    expect(revs.map((r) => r.revision)).toEqual([1, 2])
  })

  it('lets the agronomist comment but not save, and pages the list by keyset', async () => {
    const { farm, setupId, operator, planter, config } = await withSetup()
    const agronomist = await farm.as('agronomist')
    expect((await agronomist.post(`/api/setups/${setupId}/revisions`, { baseRevision: 1, config })).status).toBe(403)
    const c = await agronomist.post(`/api/setups/${setupId}/comments`, { body: 'Looks right for the bottoms.' })
    expect(c.status).toBe(201)
    const nowhere = await agronomist.post(`/api/setups/${setupId}/comments`, { body: 'On a revision that is not there', revision: 9 })
    expect(nowhere.status).toBe(400)
    expect(nowhere.data.data.fields.revision).toBe('This setup has revisions 1 to 1')
    for (let i = 0; i < 3; i++) await operator.post('/api/setups', { planterId: planter.id, name: `More ${i}`, config })
    const first = await operator.get('/api/setups?limit=2')
    expect(first.data.items).toHaveLength(2)
    const second = await operator.get(`/api/setups?limit=2&after=${first.data.nextAfter}`)
    const ids = [...first.data.items, ...second.data.items].map((s: { id: number }) => s.id)
    expect(ids).toEqual([...ids].sort((x, y) => y - x))
    expect(new Set(ids).size).toBe(4)
  })
})

describe('calculators', () => {
  it('POST /api/calc/meter follows its contract', async () => {
    const c = await (await createFarm()).as('operator')
    const res = await c.post('/api/calc/meter', { wheelCircumferenceIn: 60, slipPercent: 0, stages: [{ driverTeeth: 20, drivenTeeth: 20 }], meterRatio: 1, cellsPerPlate: 10, rowSpacingIn: 30, speedMph: 5 })
    expect(res.status).toBe(200)
    // 60 in wheel, 10 seeds per revolution → 6 in spacing → 34,848 seeds/acre at 30 in (computed).
    expect(res.data.seedSpacingIn).toBeCloseTo(6, 10)
    expect(res.data.seedsPerAcre).toBeCloseTo(34_848, 6)
    expect(res.data.seedsPerFoot).toBeCloseTo(2, 10)
    expect(res.data.plateRpm).toBeCloseTo((5 * 17.6 / 6) * 60 / 10, 8)
    const bad = await c.post('/api/calc/meter', { wheelCircumferenceIn: 0, slipPercent: 51, stages: [], meterRatio: 1, cellsPerPlate: 0, rowSpacingIn: '30' })
    expect(bad.status).toBe(400)
    expect(Object.keys(bad.data.data.fields).sort()).toEqual(['cellsPerPlate', 'rowSpacingIn', 'slipPercent', 'stages', 'wheelCircumferenceIn'])
  })

  it('row length and seeding rate', async () => {
    const c = await (await createFarm()).as('agronomist')
    // University of Tennessee Extension (2011): 30 in rows → 17 ft 5 in for 1/1000 acre.
    expect((await c.post('/api/calc/row-length', { rowSpacingIn: 30 })).data).toMatchObject({ feet: 17, inches: 5 })
    const rate = await c.post('/api/calc/seeding-rate', { targetStand: 32_000, germinationPercent: 95, survivalPercent: 90 })
    expect(rate.data.seedsPerAcre).toBeCloseTo(37_426.9, 1)
    expect((await new Client().post('/api/calc/seeding-rate', { targetStand: 1, germinationPercent: 1, survivalPercent: 1 })).status).toBe(401)
  })
})
