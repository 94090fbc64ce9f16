import * as schema from '../../server/db/schema'
import { checkBoundary, type Position } from '../../shared/utils/boundary'
import type { SeedDb } from './index'
import type { seedAccounts } from './accounts'

type Accounts = Awaited<ReturnType<typeof seedAccounts>>

// An invented block of ground; corners as lon/lat offsets in degrees from an invented origin.
const ORIGIN: Position = [-97.612, 40.884]
const ring = (pts: [number, number][]): Position[] => {
  const out = pts.map(([x, y]) => [Number((ORIGIN[0] + x).toFixed(6)), Number((ORIGIN[1] + y).toFixed(6))] as Position)
  return [...out, out[0]!]
}
// Quarter-mile by half-mile: about 80 acres at this latitude.
const SCHOOLHOUSE = { type: 'Polygon' as const, coordinates: [ring([[0, 0], [0.00956, 0], [0.00956, 0.00362], [0, 0.00362]])] }
// An L along the draw, with the wet corner cut out.
const WILLOW = { type: 'Polygon' as const, coordinates: [ring([[0.012, 0], [0.020, 0], [0.020, 0.0036], [0.016, 0.0036], [0.016, 0.0072], [0.012, 0.0072]])] }
// A quarter section with the farmstead left out as a hole.
const HOME = {
  type: 'Polygon' as const,
  coordinates: [
    ring([[0, 0.008], [0.00956, 0.008], [0.00956, 0.01524], [0, 0.01524]]),
    ring([[0.0005, 0.0145], [0.0025, 0.0145], [0.0025, 0.0152], [0.0005, 0.0152]]),
  ],
}

// Cottonwood Flats Farm's fields for the demo season (names, soils and figures invented).
export async function seedFields(db: SeedDb, a: Accounts) {
  const farmId = a.farm.id
  const measured = (g: unknown) => {
    const r = checkBoundary(g)
    if (!r.ok) throw new Error(`Demo boundary is invalid: ${r.message}`)
    return r
  }
  const school = measured(SCHOOLHOUSE)
  const willow = measured(WILLOW)
  const home = measured(HOME)
  const rows: (typeof schema.fields.$inferInsert)[] = [
    { farmId, name: 'Home Quarter', acres: 152, soilTexture: 'silty clay loam', tillage: 'minimum', drainage: 'tiled', boundary: home.geometry, boundaryAcres: home.acres, notes: 'Farmstead and shop yard left out of the outline.' },
    { farmId, name: 'Schoolhouse 80', acres: Math.round(school.acres * 10) / 10, soilTexture: 'silt loam', tillage: 'no-till', drainage: 'well', boundary: school.geometry, boundaryAcres: school.acres, notes: 'Corn on soybean stubble this year.' },
    { farmId, name: 'Willow Draw', acres: 98, soilTexture: 'loam', tillage: 'conventional', drainage: 'moderate', boundary: willow.geometry, boundaryAcres: willow.acres, notes: 'Waterway through the middle; lift the planter at the grass.' },
    { farmId, name: 'Creek Bottom North', acres: 64.5, soilTexture: 'clay loam', tillage: 'conventional', drainage: 'poor', notes: 'Floods in wet springs; plant it last.' },
    { farmId, name: 'Creek Bottom South', acres: 57, soilTexture: 'clay loam', tillage: 'minimum', drainage: 'poor' },
    { farmId, name: 'Cemetery Hill', acres: 41.2, soilTexture: 'sandy loam', tillage: 'no-till', drainage: 'well', notes: 'Eroded knob on the west side.' },
    { farmId, name: 'Railroad Strip', acres: 46.8, soilTexture: 'loamy sand', tillage: 'no-till', drainage: 'well' },
    { farmId, name: 'East Forty', acres: 40, soilTexture: 'silt loam', tillage: 'minimum', drainage: 'tiled' },
    { farmId, name: 'Big Pivot', acres: 126, soilTexture: 'fine sandy loam', tillage: 'minimum', drainage: 'well', notes: 'Irrigated circle; corners in grass.' },
    { farmId, name: 'Sand Knob', acres: 72.3, soilTexture: 'loamy fine sand', tillage: 'no-till', drainage: 'well', notes: 'Low water holding; lower corn population.' },
    { farmId, name: 'Windbreak West', acres: 88, soilTexture: 'silty clay', tillage: 'conventional', drainage: 'tiled' },
  ]
  const fields = await db.insert(schema.fields).values(rows).returning()
  const lots = await db.insert(schema.seedLots).values([
    { farmId, crop: 'corn', variety: 'CF 112 Ridgeline', lotNumber: 'RL-2611-A', seedsPerLb: 1_480, germinationPercent: 96, sizeGrade: 'medium flat', treatment: 'base fungicide + seed insecticide', unitsOnHand: 120, unitKind: 'seeds', unitSize: 80_000 },
    { farmId, crop: 'corn', variety: 'CF 112 Ridgeline', lotNumber: 'RL-2611-B', seedsPerLb: 1_320, germinationPercent: 95, sizeGrade: 'large round', treatment: 'base fungicide + seed insecticide', unitsOnHand: 40, unitKind: 'seeds', unitSize: 80_000 },
    { farmId, crop: 'corn', variety: 'CF 106 Prairie Dawn', lotNumber: 'PD-2604-C', seedsPerLb: 1_650, germinationPercent: 94, sizeGrade: 'small flat', treatment: 'base fungicide', unitsOnHand: 65, unitKind: 'seeds', unitSize: 80_000, notes: 'Short season for the creek bottoms.' },
    { farmId, crop: 'corn', variety: 'CF 101 Shortgrass', lotNumber: 'SG-2601-D', seedsPerLb: 1_560, germinationPercent: 92, sizeGrade: 'medium round', treatment: 'untreated', unitsOnHand: 12, unitKind: 'seeds', unitSize: 80_000 },
    { farmId, crop: 'soybeans', variety: 'CF 2.8 Meadowlark', lotNumber: 'ML-28-0417', seedsPerLb: 2_800, germinationPercent: 93, sizeGrade: 'sized', treatment: 'fungicide + inoculant', unitsOnHand: 180, unitKind: 'seeds', unitSize: 140_000 },
    { farmId, crop: 'soybeans', variety: 'CF 3.1 Bluestem', lotNumber: 'BS-31-0522', seedsPerLb: 3_200, germinationPercent: 90, sizeGrade: 'small', treatment: 'fungicide', unitsOnHand: 75, unitKind: 'seeds', unitSize: 140_000 },
    { farmId, crop: 'soybeans', variety: 'CF 2.4 Sandpiper', lotNumber: 'SP-24-0309', seedsPerLb: 2_750, germinationPercent: 91, sizeGrade: 'bin run, cleaned', treatment: 'untreated', unitsOnHand: 60, unitKind: 'lb', unitSize: 50, notes: 'Sold by the 50 lb bag.' },
  ]).returning()
  return {
    fields: Object.fromEntries(fields.map((f) => [f.name, f.id])) as Record<string, number>,
    lots: Object.fromEntries(lots.map((l) => [l.lotNumber, l.id])) as Record<string, number>,
  }
}
