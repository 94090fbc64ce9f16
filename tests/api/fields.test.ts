import { describe, expect, it } from 'vitest'
import { createFarm, sql } from './helpers'
import { SQUARE } from './routes-fields'

const auditCount = async (farmId: number, entity: string) => (await sql<{ n: number }>('select count(*)::int as n from audit_log where farm_id = $1 and entity = $2', [farmId, entity]))[0]!.n
const fieldCount = async (farmId: number) => (await sql<{ n: number }>('select count(*)::int as n from fields where farm_id = $1', [farmId]))[0]!.n

// A field or lot that a plan uses, made in SQL (the plan routes are not part of this area).
async function planUsing(farmId: number, fieldId: number, lotId: number | null) {
  await sql(`insert into crop_plans (farm_id, season, field_id, crop, seed_lot_id, target_stand, row_spacing_in) values ($1, 2027, $2, 'corn', $3, 32000, 30)`, [farmId, fieldId, lotId])
}

describe('fields', () => {
  it('the owner and agronomist create, edit and delete fields; operator and foreman read only; every write is audited', async () => {
    const farm = await createFarm()
    const agro = await farm.as('agronomist')
    const created = await agro.post('/api/fields', { name: 'Mill Lot', acres: 62.5, soilTexture: 'silt loam', tillage: 'no-till', drainage: 'tiled' })
    expect(created.status).toBe(201)
    expect(created.data).toMatchObject({ name: 'Mill Lot', acres: 62.5, tillage: 'no-till', drainage: 'tiled', boundary: null, boundaryAcres: null })
    for (const role of ['operator', 'foreman'] as const) {
      const c = await farm.as(role)
      expect((await c.post('/api/fields', { name: 'Nope', acres: 1 })).status).toBe(403)
      expect((await c.patch(`/api/fields/${created.data.id}`, { acres: 2 })).status).toBe(403)
      expect((await c.delete(`/api/fields/${created.data.id}`)).status).toBe(403)
      expect((await c.get(`/api/fields/${created.data.id}`)).data.name).toBe('Mill Lot')
    }
    const owner = await farm.as('owner')
    const patched = await owner.patch(`/api/fields/${created.data.id}`, { acres: 60, notes: 'Fence moved' })
    expect(patched.data).toMatchObject({ acres: 60, notes: 'Fence moved', soilTexture: 'silt loam' })
    expect((await owner.patch(`/api/fields/${created.data.id}`, {})).status).toBe(400)
    expect((await owner.delete(`/api/fields/${created.data.id}`)).data).toEqual({ deleted: created.data.id })
    expect((await owner.get(`/api/fields/${created.data.id}`)).status).toBe(404)
    const actions = await sql<{ action: string }>(`select action from audit_log where farm_id = $1 and entity = 'field' order by id`, [farm.farmId])
    expect(actions.map((a) => a.action)).toEqual(['create', 'update', 'delete'])
  })

  it('bad input is a 400 with a message per field and writes nothing', async () => {
    const farm = await createFarm()
    const agro = await farm.as('agronomist')
    const bad = await agro.post('/api/fields', { name: ' ', acres: -3, tillage: 'chisel', extra: 1 })
    expect(bad.status).toBe(400)
    expect(bad.data.data.fields).toEqual({ name: 'Enter a name', acres: 'Acres must be from 0.01 to 100,000 ac', tillage: 'Choose conventional, minimum or no-till', extra: 'Unknown field' })
    expect(await fieldCount(farm.farmId)).toBe(0)
    expect(await auditCount(farm.farmId, 'field')).toBe(0)
  })

  it('a duplicate name is a 409 with the name, and a field a plan uses cannot be deleted', async () => {
    const farm = await createFarm()
    const agro = await farm.as('agronomist')
    const a = await agro.post('/api/fields', { name: 'East Forty', acres: 40 })
    const dup = await agro.post('/api/fields', { name: 'east forty', acres: 41 })
    expect(dup.status).toBe(409)
    expect(dup.data.message).toBe('A field named "east forty" already exists')
    await planUsing(farm.farmId, a.data.id, null)
    const del = await agro.delete(`/api/fields/${a.data.id}`)
    expect(del.status).toBe(409)
    expect(del.data.message).toBe('A crop plan uses this field; delete or move that plan first')
    expect(await fieldCount(farm.farmId)).toBe(1)
  })

  it("another farm's field is a 404 for reads and writes", async () => {
    const mine = await createFarm()
    const theirs = await createFarm()
    const f = await (await theirs.as('owner')).post('/api/fields', { name: 'Theirs', acres: 10 })
    const me = await mine.as('owner')
    expect((await me.get(`/api/fields/${f.data.id}`)).status).toBe(404)
    expect((await me.patch(`/api/fields/${f.data.id}`, { acres: 1 })).status).toBe(404)
    expect((await me.put(`/api/fields/${f.data.id}/boundary`, SQUARE)).status).toBe(404)
    expect((await me.delete(`/api/fields/${f.data.id}`)).status).toBe(404)
    expect((await me.get('/api/fields')).data.total).toBe(0)
  })

  it('lists with a filter, a sort, pages and a total', async () => {
    const farm = await createFarm()
    const owner = await farm.as('owner')
    const rows = [['Alpha', 120, 'loam'], ['Bravo', 40, 'sandy loam'], ['Charlie', 80, 'clay'], ['Delta', 60, 'silt loam'], ['Echo', 100, 'loam']] as const
    for (const [name, acres, soilTexture] of rows) expect((await owner.post('/api/fields', { name, acres, soilTexture })).status).toBe(201)
    const page1 = await owner.get('/api/fields?sort=acres&dir=desc&limit=2')
    expect(page1.data).toMatchObject({ total: 5, totalAcres: 400, page: 1, limit: 2 })
    expect(page1.data.items.map((f: { name: string }) => f.name)).toEqual(['Alpha', 'Echo'])
    const page3 = await owner.get('/api/fields?sort=acres&dir=desc&limit=2&page=3')
    expect(page3.data.items.map((f: { name: string }) => f.name)).toEqual(['Bravo'])
    const loam = await owner.get('/api/fields?q=LOAM&sort=name')
    expect(loam.data.items.map((f: { name: string }) => f.name)).toEqual(['Alpha', 'Bravo', 'Delta', 'Echo'])
    expect(loam.data.total).toBe(4)
    expect((await owner.get('/api/fields?q=100%25')).data.total).toBe(0)
    const bad = await owner.get('/api/fields?sort=password&limit=0')
    expect(bad.status).toBe(400)
    expect(Object.keys(bad.data.data.fields).sort()).toEqual(['limit', 'sort'])
  })
})

describe('field boundary', () => {
  it('a valid outline sets its acres (a 0.01° square at 40.88° N ≈ 230.99 ac) and draws it; useAcres makes them the field acres', async () => {
    const farm = await createFarm()
    const agro = await farm.as('agronomist')
    const f = await agro.post('/api/fields', { name: 'Square', acres: 230 })
    const put = await agro.put(`/api/fields/${f.data.id}/boundary`, { type: 'Feature', properties: { name: 'x' }, geometry: SQUARE })
    expect(put.status).toBe(200)
    // 0.01° × 0.01° at 40.88–40.89° N on turf's sphere: R² × Δλ × (sin φ2 − sin φ1) = 934,775 m² → 230.99 ac (computed).
    expect(put.data.boundaryAcres).toBeCloseTo(230.99, 2)
    expect(put.data.measuredAcres).toBe(put.data.boundaryAcres)
    expect(put.data.acres).toBe(230)
    expect(put.data.boundary.type).toBe('Polygon')
    expect(put.data.outlinePath).toMatch(/^M[\d.,L]+Z$/)
    const list = await agro.get('/api/fields')
    expect(list.data.items[0]).toMatchObject({ hasBoundary: true, boundaryAcres: put.data.boundaryAcres })
    expect(list.data.items[0].boundary).toBeUndefined()
    const used = await agro.put(`/api/fields/${f.data.id}/boundary?useAcres=true`, SQUARE)
    expect(used.data.acres).toBe(used.data.boundaryAcres)
    const cleared = await agro.delete(`/api/fields/${f.data.id}/boundary`)
    expect(cleared.data).toMatchObject({ boundary: null, boundaryAcres: null, acres: used.data.acres })
    expect((await agro.delete(`/api/fields/${f.data.id}/boundary`)).status).toBe(404)
    const actions = await sql<{ action: string }>(`select action from audit_log where farm_id = $1 and entity = 'field' order by id`, [farm.farmId])
    expect(actions.map((a) => a.action)).toEqual(['create', 'set-boundary', 'set-boundary', 'clear-boundary'])
  })

  it('a self-intersecting, unclosed, short or out-of-range outline is a 400 with a clear message and changes nothing', async () => {
    const farm = await createFarm()
    const agro = await farm.as('agronomist')
    const f = await agro.post('/api/fields', { name: 'Bad outline', acres: 50 })
    const cases: [unknown, RegExp][] = [
      [{ type: 'Polygon', coordinates: [[[0, 0], [0.01, 0.01], [0.01, 0], [0, 0.01], [0, 0]]] }, /crosses itself/],
      [{ type: 'Polygon', coordinates: [[[0, 0], [0.01, 0], [0.01, 0.01], [0, 0.01]]] }, /is not closed/],
      [{ type: 'Polygon', coordinates: [[[0, 0], [0.01, 0], [0, 0]]] }, /at least 4/],
      [{ type: 'Polygon', coordinates: [[[200, 0], [201, 0], [201, 1], [200, 0]]] }, /longitude 200 is outside/],
      [{ type: 'LineString', coordinates: [[0, 0], [1, 1]] }, /not a LineString/],
      ['not json at all', /Upload a GeoJSON/],
    ]
    for (const [body, message] of cases) {
      const res = await agro.put(`/api/fields/${f.data.id}/boundary`, typeof body === 'string' ? JSON.stringify(body) : body)
      expect(res.status).toBe(400)
      expect(res.data.message).toMatch(message)
      expect(res.data.data.fields.boundary).toBe(res.data.message)
    }
    const [row] = await sql<{ boundary: unknown, boundary_acres: unknown }>('select boundary, boundary_acres from fields where id = $1', [f.data.id])
    expect(row).toEqual({ boundary: null, boundary_acres: null })
    expect(await auditCount(farm.farmId, 'field')).toBe(1)
  })
})

describe('field list import', () => {
  const csv = [
    'name,acres,soil texture,tillage,drainage,notes',
    'North Bend,120,silt loam,no-till,tiled,',
    'South Bend,eighty,loam,,,',
    'Mill Lot,40,,min-till,,',
    'North Bend,55,,,,',
    'Home Place,75,,,,',
  ].join('\n')

  it('check mode reports each bad row by line and imports nothing', async () => {
    const farm = await createFarm()
    const agro = await farm.as('agronomist')
    await agro.post('/api/fields', { name: 'home place', acres: 75 })
    const res = await agro.post('/api/fields/import', { csv, mode: 'check' })
    expect(res.status).toBe(200)
    expect(res.data).toMatchObject({ mode: 'check', dataRows: 5, valid: 2, imported: 0 })
    expect(res.data.errors).toEqual([
      { line: 3, message: 'acres: "eighty" is not a number' },
      { line: 5, message: 'name: "North Bend" is also on line 2' },
      { line: 6, message: 'name: a field named "Home Place" is already on this farm' },
    ])
    expect(await fieldCount(farm.farmId)).toBe(1)
  })

  it('all-or-nothing refuses a file with bad rows with a 400 listing them, then imports the fixed file in one audited write', async () => {
    const farm = await createFarm()
    const agro = await farm.as('agronomist')
    const refused = await agro.post('/api/fields/import', { csv, mode: 'all-or-nothing' })
    expect(refused.status).toBe(400)
    expect(refused.data.message).toBe('2 lines need attention; nothing was imported')
    expect(refused.data.data.errors.map((e: { line: number }) => e.line)).toEqual([3, 5])
    expect(await fieldCount(farm.farmId)).toBe(0)
    expect(await auditCount(farm.farmId, 'field')).toBe(0)
    const fixed = csv.replace('eighty', '80').replace('North Bend,55', 'North Bend East,55')
    const ok = await agro.post('/api/fields/import', { csv: fixed, mode: 'all-or-nothing' })
    expect(ok.status).toBe(201)
    expect(ok.data).toMatchObject({ imported: 5, errors: [] })
    expect(ok.data.items.map((i: { line: number }) => i.line)).toEqual([2, 3, 4, 5, 6])
    const rows = await sql<{ name: string, acres: string, tillage: string }>('select name, acres::float as acres, tillage from fields where farm_id = $1 order by name', [farm.farmId])
    expect(rows).toEqual([
      { name: 'Home Place', acres: 75, tillage: 'conventional' },
      { name: 'Mill Lot', acres: 40, tillage: 'minimum' },
      { name: 'North Bend', acres: 120, tillage: 'no-till' },
      { name: 'North Bend East', acres: 55, tillage: 'conventional' },
      { name: 'South Bend', acres: 80, tillage: 'conventional' },
    ])
    const [audit] = await sql<{ action: string, after: { created: unknown[] } }>(`select action, after from audit_log where farm_id = $1 and entity = 'field'`, [farm.farmId])
    expect(audit!.action).toBe('import')
    expect(audit!.after.created).toHaveLength(5)
  })

  it('good-rows mode imports only the good rows and reports the rest', async () => {
    const farm = await createFarm()
    const owner = await farm.as('owner')
    const res = await owner.post('/api/fields/import', { csv, mode: 'good-rows' })
    expect(res.status).toBe(201)
    expect(res.data).toMatchObject({ imported: 3, valid: 3 })
    expect(res.data.errors.map((e: { line: number }) => e.line)).toEqual([3, 5])
    expect((await owner.get('/api/fields?sort=name')).data.items.map((f: { name: string }) => f.name)).toEqual(['Home Place', 'Mill Lot', 'North Bend'])
    const none = await owner.post('/api/fields/import', { csv: 'name,acres\n,1\n', mode: 'good-rows' })
    expect(none.status).toBe(400)
    expect(none.data.message).toBe('No line can be imported; 1 line needs attention')
    expect((await (await farm.as('operator')).post('/api/fields/import', { csv, mode: 'check' })).status).toBe(403)
  })
})

describe('seed lots', () => {
  const corn = { crop: 'corn', variety: 'CF 110 Test Ridge', lotNumber: 'T-110-A', seedsPerLb: 1600, germinationPercent: 95, unitsOnHand: 20, unitSize: 80_000 }
  const soyBag = { crop: 'soybeans', variety: 'CF 2.9 Test', lotNumber: 'T-29-B', seedsPerLb: 2800, germinationPercent: 92, unitKind: 'lb', unitSize: 50 }

  it('carries each unit in seeds and lb: 80,000 kernels at 1,600/lb = 50 lb; a 50 lb bag at 2,800 seeds/lb = 140,000 seeds (University of Missouri IPM, Wiebold 2008)', async () => {
    const farm = await createFarm()
    const agro = await farm.as('agronomist')
    const a = await agro.post('/api/seed-lots', corn)
    expect(a.status).toBe(201)
    expect(a.data).toMatchObject({ unitKind: 'seeds', seedsPerUnit: 80_000, unitWeightLb: 50 })
    const b = await agro.post('/api/seed-lots', soyBag)
    expect(b.data).toMatchObject({ unitKind: 'lb', unitSize: 50, seedsPerUnit: 140_000, unitWeightLb: 50, unitsOnHand: 0 })
    const list = await agro.get('/api/seed-lots?crop=soybeans')
    expect(list.data.items.map((l: { lotNumber: string }) => l.lotNumber)).toEqual(['T-29-B'])
    expect((await agro.get(`/api/seed-lots/${a.data.id}`)).data.variety).toBe('CF 110 Test Ridge')
  })

  it('the foreman changes only units on hand; the operator reads; a used lot cannot be deleted; audited', async () => {
    const farm = await createFarm()
    const owner = await farm.as('owner')
    const lot = await owner.post('/api/seed-lots', corn)
    const foreman = await farm.as('foreman')
    expect((await foreman.patch(`/api/seed-lots/${lot.data.id}`, { unitsOnHand: 18 })).data.unitsOnHand).toBe(18)
    const refused = await foreman.patch(`/api/seed-lots/${lot.data.id}`, { unitsOnHand: 17, germinationPercent: 99 })
    expect(refused.status).toBe(403)
    expect(refused.data.message).toMatch(/only the units on hand/)
    expect((await foreman.post('/api/seed-lots', { ...corn, lotNumber: 'X' })).status).toBe(403)
    const operator = await farm.as('operator')
    expect((await operator.patch(`/api/seed-lots/${lot.data.id}`, { unitsOnHand: 1 })).status).toBe(403)
    expect((await operator.get('/api/seed-lots')).data.items).toHaveLength(1)
    const dup = await owner.post('/api/seed-lots', corn)
    expect(dup.status).toBe(409)
    expect(dup.data.message).toBe('Lot T-110-A is already on file')
    const f = await owner.post('/api/fields', { name: 'Plan field', acres: 10 })
    await planUsing(farm.farmId, f.data.id, lot.data.id)
    const del = await owner.delete(`/api/seed-lots/${lot.data.id}`)
    expect(del.status).toBe(409)
    expect(del.data.message).toBe('A crop plan uses this seed lot; choose another lot in that plan first')
    const actions = await sql<{ action: string }>(`select action from audit_log where farm_id = $1 and entity = 'seed_lot' order by id`, [farm.farmId])
    expect(actions.map((a) => a.action)).toEqual(['create', 'update'])
  })

  it('a unit that cannot be right is a 400 naming the field; another farm is a 404', async () => {
    const farm = await createFarm()
    const owner = await farm.as('owner')
    const heavy = await owner.post('/api/seed-lots', { ...soyBag, unitSize: 140_000 })
    expect(heavy.status).toBe(400)
    expect(heavy.data.data.fields.unitSize).toMatch(/weight unit is at most 5,000 lb/)
    const bad = await owner.post('/api/seed-lots', { ...corn, germinationPercent: 120, seedsPerLb: 0 })
    expect(bad.data.data.fields).toMatchObject({ germinationPercent: 'Germination must be from 1 to 100 %', seedsPerLb: 'Seeds per lb must be from 1 to 1,000,000' })
    const other = await createFarm()
    const theirs = await (await other.as('owner')).post('/api/seed-lots', corn)
    expect((await owner.get(`/api/seed-lots/${theirs.data.id}`)).status).toBe(404)
    expect((await owner.patch(`/api/seed-lots/${theirs.data.id}`, { unitsOnHand: 1 })).status).toBe(404)
    expect((await owner.delete(`/api/seed-lots/${theirs.data.id}`)).status).toBe(404)
  })
})
