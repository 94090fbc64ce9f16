import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { boundaryOutlinePath, checkBoundary, M2_PER_ACRE } from '../../shared/utils/boundary'

const square = (d = 0.01, lon = 0, lat = 0) => ({ type: 'Polygon', coordinates: [[[lon, lat], [lon + d, lat], [lon + d, lat + d], [lon, lat + d], [lon, lat]]] })

describe('field boundary area', () => {
  it('a 0.01° × 0.01° square at the equator is 1,236,434.58 m² (1.2364 km², 305.53 ac); figure checked against @turf/area 7.4 itself, not memory', () => {
    const r = checkBoundary(square())
    expect(r.ok).toBe(true)
    if (!r.ok) return
    expect(r.areaM2).toBeCloseTo(1_236_434.58, 1)
    expect(r.acres).toBeCloseTo(1_236_434.58 / 4046.8564224, 3)
    expect(r.acres).toBeCloseTo(305.53, 2)
  })

  // @turf/area 7 works on a sphere of the mean Earth radius 6,371,008.8 m (IUGG mean radius; value
  // from memory, confirmed by the match below), not the WGS 84 equatorial 6,378,137 m.
  it('the same square by hand: R² × Δλ × (sin φ2 − sin φ1) with R = 6,371,008.8 m gives 1,236,434.6 m² (spherical-zone formula, computed)', () => {
    const R = 6_371_008.8
    const rad = (0.01 * Math.PI) / 180
    const hand = R * R * rad * Math.sin(rad)
    const r = checkBoundary(square())
    expect(r.ok && r.areaM2).toBeCloseTo(hand, 0)
  })

  it('1 acre is 4,046.8564224 m² (NIST Handbook 44, Appendix C)', () => {
    expect(M2_PER_ACRE).toBe(4046.8564224)
  })

  it('a hole is subtracted and a Feature or one-feature collection is accepted', () => {
    const withHole = { type: 'Feature', properties: {}, geometry: { type: 'Polygon', coordinates: [square(0.01).coordinates[0], square(0.005, 0.0025, 0.0025).coordinates[0]] } }
    const r = checkBoundary(withHole)
    const whole = checkBoundary(square())
    expect(r.ok && whole.ok).toBe(true)
    if (!r.ok || !whole.ok) return
    expect(r.areaM2 / whole.areaM2).toBeCloseTo(0.75, 3)
    const fc1 = checkBoundary({ type: 'FeatureCollection', features: [withHole] })
    expect(fc1.ok && fc1.acres).toBe(r.acres)
  })

  it('a MultiPolygon adds its parts', () => {
    const r = checkBoundary({ type: 'MultiPolygon', coordinates: [square(0.01).coordinates, square(0.01, 1, 0).coordinates] })
    expect(r.ok && r.areaM2).toBeCloseTo(2 * 1_236_434.58, 0)
  })
})

describe('field boundary rejections', () => {
  const reject = (g: unknown) => {
    const r = checkBoundary(g)
    expect(r.ok).toBe(false)
    return r.ok ? '' : r.message
  }
  it('a bow-tie crosses itself and is rejected with where', () => {
    expect(reject({ type: 'Polygon', coordinates: [[[0, 0], [0.01, 0.01], [0.01, 0], [0, 0.01], [0, 0]]] })).toMatch(/crosses itself near 0\.005000, 0\.005000/)
  })
  it('an unclosed ring', () => {
    expect(reject({ type: 'Polygon', coordinates: [[[0, 0], [1, 0], [1, 1], [0, 1]]] })).toMatch(/not closed/)
  })
  it('fewer than 4 positions', () => {
    expect(reject({ type: 'Polygon', coordinates: [[[0, 0], [1, 0], [0, 0]]] })).toMatch(/has 3 positions; a closed ring needs at least 4/)
  })
  it('longitude and latitude out of range', () => {
    expect(reject(square(1, 179.5, 0))).toMatch(/longitude 180.5 is outside/)
    expect(reject(square(1, 0, 89.5))).toMatch(/latitude 90.5 is outside/)
  })
  it('a position that is not two numbers', () => {
    expect(reject({ type: 'Polygon', coordinates: [[[0, 0], [1, 'a'], [1, 1], [0, 0]]] })).toMatch(/position 2 is not \[longitude, latitude\]/)
  })
  it('a point, a line, a two-feature collection, junk', () => {
    expect(reject({ type: 'Point', coordinates: [0, 0] })).toMatch(/not a Point/)
    expect(reject({ type: 'FeatureCollection', features: [{}, {}] })).toMatch(/holds 2 features/)
    expect(reject(null)).toMatch(/Upload a GeoJSON/)
    expect(reject([1, 2])).toMatch(/Upload a GeoJSON/)
    expect(reject({ type: 'Feature', geometry: null })).toMatch(/no geometry/)
  })
  it('a ring whose corners collapse to a line encloses nothing', () => {
    expect(reject({ type: 'Polygon', coordinates: [[[0, 0], [1, 0], [0, 0], [1, 0], [0, 0]]] })).toMatch(/fewer than 3 distinct corners/)
  })
  it('a hole crossing the outer ring', () => {
    expect(reject({ type: 'Polygon', coordinates: [square(1).coordinates[0], square(0.2, 0.9, 0.4).coordinates[0]] })).toMatch(/crosses itself/)
  })
  it('never throws on any JSON (property)', () => {
    fc.assert(fc.property(fc.jsonValue(), (v) => { checkBoundary(v) }), { numRuns: 300 })
    fc.assert(fc.property(fc.array(fc.array(fc.tuple(fc.double(), fc.double()), { maxLength: 8 }), { maxLength: 3 }), (rings) => {
      checkBoundary({ type: 'Polygon', coordinates: rings })
    }), { numRuns: 300 })
  })
})

describe('outline picture', () => {
  it('a square field fills a square box with north up', () => {
    expect(boundaryOutlinePath(square(0.01) as never, 48, 48, 2)).toBe('M2.0,46.0L46.0,46.0L46.0,2.0L2.0,2.0Z')
  })
  it('a wide field is centred vertically and longitude shrinks by cos(latitude)', () => {
    // At 60° N a 0.02° × 0.01° box is square on the ground (cos 60° = 0.5).
    const d = boundaryOutlinePath({ type: 'Polygon', coordinates: [[[0, 60], [0.02, 60], [0.02, 60.01], [0, 60.01], [0, 60]]] }, 48, 48, 2)
    expect(d).toMatch(/^M2\.0,46\.\dL46\.0,46\.\d/)
  })
  it('holes become their own subpaths and empty input draws nothing', () => {
    const d = boundaryOutlinePath({ type: 'Polygon', coordinates: [square(1).coordinates[0] as never, square(0.5, 0.25, 0.25).coordinates[0] as never] })
    expect(d.match(/M/g)).toHaveLength(2)
    expect(boundaryOutlinePath(null)).toBe('')
  })
})
