import { describe, expect, it } from 'vitest'
import { createFarm, sql, type Client } from './helpers'

const planterBody = {
  name: 'Edge 8', frameKind: 'toolbar', rowCount: 8, rowSpacingIn: 30, wheelCircumferenceIn: 80, slipPercent: 2,
  stages: [{ driverTeeth: 20, drivenTeeth: 24, driverOptions: [16, 18, 20, 22], drivenOptions: [20, 24, 28] }],
}

interface Planter { id: number, configVersion: number, sections: { id: number, rows: number[], stages: { id: number }[] }[], rowUnits: { id: number }[] }

async function setup() {
  const farm = await createFarm()
  const foreman = await farm.as('foreman')
  const planter = (await foreman.post('/api/planters', planterBody)).data as Planter
  const plate = (await foreman.post('/api/plates', { code: 'E-30', crops: ['corn'], cellsPerPlate: 30, quantityOnHand: 2 })).data as { id: number }
  const sprocket = (await foreman.post('/api/sprockets', { teeth: 18, quantityOnHand: 3 })).data as { id: number }
  return { farm, foreman, planter, plate, sprocket }
}

async function configVersion(id: number) {
  const [row] = await sql<{ config_version: number }>('select config_version from planters where id = $1', [id])
  return row!.config_version
}

describe('equipment edits that change nothing or too much', () => {
  it('refuses an empty change with 400 and a message instead of failing, and keeps the version', async () => {
    const { foreman, planter, plate, sprocket } = await setup()
    const version = await configVersion(planter.id)
    const empties: [string, Awaited<ReturnType<Client['patch']>>][] = [
      ['planter', await foreman.patch(`/api/planters/${planter.id}`, {})],
      ['row unit', await foreman.patch(`/api/row-units/${planter.rowUnits[0]!.id}`, {})],
      ['row units', await foreman.patch(`/api/planters/${planter.id}/row-units`, { positions: [1, 2], changes: {} })],
      ['section', await foreman.patch(`/api/sections/${planter.sections[0]!.id}`, {})],
      ['stage', await foreman.patch(`/api/stages/${planter.sections[0]!.stages[0]!.id}`, {})],
      ['plate', await foreman.patch(`/api/plates/${plate.id}`, {})],
      ['sprocket', await foreman.patch(`/api/sprockets/${sprocket.id}`, {})],
    ]
    for (const [what, res] of empties) {
      expect(res.status, what).toBe(400)
      expect(res.data.message, what).toMatch(/nothing to change/i)
    }
    expect(await configVersion(planter.id)).toBe(version)
  })

  it('changes one stage field without emptying the sizes on hand', async () => {
    const { foreman, planter } = await setup()
    const stage = planter.sections[0]!.stages[0]!
    const res = await foreman.patch(`/api/stages/${stage.id}`, { driverTeeth: 22 })
    expect(res.status).toBe(200)
    expect(res.data.sections[0].stages[0]).toMatchObject({ driverTeeth: 22, drivenTeeth: 24, driverOptions: [16, 18, 20, 22], drivenOptions: [20, 24, 28] })
  })

  it('refuses a seed-size range whose upper end is below the lower end', async () => {
    const { foreman, plate } = await setup()
    const created = await foreman.post('/api/plates', { code: 'E-BAD', crops: ['corn'], cellsPerPlate: 24, seedsPerLbMin: 1800, seedsPerLbMax: 1200 })
    expect(created.status).toBe(400)
    expect(created.data.data.fields.seedsPerLbMax).toMatch(/lower end/)
    await foreman.patch(`/api/plates/${plate.id}`, { seedsPerLbMin: 1300, seedsPerLbMax: 1700 })
    const patched = await foreman.patch(`/api/plates/${plate.id}`, { seedsPerLbMax: 1000 })
    expect(patched.status).toBe(400)
    expect(patched.data.data.fields.seedsPerLbMax).toMatch(/lower end/)
    const [row] = await sql<{ seeds_per_lb_max: number }>('select seeds_per_lb_max from seed_plates where id = $1', [plate.id])
    expect(row!.seeds_per_lb_max).toBe(1700)
  })

  it('refuses a drive train too large to search instead of tying up the server', async () => {
    const { foreman, planter } = await setup()
    const sizes = Array.from({ length: 30 }, (_, i) => 12 + i)
    const sectionId = planter.sections[0]!.id
    await foreman.patch(`/api/stages/${planter.sections[0]!.stages[0]!.id}`, { driverOptions: sizes, drivenOptions: sizes })
    for (let i = 0; i < 5; i++) {
      const r = await foreman.post(`/api/sections/${sectionId}/stages`, { driverTeeth: 20, drivenTeeth: 20, driverOptions: sizes, drivenOptions: sizes })
      expect(r.status).toBe(201)
    }
    const solve = await foreman.post(`/api/planters/${planter.id}/solve`, { targetSeedsPerAcre: 34_000 })
    expect(solve.status).toBe(400)
    expect(solve.data.message).toMatch(/too many sprocket combinations/i)
    const plates = (await foreman.get('/api/plates')).data as { id: number }[]
    const chart = await foreman.get(`/api/planters/${planter.id}/rate-chart?plateId=${plates[0]!.id}`)
    expect(chart.status).toBe(400)
    expect(chart.data.message).toMatch(/too many sprocket combinations/i)
    expect((await foreman.get('/api/health')).status).toBe(200)
  })

  it('starts a setup from a planter whose first section gave all its rows to a new one', async () => {
    const { farm, foreman, planter } = await setup()
    const moved = await foreman.post(`/api/planters/${planter.id}/sections`, { name: 'Whole bar', rows: [1, 2, 3, 4, 5, 6, 7, 8] })
    expect(moved.data.sections.map((s: { rows: number[] }) => s.rows.length)).toEqual([0, 8])
    const draft = (await foreman.get(`/api/planters/${planter.id}/setup-draft?crop=corn&target=32000`)).data
    expect(draft.config.sections.map((s: { name: string }) => s.name)).toEqual(['Whole bar'])
    const saved = await (await farm.as('operator')).post('/api/setups', { planterId: planter.id, name: 'Whole bar setup', config: draft.config })
    expect(saved.status).toBe(201)
  })

  it('refuses a setup that names a drive section of another planter', async () => {
    const { farm, foreman, planter } = await setup()
    const other = (await foreman.post('/api/planters', { ...planterBody, name: 'Edge other' })).data as Planter
    const draft = (await foreman.get(`/api/planters/${planter.id}/setup-draft?crop=corn&target=32000`)).data
    const operator = await farm.as('operator')
    const config = { ...draft.config, sections: [{ ...draft.config.sections[0], sectionId: other.sections[0]!.id }] }
    const res = await operator.post('/api/setups', { planterId: planter.id, name: 'Wrong section', config })
    expect(res.status).toBe(400)
    expect(res.data.data.fields['config.sections.0.sectionId']).toMatch(/not a drive section of this planter/)
    const [n] = await sql<{ n: number }>('select count(*)::int as n from setups where planter_id = $1', [planter.id])
    expect(n!.n).toBe(0)
  })
})

describe('inventory over HTTP', () => {
  it('updates and deletes plates and sprockets; other roles read but cannot write', async () => {
    const { farm, foreman, plate, sprocket } = await setup()
    const p = await foreman.patch(`/api/plates/${plate.id}`, { quantityOnHand: 5, wearNotes: 'one chipped cell' })
    expect(p.data).toMatchObject({ quantityOnHand: 5, wearNotes: 'one chipped cell' })
    // A change to one field leaves the count alone.
    expect((await foreman.patch(`/api/plates/${plate.id}`, { wearNotes: 'two chipped cells' })).data.quantityOnHand).toBe(5)
    expect((await foreman.patch(`/api/sprockets/${sprocket.id}`, { chainPitch: '#50' })).data).toMatchObject({ chainPitch: '#50', quantityOnHand: 3 })
    const s = await foreman.patch(`/api/sprockets/${sprocket.id}`, { quantityOnHand: 0 })
    expect(s.data.quantityOnHand).toBe(0)
    for (const role of ['operator', 'agronomist'] as const) {
      const c = await farm.as(role)
      expect((await c.get('/api/plates')).data.map((x: { code: string }) => x.code)).toEqual(['E-30'])
      expect((await c.patch(`/api/plates/${plate.id}`, { quantityOnHand: 9 })).status).toBe(403)
      expect((await c.delete(`/api/sprockets/${sprocket.id}`)).status).toBe(403)
    }
    const owner = await farm.as('owner')
    expect((await owner.delete(`/api/sprockets/${sprocket.id}`)).data).toEqual({ deleted: sprocket.id })
    expect((await owner.get('/api/sprockets')).data).toEqual([])
    const dup = await foreman.post('/api/plates', { code: 'E-30', crops: ['corn'], cellsPerPlate: 30 })
    expect(dup.status).toBe(409)
  })

  it('answers 404 for another farm\'s plate, sprocket, section and setup', async () => {
    const { foreman, planter, plate, sprocket, farm } = await setup()
    const draft = (await foreman.get(`/api/planters/${planter.id}/setup-draft?crop=corn&target=32000`)).data
    const setupRes = await (await farm.as('operator')).post('/api/setups', { planterId: planter.id, name: 'Mine', config: draft.config })
    expect(setupRes.status).toBe(201)
    const stranger = await (await createFarm()).as('owner')
    expect((await stranger.patch(`/api/plates/${plate.id}`, { quantityOnHand: 1 })).status).toBe(404)
    expect((await stranger.delete(`/api/sprockets/${sprocket.id}`)).status).toBe(404)
    expect((await stranger.patch(`/api/sections/${planter.sections[0]!.id}`, { name: 'x' })).status).toBe(404)
    expect((await stranger.delete(`/api/planters/${planter.id}`)).status).toBe(404)
    expect((await stranger.get(`/api/setups/${setupRes.data.id}`)).status).toBe(404)
    expect((await stranger.post(`/api/setups/${setupRes.data.id}/comments`, { body: 'hi' })).status).toBe(404)
    expect((await stranger.get(`/api/setups/${setupRes.data.id}/diff?from=1&to=1`)).status).toBe(404)
    expect((await stranger.get('/api/setups')).data.items).toEqual([])
    const [q] = await sql<{ quantity_on_hand: number }>('select quantity_on_hand from seed_plates where id = $1', [plate.id])
    expect(q!.quantity_on_hand).toBe(2)
  })

  it('filters the setup list by planter and crop', async () => {
    const { farm, foreman, planter } = await setup()
    const second = (await foreman.post('/api/planters', { ...planterBody, name: 'Edge second' })).data as Planter
    const operator = await farm.as('operator')
    for (const [p, crop, name] of [[planter.id, 'corn', 'A corn'], [planter.id, 'soybeans', 'A beans'], [second.id, 'corn', 'B corn']] as const) {
      const draft = (await foreman.get(`/api/planters/${p}/setup-draft?crop=${crop}&target=32000`)).data
      expect((await operator.post('/api/setups', { planterId: p, name, config: draft.config })).status).toBe(201)
    }
    const names = async (q: string) => ((await operator.get(`/api/setups?${q}`)).data.items as { name: string }[]).map((s) => s.name)
    expect(await names(`planterId=${planter.id}`)).toEqual(['A beans', 'A corn'])
    expect(await names('crop=corn')).toEqual(['B corn', 'A corn'])
    expect(await names(`planterId=${planter.id}&crop=corn`)).toEqual(['A corn'])
    const bad = await operator.get('/api/setups?limit=0')
    expect(bad.status).toBe(400)
    expect(bad.data.data.fields.limit).toBeTruthy()
  })
})
