import Decimal from 'decimal.js'
import { area } from '@turf/area'
import { kinks } from '@turf/kinks'

export type Position = [number, number]
export type BoundaryGeometry =
  | { type: 'Polygon', coordinates: Position[][] }
  | { type: 'MultiPolygon', coordinates: Position[][][] }

export type BoundaryResult =
  | { ok: true, geometry: BoundaryGeometry, areaM2: number, acres: number, positions: number }
  | { ok: false, message: string }

// International acre: 4,046.8564224 m² exactly (NIST Handbook 44, Appendix C).
export const M2_PER_ACRE = 4046.8564224
export const BOUNDARY_MAX_POSITIONS = 20_000

function fail(message: string): BoundaryResult {
  return { ok: false, message }
}

// Pulls the polygon out of a Feature, a one-feature FeatureCollection or a bare geometry.
function geometryOf(input: unknown): { geometry?: { type?: unknown, coordinates?: unknown }, error?: string } {
  if (!input || typeof input !== 'object' || Array.isArray(input)) return { error: 'Upload a GeoJSON Feature, Polygon or MultiPolygon' }
  const obj = input as Record<string, unknown>
  if (obj.type === 'FeatureCollection') {
    const features = Array.isArray(obj.features) ? obj.features : []
    if (features.length !== 1) return { error: `The collection holds ${features.length} features; upload one field outline at a time` }
    return geometryOf(features[0])
  }
  if (obj.type === 'Feature') {
    if (!obj.geometry || typeof obj.geometry !== 'object') return { error: 'The Feature has no geometry' }
    return { geometry: obj.geometry as { type?: unknown, coordinates?: unknown } }
  }
  if (obj.type === 'Polygon' || obj.type === 'MultiPolygon') return { geometry: obj as { type?: unknown, coordinates?: unknown } }
  return { error: `A field outline is a Polygon or MultiPolygon, not ${typeof obj.type === 'string' ? `a ${obj.type.slice(0, 40)}` : 'this object'}` }
}

function checkRing(ring: unknown, label: string): { ring?: Position[], error?: string } {
  if (!Array.isArray(ring)) return { error: `${label} is not a list of positions` }
  if (ring.length < 4) return { error: `${label} has ${ring.length} positions; a closed ring needs at least 4 (the last repeats the first)` }
  const out: Position[] = []
  for (let i = 0; i < ring.length; i++) {
    const p = ring[i]
    if (!Array.isArray(p) || p.length < 2 || p.length > 3 || !p.every((v) => typeof v === 'number' && Number.isFinite(v))) {
      return { error: `${label}, position ${i + 1} is not [longitude, latitude]` }
    }
    const [lon, lat] = p as number[]
    if (lon! < -180 || lon! > 180) return { error: `${label}, position ${i + 1}: longitude ${lon} is outside −180 to 180` }
    if (lat! < -90 || lat! > 90) return { error: `${label}, position ${i + 1}: latitude ${lat} is outside −90 to 90` }
    out.push([lon!, lat!])
  }
  const first = out[0]!
  const last = out[out.length - 1]!
  if (first[0] !== last[0] || first[1] !== last[1]) return { error: `${label} is not closed: its last position must repeat the first` }
  if (new Set(out.slice(0, -1).map((q) => `${q[0]},${q[1]}`)).size < 3) return { error: `${label} has fewer than 3 distinct corners` }
  return { ring: out }
}

// Where a position lies against a ring in plain lon/lat (crossing number; field-sized rings, so no
// curvature to speak of): inside, on an edge or corner, or outside.
function sideOf(p: Position, ring: Position[]): 'in' | 'on' | 'out' {
  let inside = false
  for (let i = 0, j = ring.length - 2; i < ring.length - 1; j = i++) {
    const [xi, yi] = ring[i]!
    const [xj, yj] = ring[j]!
    const cross = (xj - xi) * (p[1] - yi) - (yj - yi) * (p[0] - xi)
    if (cross === 0 && p[0] >= Math.min(xi, xj) && p[0] <= Math.max(xi, xj) && p[1] >= Math.min(yi, yj) && p[1] <= Math.max(yi, yj)) return 'on'
    if ((yi > p[1]) !== (yj > p[1]) && p[0] < ((xj - xi) * (p[1] - yi)) / (yj - yi) + xi) inside = !inside
  }
  return inside ? 'in' : 'out'
}

// Rings that do not cross lie wholly inside or outside each other, so one corner not on the other
// ring tells which; a ring with every corner on the other is the same ring.
function ringInside(ring: Position[], other: Position[]): boolean {
  for (const p of ring) {
    const side = sideOf(p, other)
    if (side !== 'on') return side === 'in'
  }
  return true
}

// A point of the part's ground proper: inside its outer ring and outside (not on) every hole.
function onGroundOf(p: Position, polygon: Position[][]): boolean {
  return sideOf(p, polygon[0]!) === 'in' && polygon.slice(1).every((hole) => sideOf(p, hole) === 'out')
}

// Degrees; far below a survey's precision, far above float noise in an intersection point.
const CORNER_TOLERANCE = 1e-9

// Two valid parts share ground when one's corner lies on the other's ground, when one lies wholly
// inside the other, or when their edges cross away from any corner (a plus sign: no corner of either
// lies inside the other). Parts that only touch along an edge or at a corner do not overlap.
function partsOverlap(a: Position[][], b: Position[][]): boolean {
  if (a[0]!.some((p) => onGroundOf(p, b)) || b[0]!.some((p) => onGroundOf(p, a))) return true
  const within = (x: Position[][], y: Position[][]) => ringInside(x[0]!, y[0]!) && !y.slice(1).some((hole) => ringInside(x[0]!, hole))
  if (within(a, b) || within(b, a)) return true
  const corners = [...a.flat(), ...b.flat()]
  const atCorner = (q: Position) => corners.some((c) => Math.abs(c[0]! - q[0]!) < CORNER_TOLERANCE && Math.abs(c[1]! - q[1]!) < CORNER_TOLERANCE)
  // Each part was checked for crossing itself, so every point found here is where the two meet.
  return kinks({ type: 'MultiPolygon', coordinates: [a, b] }).features.some((f) => !atCorner(f.geometry.coordinates as Position))
}

function checkPolygon(rings: unknown, label: string): { rings?: Position[][], error?: string } {
  if (!Array.isArray(rings) || rings.length === 0) return { error: `${label} has no rings` }
  const out: Position[][] = []
  for (let r = 0; r < rings.length; r++) {
    const res = checkRing(rings[r], r === 0 ? `${label}, outer ring` : `${label}, hole ${r}`)
    if (res.error) return { error: res.error }
    out.push(res.ring!)
  }
  const crossings = kinks({ type: 'Polygon', coordinates: out }).features
  if (crossings.length) {
    const [lon, lat] = crossings[0]!.geometry.coordinates
    return { error: `${label} crosses itself near ${lat!.toFixed(6)}, ${lon!.toFixed(6)} (latitude, longitude); redraw it so its edges do not cross` }
  }
  // A hole outside the outline, or inside another hole, would take area the field does not have.
  for (let h = 1; h < out.length; h++) {
    if (!ringInside(out[h]!, out[0]!)) return { error: `${label}, hole ${h} lies outside the outer ring` }
    for (let g = 1; g < h; g++) {
      if (ringInside(out[h]!, out[g]!) || ringInside(out[g]!, out[h]!)) return { error: `${label}, holes ${g} and ${h} lie one inside the other` }
    }
  }
  return { rings: out }
}

// Validates a GeoJSON outline (WGS 84 lon/lat) and measures it: geodesic area by @turf/area,
// acres = m² ÷ 4,046.8564224.
export function checkBoundary(input: unknown): BoundaryResult {
  const { geometry, error } = geometryOf(input)
  if (error) return fail(error)
  if (geometry!.type !== 'Polygon' && geometry!.type !== 'MultiPolygon') return fail('A field outline is a Polygon or MultiPolygon')
  const coords = geometry!.coordinates
  if (!Array.isArray(coords)) return fail('The geometry has no coordinates')
  const count = coords.flat(geometry!.type === 'Polygon' ? 1 : 2).length
  if (count > BOUNDARY_MAX_POSITIONS) return fail(`The outline has ${count} positions; simplify it to at most ${BOUNDARY_MAX_POSITIONS}`)
  let normal: BoundaryGeometry
  if (geometry!.type === 'Polygon') {
    const res = checkPolygon(coords, 'The polygon')
    if (res.error) return fail(res.error)
    normal = { type: 'Polygon', coordinates: res.rings! }
  } else {
    if (coords.length === 0) return fail('The MultiPolygon has no polygons')
    const polys: Position[][][] = []
    for (let i = 0; i < coords.length; i++) {
      const res = checkPolygon(coords[i], `Polygon ${i + 1}`)
      if (res.error) return fail(res.error)
      // Parts that overlap would count the shared ground twice; an island in another part's hole is fine.
      const j = polys.findIndex((q) => partsOverlap(res.rings!, q))
      if (j >= 0) return fail(`Polygons ${j + 1} and ${i + 1} overlap; draw each piece of ground once`)
      polys.push(res.rings!)
    }
    normal = { type: 'MultiPolygon', coordinates: polys }
  }
  const areaM2 = area(normal)
  if (!(areaM2 > 0)) return fail('The outline encloses no area')
  return { ok: true, geometry: normal, areaM2, acres: new Decimal(areaM2).div(M2_PER_ACRE).toDecimalPlaces(4).toNumber(), positions: count }
}

// SVG path of an outline in a width × height box: equirectangular projection with longitude
// scaled by cos(mid-latitude) so a square field looks square; north is up.
export function boundaryOutlinePath(geometry: BoundaryGeometry | null | undefined, widthPx = 48, heightPx = 48, padPx = 2): string {
  if (!geometry || !Array.isArray(geometry.coordinates)) return ''
  const polys = geometry.type === 'Polygon' ? [geometry.coordinates] : geometry.coordinates
  const all = polys.flat(2)
  if (!all.length) return ''
  const lats = all.map((p) => p[1])
  const lons = all.map((p) => p[0])
  const minLat = Math.min(...lats)
  const maxLat = Math.max(...lats)
  const k = Math.cos(((minLat + maxLat) / 2) * Math.PI / 180)
  const minX = Math.min(...lons) * k
  const maxX = Math.max(...lons) * k
  const spanX = maxX - minX || 1e-12
  const spanY = maxLat - minLat || 1e-12
  const scale = Math.min((widthPx - 2 * padPx) / spanX, (heightPx - 2 * padPx) / spanY)
  const offX = (widthPx - spanX * scale) / 2
  const offY = (heightPx - spanY * scale) / 2
  const pt = (p: Position) => `${(offX + (p[0] * k - minX) * scale).toFixed(1)},${(offY + (maxLat - p[1]) * scale).toFixed(1)}`
  return polys.map((rings) => rings.map((ring) => `M${ring.slice(0, -1).map(pt).join('L')}Z`).join('')).join('')
}
