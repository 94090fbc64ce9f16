// An independent check of the arithmetic in shared/utils: edge cases that once broke, and properties
// that tie the formulas to each other. Published check values live beside each module's own tests.
import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { computeMeter, impliedSlipPercent, rowLengthForFraction, seedingRateForStand, seedsPerAcreFromFoot, seedsPerFootFromRate, SQ_IN_PER_ACRE } from '../../shared/utils/meter'
import { rateChart, solveDrive, type SolverInput, type SolverStage } from '../../shared/utils/solver'
import { parseSpacingCsv, seedCheckRate, spacingHistogram, spacingQuality, standCountSummary } from '../../shared/utils/field-checks'
import { seedDropSummary } from '../../shared/utils/seed-drop'
import { cornYieldPercent, plantingDayOfYear, replantDecision } from '../../shared/utils/replant'
import { computeCapacity, hopperCoverage, seedNeeds } from '../../shared/utils/planning'
import { fitCatchTest } from '../../shared/utils/application'
import { checkBoundary } from '../../shared/utils/boundary'
import { computeSetupResults } from '../../shared/utils/setup-results'
import type { SetupConfig } from '../../shared/types/setup'

const teeth = fc.integer({ min: 8, max: 60 })
const meterInput = fc.record({
  wheelCircumferenceIn: fc.double({ min: 20, max: 200, noNaN: true }),
  slipPercent: fc.double({ min: 0, max: 50, noNaN: true }),
  stages: fc.array(fc.record({ driverTeeth: teeth, drivenTeeth: teeth }), { minLength: 1, maxLength: 6 }),
  meterRatio: fc.double({ min: 0.1, max: 5, noNaN: true }),
  cellsPerPlate: fc.integer({ min: 1, max: 120 }),
  rowSpacingIn: fc.double({ min: 5, max: 60, noNaN: true }),
})

describe('meter edge cases', () => {
  it('refuses 100 % slip instead of answering an infinite spacing', () => {
    const base = { wheelCircumferenceIn: 60, stages: [{ driverTeeth: 20, drivenTeeth: 20 }], meterRatio: 1, cellsPerPlate: 10, rowSpacingIn: 30, speedMph: 5 }
    expect(() => computeMeter({ ...base, slipPercent: 100 })).toThrow(/below 100 %/)
    expect(() => computeMeter({ ...base, slipPercent: Number.NaN })).toThrow(/below 100 %/)
    expect(() => solveDrive({ rowSpacingIn: 30, wheelCircumferenceIn: 60, slipPercent: 100, meterRatio: 1, stages: [], plates: [{ id: 1, code: 'P', cellsPerPlate: 10 }], installedPlateId: 1, targetSeedsPerAcre: 30_000 })).toThrow(/below 100 %/)
    // 99 % still computes: a 60 in wheel with 10 seeds a turn spreads them 600 in apart (computed).
    expect(computeMeter({ ...base, slipPercent: 99 }).seedSpacingIn).toBeCloseTo(600, 9)
  })
})

describe('meter properties', () => {
  it('slip scales the population by (1 − slip ÷ 100), and the implied slip reads it back', () => {
    fc.assert(fc.property(meterInput, (i) => {
      const none = computeMeter({ ...i, slipPercent: 0 }).seedsPerAcre
      const some = computeMeter(i).seedsPerAcre
      expect(some / none).toBeCloseTo(1 - i.slipPercent / 100, 12)
      expect(impliedSlipPercent({ expectedSeedsPerAcre: none, countedSeedsPerAcre: some })).toBeCloseTo(i.slipPercent, 9)
    }))
  })

  it('seeds per foot from the meter agrees with Agron 212\'s seeds per foot from the rate, both ways', () => {
    fc.assert(fc.property(meterInput, (i) => {
      const m = computeMeter(i)
      expect(seedsPerFootFromRate({ seedsPerAcre: m.seedsPerAcre, rowSpacingIn: i.rowSpacingIn }) / m.seedsPerFoot).toBeCloseTo(1, 12)
      expect(seedsPerAcreFromFoot({ seedsPerFoot: m.seedsPerFoot, rowSpacingIn: i.rowSpacingIn }) / m.seedsPerAcre).toBeCloseTo(1, 12)
    }))
  })

  it('a count over the 1/1000-acre length reads count × 1,000 seeds per acre at any row spacing', () => {
    fc.assert(fc.property(fc.double({ min: 5, max: 80, noNaN: true }), fc.integer({ min: 0, max: 200 }), (rowSpacingIn, seedsCounted) => {
      const r = rowLengthForFraction({ rowSpacingIn })
      expect(seedCheckRate({ seedsCounted, lengthFt: r.lengthFt, rowSpacingIn }).seedsPerAcre).toBeCloseTo(seedsCounted * 1000, 6)
      // Feet and inches are the length to the nearest inch.
      expect(Math.abs(r.feet * 12 + r.inches - r.lengthFt * 12)).toBeLessThanOrEqual(0.5 + 1e-9)
      expect(r.inches >= 0 && r.inches < 12).toBe(true)
    }))
  })

  it('seeding rate × germination × survival gives back the stand', () => {
    fc.assert(fc.property(fc.integer({ min: 1000, max: 300_000 }), fc.double({ min: 1, max: 100, noNaN: true }), fc.double({ min: 1, max: 100, noNaN: true }), (targetStand, germinationPercent, survivalPercent) => {
      const { seedsPerAcre } = seedingRateForStand({ targetStand, germinationPercent, survivalPercent })
      expect(seedsPerAcre * (germinationPercent / 100) * (survivalPercent / 100) / targetStand).toBeCloseTo(1, 12)
      expect(seedsPerAcre).toBeGreaterThanOrEqual(targetStand * (1 - 1e-12))
    }))
  })
})

// Every combination one by one, with the parts it changes from what is installed.
function everyChoice(input: SolverInput) {
  const out: { errorPercent: number, parts: number }[] = []
  const options = input.stages.map((s) => [...new Set([s.driverTeeth, ...s.driverOptions])].flatMap((d) => [...new Set([s.drivenTeeth, ...s.drivenOptions])].map((n) => ({ d, n, parts: (d !== s.driverTeeth ? 1 : 0) + (n !== s.drivenTeeth ? 1 : 0) }))))
  const walk = (i: number, picked: { d: number, n: number, parts: number }[]) => {
    if (i === options.length) {
      for (const p of input.plates) {
        const m = computeMeter({ wheelCircumferenceIn: input.wheelCircumferenceIn, slipPercent: input.slipPercent, stages: picked.map((x) => ({ driverTeeth: x.d, drivenTeeth: x.n })), meterRatio: input.meterRatio, cellsPerPlate: p.cellsPerPlate, rowSpacingIn: input.rowSpacingIn })
        out.push({ errorPercent: Math.abs(m.seedsPerAcre / input.targetSeedsPerAcre! - 1) * 100, parts: picked.reduce((a, x) => a + x.parts, p.id === input.installedPlateId ? 0 : 1) })
      }
      return
    }
    for (const o of options[i]!) walk(i + 1, [...picked, o])
  }
  walk(0, [])
  return out
}

describe('solver against every combination (small exhaustive cases)', () => {
  const stage = (position: number) => fc.record({
    position: fc.constant(position), driverTeeth: fc.integer({ min: 10, max: 30 }), drivenTeeth: fc.integer({ min: 10, max: 30 }),
    driverOptions: fc.array(fc.integer({ min: 10, max: 30 }), { maxLength: 3 }), drivenOptions: fc.array(fc.integer({ min: 10, max: 30 }), { maxLength: 3 }),
  }) as fc.Arbitrary<SolverStage>
  const arb = fc.record({
    cells: fc.array(fc.integer({ min: 8, max: 40 }), { minLength: 1, maxLength: 3 }),
    stages: fc.integer({ min: 0, max: 3 }).chain((n) => fc.tuple(...Array.from({ length: n }, (_, i) => stage(i + 1)))),
    target: fc.integer({ min: 10_000, max: 200_000 }),
    slipPercent: fc.double({ min: 0, max: 50, noNaN: true }),
    limit: fc.integer({ min: 1, max: 12 }),
  })

  it('the best choice is never worse than any single one it could pick, and among the equally good it changes the fewest parts', () => {
    fc.assert(fc.property(arb, (a) => {
      const input: SolverInput = {
        rowSpacingIn: 30, wheelCircumferenceIn: 86.4, slipPercent: a.slipPercent, meterRatio: 1, installedPlateId: 1,
        stages: a.stages, plates: a.cells.map((c, i) => ({ id: i + 1, code: `P${i + 1}`, cellsPerPlate: c })), targetSeedsPerAcre: a.target, limit: a.limit,
      }
      const all = everyChoice(input)
      const out = solveDrive(input)
      const best = Math.min(...all.map((c) => c.errorPercent))
      const fewest = Math.min(...all.filter((c) => c.errorPercent <= best + 1e-9).map((c) => c.parts))
      expect(Math.abs(out[0]!.errorPercent)).toBeLessThanOrEqual(best + 1e-9)
      expect(out[0]!.partsToChange).toBe(fewest)
      expect(out.length).toBeLessThanOrEqual(a.limit)
      for (const c of out) {
        for (const v of [c.seedsPerAcre, c.seedSpacingIn, c.errorPercent]) expect(Number.isFinite(v)).toBe(true)
        // Each choice reads the same through the meter formula, and its swaps are its parts to change.
        const m = computeMeter({ wheelCircumferenceIn: 86.4, slipPercent: a.slipPercent, stages: c.stages, meterRatio: 1, cellsPerPlate: c.cellsPerPlate, rowSpacingIn: 30 })
        expect(m.seedsPerAcre / c.seedsPerAcre).toBeCloseTo(1, 12)
        expect(c.errorPercent).toBeCloseTo((m.seedsPerAcre / a.target - 1) * 100, 9)
        expect(c.swaps.length).toBe(c.partsToChange)
      }
      // Ranked by the size of the error.
      for (let k = 1; k < out.length; k++) expect(Math.abs(out[k - 1]!.errorPercent)).toBeLessThanOrEqual(Math.abs(out[k]!.errorPercent) + 1e-9)
    }), { numRuns: 150 })
  })
})

describe('spacing uniformity and its histogram (Kachman & Smith 1995; ISO 7256-1)', () => {
  it('a spacing a hair above 0.5 × a computed theoretical spacing is a single in both the indices and the bins', () => {
    // 6,272,640 ÷ (34,848 × 30) in floating point is 6 or a hair off it; here theoretical is a hair under 6.
    const theoreticalIn = 5.9999999999
    const q = spacingQuality({ spacingsIn: [3], theoreticalIn })
    expect(q.multiplesIndex).toBe(0)
    const bins = spacingHistogram({ spacingsIn: [3], theoreticalIn })
    expect(bins.slice(0, 5).reduce((s, b) => s + b.count, 0)).toBe(0)
    expect(bins[5]!.count).toBe(1)
    // And a hair above 1.5 × theoretical is a miss in both.
    const over = spacingHistogram({ spacingsIn: [9], theoreticalIn })
    expect(spacingQuality({ spacingsIn: [9], theoreticalIn }).missIndex).toBe(100)
    expect(over.slice(15).reduce((s, b) => s + b.count, 0)).toBe(1)
  })

  it('the bins up to 0.5 hold exactly the multiples and those above 1.5 exactly the misses, even on the class limits (property)', () => {
    const ref = fc.double({ min: 0.5, max: 20, noNaN: true })
    const nearLimit = fc.tuple(fc.constantFrom(0.5, 1.5, 1), fc.double({ min: -1e-8, max: 1e-8, noNaN: true }))
    fc.assert(fc.property(ref, fc.array(fc.oneof(nearLimit.map(([r, e]) => ({ r, e })), fc.double({ min: 0.01, max: 4, noNaN: true }).map((r) => ({ r, e: 0 }))), { minLength: 1, maxLength: 40 }), (theoreticalIn, picks) => {
      const spacingsIn = picks.map((p) => Math.max(1e-6, p.r * theoreticalIn * (1 + p.e)))
      const q = spacingQuality({ spacingsIn, theoreticalIn })
      const bins = spacingHistogram({ spacingsIn, theoreticalIn })
      const n = spacingsIn.length
      expect(bins.reduce((s, b) => s + b.count, 0)).toBe(n)
      expect(bins.slice(0, 5).reduce((s, b) => s + b.count, 0) / n * 100).toBeCloseTo(q.multiplesIndex, 9)
      expect(bins.slice(15).reduce((s, b) => s + b.count, 0) / n * 100).toBeCloseTo(q.missIndex, 9)
      expect(bins.reduce((s, b) => s + b.percent, 0)).toBeCloseTo(100, 9)
    }))
  })

  it('precision and the spread never go negative and never leak NaN (property)', () => {
    fc.assert(fc.property(fc.array(fc.double({ min: 0.01, max: 40, noNaN: true }), { minLength: 1, maxLength: 100 }), fc.double({ min: 0.5, max: 20, noNaN: true }), (spacingsIn, theoreticalIn) => {
      const q = spacingQuality({ spacingsIn, theoreticalIn })
      for (const v of [q.meanIn, q.sdIn, q.multiplesIndex, q.missIndex, q.qualityOfFeedIndex]) expect(Number.isFinite(v)).toBe(true)
      expect(q.sdIn).toBeGreaterThanOrEqual(0)
      if (q.precision !== null) expect(q.precision >= 0 && Number.isFinite(q.precision)).toBe(true)
    }))
  })

  it('a stand count summary keeps its mean within its range, with a CV of 0 or more (property)', () => {
    fc.assert(fc.property(fc.array(fc.integer({ min: 0, max: 100 }), { minLength: 1, maxLength: 30 }), fc.double({ min: 5, max: 60, noNaN: true }), (counts, rowSpacingIn) => {
      const s = standCountSummary({ counts, lengthFt: rowLengthForFraction({ rowSpacingIn }).lengthFt, rowSpacingIn })
      expect(s.meanPerAcre).toBeGreaterThanOrEqual(s.minPerAcre * (1 - 1e-12))
      expect(s.meanPerAcre).toBeLessThanOrEqual(s.maxPerAcre * (1 + 1e-12))
      expect(s.cvPercent).toBeGreaterThanOrEqual(0)
      expect(Number.isFinite(s.cvPercent)).toBe(true)
    }))
  })
})

describe('seed-drop edge cases', () => {
  const base = { rowSpacingIn: 30, wheelCircumferenceIn: 86.4, setupSeedsPerAcre: 34_000, setupSlipPercent: 0, targetSeedsPerAcre: 34_000, planterSlipPercent: 0, lengthFt: 17.424 }

  it('refuses a check with no rows with a clear message, not a decimal.js error', () => {
    expect(() => seedDropSummary({ ...base, rows: [] })).toThrow(/^Count at least one row$/)
  })

  it('a setup that computes no seed (no drive sections) gives no error %, no slip and asks the solver nothing', () => {
    const s = seedDropSummary({ ...base, setupSeedsPerAcre: 0, rows: [{ row: 1, seedsCounted: 30 }] })
    expect(s).toMatchObject({ errorVsSetupPercent: 0, impliedSlipPercent: null, slipStorable: false, solverTargetSeedsPerAcre: 0 })
    expect(s.seedsPerAcre).toBeCloseTo(30_000, 8)
  })
})

describe('PM 1885 interpolation (Iowa State University, "Corn Planting Guide")', () => {
  const stand = fc.integer({ min: 12_000, max: 32_000 })
  // Apr 20 to Jun 26: the table's first and last date rows.
  const day = fc.integer({ min: 110, max: 177 })
  const dateOf = (d: number) => {
    const t = new Date(Date.UTC(2026, 0, d))
    return t.toISOString().slice(0, 10)
  }

  it('never rises with a thinner stand or a later date, and stays between the table\'s 35 and 100 (property)', () => {
    fc.assert(fc.property(stand, stand, day, day, (s1, s2, d1, d2) => {
      const [lo, hi] = s1 <= s2 ? [s1, s2] : [s2, s1]
      const [early, late] = d1 <= d2 ? [d1, d2] : [d2, d1]
      const at = (standPerAcre: number, d: number) => cornYieldPercent({ standPerAcre, plantingDate: dateOf(d) })
      expect(at(lo, early).yieldPercent).toBeLessThanOrEqual(at(hi, early).yieldPercent + 1e-12)
      expect(at(hi, late).yieldPercent).toBeLessThanOrEqual(at(hi, early).yieldPercent + 1e-12)
      const y = at(lo, late)
      expect(y.extrapolated).toBe(false)
      expect(y.yieldPercent >= 35 && y.yieldPercent <= 100).toBe(true)
    }))
  })

  it('between two stands of the table at one date row the value lies on the straight line (property)', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 1, noNaN: true }), (t) => {
      // May 16 row: 24,000 → 93, 28,000 → 99 (PM 1885).
      expect(cornYieldPercent({ standPerAcre: 24_000 + 4_000 * t, plantingDate: '2026-05-16' }).yieldPercent).toBeCloseTo(93 + 6 * t, 9)
    }))
  })

  it('accepts Feb 29 only in a leap year or without a year', () => {
    expect(() => plantingDayOfYear('2026-02-29')).toThrow(/not a date/)
    expect(() => plantingDayOfYear('2100-02-29')).toThrow(/not a date/)
    expect(plantingDayOfYear('2028-02-29')).toBe(59)
    expect(plantingDayOfYear('2000-02-29')).toBe(59)
    expect(plantingDayOfYear('02-29')).toBe(59)
  })
})

describe('planning properties', () => {
  it('capacity: acres per hour × 8.25 = mph × width ft × efficiency, and 8.25 = 43,560 ÷ 5,280 (ISU PM 696; computed)', () => {
    expect(43_560 / 5_280).toBe(8.25)
    fc.assert(fc.property(fc.integer({ min: 1, max: 96 }), fc.double({ min: 5, max: 60, noNaN: true }), fc.double({ min: 0.5, max: 15, noNaN: true }), fc.double({ min: 1, max: 100, noNaN: true }), (rows, rowSpacingIn, speedMph, efficiencyPercent) => {
      const c = computeCapacity({ rows, rowSpacingIn, speedMph, efficiencyPercent })
      expect(c.widthFt).toBeCloseTo(rows * rowSpacingIn / 12, 9)
      expect(c.acresPerHour * 8.25 / (speedMph * c.widthFt * efficiencyPercent / 100)).toBeCloseTo(1, 12)
    }))
  })

  it('a row hopper\'s distance × row width is the row-acres it covers, and rows × that the planter\'s (property)', () => {
    fc.assert(fc.property(fc.double({ min: 1, max: 100, noNaN: true }), fc.integer({ min: 1000, max: 5000 }), fc.integer({ min: 10_000, max: 200_000 }), fc.double({ min: 5, max: 60, noNaN: true }), fc.integer({ min: 1, max: 48 }), (hopperLb, seedsPerLb, seedsPerAcre, rowSpacingIn, rows) => {
      const h = hopperCoverage({ hopperLb, seedsPerLb, seedsPerAcre, rowSpacingIn, rows })
      expect(h.distanceFt * (rowSpacingIn / 12) / 43_560 / h.rowAcresPerFill).toBeCloseTo(1, 12)
      expect(h.rowAcresPerFill * seedsPerAcre / (hopperLb * seedsPerLb)).toBeCloseTo(1, 12)
      expect(h.planterAcresPerFill! / (h.rowAcresPerFill * rows)).toBeCloseTo(1, 12)
    }))
  })

  it('seed units are the fewest whole units that hold the seed (property)', () => {
    fc.assert(fc.property(fc.integer({ min: 1000, max: 300_000 }), fc.double({ min: 0.1, max: 5000, noNaN: true }), fc.double({ min: 0, max: 20, noNaN: true }), fc.integer({ min: 1000, max: 200_000 }), (seedsPerAcre, acres, marginPercent, unitSeeds) => {
      const n = seedNeeds({ seedsPerAcre, acres, marginPercent, unitSeeds })
      expect(n.seeds / (seedsPerAcre * acres * (1 + marginPercent / 100))).toBeCloseTo(1, 12)
      expect(n.units! * unitSeeds).toBeGreaterThanOrEqual(n.seeds * (1 - 1e-12))
      expect((n.units! - 1) * unitSeeds).toBeLessThan(n.seeds)
    }))
  })

  it('a catch test on points that lie on a line gives that line back with r² = 1 (property)', () => {
    fc.assert(fc.property(fc.uniqueArray(fc.integer({ min: 0, max: 100 }), { minLength: 2, maxLength: 8 }), fc.double({ min: 0.1, max: 2, noNaN: true }), fc.double({ min: 0, max: 5, noNaN: true }), (settings, slopeOz, interceptOz) => {
      // 1/128 acre at 19 in: lb/acre = oz × 8 (University of Georgia Extension, Sumner).
      const courseFt = 43_560 / 128 / (19 / 12)
      const fit = fitCatchTest({ points: settings.map((s) => ({ setting: s, weightOz: interceptOz + slopeOz * s + 0.01 })), courseFt, rowSpacingIn: 19, targetLbPerAcre: 100 })
      expect(fit.slope).toBeCloseTo(slopeOz * 8, 8)
      expect(fit.intercept).toBeCloseTo((interceptOz + 0.01) * 8, 7)
      expect(fit.r2).toBeCloseTo(1, 9)
      expect(fit.rateAtSettings.every((r) => !r.offLine)).toBe(true)
    }))
  })
})

describe('the square inches in an acre', () => {
  it('6,272,640 = 43,560 ft² × 144 in² per ft² (L. H. Bailey, Farm and Garden Rule-Book; computed)', () => {
    expect(43_560 * 144).toBe(SQ_IN_PER_ACRE)
  })
})

describe('field outlines that would miscount acres', () => {
  const ring = (d: number, lon = 0, lat = 0) => [[lon, lat], [lon + d, lat], [lon + d, lat + d], [lon, lat + d], [lon, lat]]
  const message = (g: unknown) => {
    const r = checkBoundary(g)
    return r.ok ? `ok ${r.acres}` : r.message
  }

  it('rejects a hole outside the outer ring, which left the field at 0 acres', () => {
    expect(message({ type: 'Polygon', coordinates: [ring(0.01), ring(0.01, 0.02, 0.02)] })).toMatch(/hole 1 lies outside the outer ring/)
  })

  it('rejects a hole inside another hole, which took its area twice', () => {
    expect(message({ type: 'Polygon', coordinates: [ring(0.03), ring(0.01, 0.01, 0.01), ring(0.004, 0.012, 0.012)] })).toMatch(/holes 1 and 2 lie one inside the other/)
  })

  it('rejects parts of a MultiPolygon that overlap or repeat, which counted the ground twice', () => {
    expect(message({ type: 'MultiPolygon', coordinates: [[ring(0.01)], [ring(0.01)]] })).toMatch(/Polygons 1 and 2 overlap/)
    expect(message({ type: 'MultiPolygon', coordinates: [[ring(0.01)], [ring(0.01, 0.005, 0.005)]] })).toMatch(/Polygons 1 and 2 overlap/)
    expect(message({ type: 'MultiPolygon', coordinates: [[ring(0.01)], [ring(0.002, 0.004, 0.004)]] })).toMatch(/Polygons 1 and 2 overlap/)
  })

  it('rejects parts that cross like a plus sign, where no corner of either lies inside the other', () => {
    const bar = (x0: number, y0: number, x1: number, y1: number) => [[x0, y0], [x1, y0], [x1, y1], [x0, y1], [x0, y0]]
    expect(message({ type: 'MultiPolygon', coordinates: [[bar(0, 0.01, 0.03, 0.02)], [bar(0.01, 0, 0.02, 0.03)]] })).toMatch(/Polygons 1 and 2 overlap/)
    // An island poking out of its lake crosses the lake's shore and shares the lake part's ground.
    expect(message({ type: 'MultiPolygon', coordinates: [[ring(0.03), ring(0.01, 0.01, 0.01)], [bar(0.012, 0.005, 0.018, 0.025)]] })).toMatch(/Polygons 1 and 2 overlap/)
    // Touching at one corner, or along part of an edge, is not an overlap.
    expect(message({ type: 'MultiPolygon', coordinates: [[ring(0.01)], [ring(0.01, 0.01, 0.01)]] })).toMatch(/^ok/)
    expect(message({ type: 'MultiPolygon', coordinates: [[bar(0, 0, 0.02, 0.01)], [bar(0.01, 0.01, 0.03, 0.02)]] })).toMatch(/^ok/)
  })

  it('keeps parts that only share an edge, and an island in another part\'s hole, with their areas added', () => {
    const side = checkBoundary({ type: 'MultiPolygon', coordinates: [[ring(0.01)], [ring(0.01, 0.01, 0)]] })
    const one = checkBoundary({ type: 'Polygon', coordinates: [ring(0.01)] })
    expect(side.ok && one.ok && side.areaM2 / one.areaM2).toBeCloseTo(2, 6)
    const island = checkBoundary({ type: 'MultiPolygon', coordinates: [[ring(0.03), ring(0.01, 0.01, 0.01)], [ring(0.006, 0.012, 0.012)]] })
    const lake = checkBoundary({ type: 'Polygon', coordinates: [ring(0.03), ring(0.01, 0.01, 0.01)] })
    const isle = checkBoundary({ type: 'Polygon', coordinates: [ring(0.006, 0.012, 0.012)] })
    expect(island.ok && lake.ok && isle.ok && island.areaM2).toBeCloseTo((lake.ok ? lake.areaM2 : 0) + (isle.ok ? isle.areaM2 : 0), 3)
  })
})

describe('rate chart', () => {
  it('every row reads the meter formula at each row spacing, and the population scales with 1 ÷ row spacing (property)', () => {
    fc.assert(fc.property(fc.array(fc.integer({ min: 10, max: 30 }), { maxLength: 4 }), fc.integer({ min: 8, max: 60 }), fc.double({ min: 0, max: 50, noNaN: true }), (options, cellsPerPlate, slipPercent) => {
      const stages: SolverStage[] = [{ position: 1, driverTeeth: 20, drivenTeeth: 20, driverOptions: options, drivenOptions: [] }]
      const chart = rateChart({ wheelCircumferenceIn: 86.4, slipPercent, meterRatio: 1, stages, cellsPerPlate, rowSpacingsIn: [30, 15] })
      expect(chart.rows.filter((r) => r.installed)).toHaveLength(1)
      for (const r of chart.rows) {
        const m = computeMeter({ wheelCircumferenceIn: 86.4, slipPercent, stages: r.stages, meterRatio: 1, cellsPerPlate, rowSpacingIn: 30 })
        expect(r.byRowSpacing[0]!.seedsPerAcre / m.seedsPerAcre).toBeCloseTo(1, 12)
        expect(r.byRowSpacing[1]!.seedsPerAcre / r.byRowSpacing[0]!.seedsPerAcre).toBeCloseTo(2, 12)
        expect(r.byRowSpacing[0]!.seedsPerAcre * r.seedSpacingIn * 30).toBeCloseTo(SQ_IN_PER_ACRE, 3)
      }
    }))
  })
})

describe('solver edge cases', () => {
  const input: SolverInput = {
    rowSpacingIn: 30, wheelCircumferenceIn: 86.4, slipPercent: 3, meterRatio: 1, installedPlateId: 1,
    stages: [{ position: 1, driverTeeth: 20, drivenTeeth: 20, driverOptions: [18, 22], drivenOptions: [] }],
    plates: [{ id: 1, code: 'P1', cellsPerPlate: 30 }],
  }

  it('refuses a missing or zero target instead of ranking NaN errors', () => {
    expect(() => solveDrive(input)).toThrow(/target population or spacing/)
    expect(() => solveDrive({ ...input, targetSeedsPerAcre: 0 })).toThrow(/target population or spacing/)
    expect(() => solveDrive({ ...input, targetSpacingIn: 0 })).toThrow(/target population or spacing/)
  })

  it('asked for no choices answers none instead of failing', () => {
    expect(solveDrive({ ...input, targetSeedsPerAcre: 30_000, limit: 0 })).toEqual([])
  })

  it('with no plates on hand answers none', () => {
    expect(solveDrive({ ...input, plates: [], installedPlateId: null, targetSeedsPerAcre: 30_000 })).toEqual([])
  })
})

describe('spacing CSV values that would poison the indices', () => {
  it('reports 1e400 (Infinity) and spacings above 1,000 in by line, the typed-spacing ceiling, instead of averaging them', () => {
    const r = parseSpacingCsv('6\n1e400\n5000\n1000\n')
    expect(r.values).toEqual([6, 1000])
    expect(r.errors).toEqual([
      { line: 2, message: 'A spacing must be at most 1,000 in' },
      { line: 3, message: 'A spacing must be at most 1,000 in' },
    ])
    expect(Number.isFinite(spacingQuality({ spacingsIn: r.values, theoreticalIn: 6 }).meanIn)).toBe(true)
  })
})

describe('replant advice wording', () => {
  // 16,000 kept from May 1 and 32,000 replanted May 29: 74 % against 90 % (PM 1885); 200 bu at $4.50 gives $144 (computed).
  const base = { currentStand: 16_000, currentPlantingDate: '2026-05-01', replantStand: 32_000, replantDate: '2026-05-29', expectedYieldBuPerAcre: 200, pricePerBu: 4.5 }

  it('calls a net under half a cent even instead of "$0.00 ahead"', () => {
    expect(replantDecision({ ...base, replantCostPerAcre: 143.996 }).advice).toMatch(/^Replanting and keeping the stand come out even\./)
    expect(replantDecision({ ...base, replantCostPerAcre: 144.004 }).advice).toMatch(/^Replanting and keeping the stand come out even\./)
    expect(replantDecision({ ...base, replantCostPerAcre: 143.99 }).advice).toMatch(/^Replanting comes out about \$0\.01 per acre ahead/)
    expect(replantDecision({ ...base, replantCostPerAcre: 144.01 }).advice).toMatch(/^Keeping the stand comes out about \$0\.01 per acre ahead/)
  })
})

describe('setup results with every row shut off', () => {
  it('says so instead of presenting the population as planted', () => {
    const rowUnits = [1, 2].map((position) => ({
      position, opener: 'double-disc', gaugeWheels: null, depthIn: 1.75, depthBand: null, downPressureLb: null, pressWheel: 'open-center', pressWheelWidthIn: null,
      covering: 'none', furrower: false, seedPlateId: null, granular: 'none', granularBandWidthIn: null, granularDialSetting: null, fertilizerSetting: null, planting: false,
    })) as SetupConfig['rowUnits']
    // 60 in wheel, 1:1, 10 cells → 6 in in 30 in rows → 34,848 seeds/acre (computed).
    const r = computeSetupResults({
      crop: 'corn', targetSeedsPerAcre: 34_848, rowSpacingIn: 30, speedMph: null, wheelCircumferenceIn: 60, slipPercent: 0, meterRatio: 1,
      sections: [{ sectionId: null, name: 'Main', rows: [1, 2], seedPlateId: null, plateCode: null, cellsPerPlate: 10, stages: [{ position: 1, driverTeeth: 20, drivenTeeth: 20 }] }], rowUnits,
    })
    expect(r.seedsPerAcre).toBeCloseTo(34_848, 6)
    expect(r.warnings).toEqual(['No row is set to plant; the population is what the drive sections would drop with their rows turned on.'])
  })
})
