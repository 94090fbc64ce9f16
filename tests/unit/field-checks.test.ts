import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { cornYieldLossFromSpacingSd, parseSpacingCsv, seedCheckRate, spacingHistogram, spacingQuality, standCountSummary } from '../../shared/utils/field-checks'
import { rowLengthForFraction } from '../../shared/utils/meter'

describe('seed and stand counts', () => {
  it('a count over the 1/1000-acre length × 1,000 is the rate per acre (the 1/1000-acre check; University of Tennessee Extension 2011)', () => {
    const lengthFt = rowLengthForFraction({ rowSpacingIn: 30 }).lengthFt
    expect(seedCheckRate({ seedsCounted: 34, lengthFt, rowSpacingIn: 30 }).seedsPerAcre).toBeCloseTo(34_000, 8)
  })

  it('summarises counts: 30, 32, 34 over 1/1000 acre → 32,000 mean, 30,000–34,000, CV 6.25 % (computed by hand)', () => {
    const s = standCountSummary({ counts: [30, 32, 34], lengthFt: 17.424, rowSpacingIn: 30 })
    expect(s.plantsPerAcre.map((v) => Math.round(v))).toEqual([30_000, 32_000, 34_000])
    expect(s.meanPerAcre).toBeCloseTo(32_000, 8)
    expect(s.minPerAcre).toBeCloseTo(30_000, 8)
    expect(s.maxPerAcre).toBeCloseTo(34_000, 8)
    // sample SD 2,000 ÷ 32,000
    expect(s.cvPercent).toBeCloseTo(6.25, 10)
  })
})

describe('spacing uniformity (Kachman & Smith 1995; ISO 7256-1)', () => {
  it('a small set computed by hand from the published definitions', () => {
    // xref 6 in: multiples ≤ 3 (2, 3), misses > 9 (12, 9.5), singles 5, 6, 7, 6, 6, 6 with SD √0.4.
    const q = spacingQuality({ spacingsIn: [5, 6, 7, 6, 6, 6, 2, 3, 12, 9.5], theoreticalIn: 6 })
    expect(q.count).toBe(10)
    expect(q.multiplesIndex).toBeCloseTo(20, 12)
    expect(q.missIndex).toBeCloseTo(20, 12)
    expect(q.qualityOfFeedIndex).toBeCloseTo(60, 12)
    expect(q.precision).toBeCloseTo((Math.sqrt(0.4) / 6) * 100, 10)
    expect(q.meanIn).toBeCloseTo(6.25, 12)
    const sd = Math.sqrt([5, 6, 7, 6, 6, 6, 2, 3, 12, 9.5].reduce((a, x) => a + (x - 6.25) ** 2, 0) / 9)
    expect(q.sdIn).toBeCloseTo(sd, 10)
  })

  it('1.5 × xref exactly is a single, 0.5 × xref exactly a multiple (published class limits)', () => {
    const q = spacingQuality({ spacingsIn: [9, 3], theoreticalIn: 6 })
    expect(q.missIndex).toBe(0)
    expect(q.multiplesIndex).toBe(50)
    expect(q.precision).toBeNull()
  })

  it('handles 100,000 spacings: a repeating pattern keeps its shares (computed)', () => {
    const xs = Array.from({ length: 100_000 }, (_, i) => [6, 6.5, 5.5, 2, 13][i % 5]!)
    const q = spacingQuality({ spacingsIn: xs, theoreticalIn: 6 })
    expect(q.multiplesIndex).toBeCloseTo(20, 9)
    expect(q.missIndex).toBeCloseTo(20, 9)
    expect(q.meanIn).toBeCloseTo(6.6, 9)
  })

  it('the indices sum to 100 and stay in 0–100 (property)', () => {
    fc.assert(fc.property(fc.array(fc.double({ min: 0.01, max: 40, noNaN: true }), { minLength: 1, maxLength: 200 }), fc.double({ min: 1, max: 12, noNaN: true }), (xs, ref) => {
      const q = spacingQuality({ spacingsIn: xs, theoreticalIn: ref })
      expect(q.multiplesIndex + q.missIndex + q.qualityOfFeedIndex).toBeCloseTo(100, 9)
      for (const v of [q.multiplesIndex, q.missIndex, q.qualityOfFeedIndex]) expect(v >= -1e-9 && v <= 100 + 1e-9).toBe(true)
    }))
  })

  it('histogram bins of spacing ÷ xref: 0.1 wide to 3.0 and one open bin; bins up to 0.5 hold the multiples', () => {
    const xs = [5, 6, 7, 6, 6, 6, 2, 3, 12, 9.5, 30]
    const h = spacingHistogram({ spacingsIn: xs, theoreticalIn: 6 })
    expect(h).toHaveLength(31)
    expect(h.reduce((a, b) => a + b.count, 0)).toBe(xs.length)
    expect(h.slice(0, 5).reduce((a, b) => a + b.count, 0)).toBe(2)
    // 6 ÷ 6 = 1.0 falls in (0.9, 1.0]; 30 ÷ 6 = 5 in the open bin.
    expect(h[9]).toMatchObject({ fromRatio: 0.9, toRatio: 1, count: 4 })
    expect(h[30]).toMatchObject({ fromRatio: 3, toRatio: null, count: 1 })
    // 0.3 lands in (0.2, 0.3] despite 0.3 ÷ 0.1 being 2.9999999999999996 in floating point.
    expect(spacingHistogram({ spacingsIn: [1.8], theoreticalIn: 6 })[2]!.count).toBe(1)
  })

  it('corn yield loss 2.5 bu/acre per inch of SD above 2 in (Nielsen 1991, as cited by University of Wisconsin Extension 2000): 4.5 in → 6.25 bu (computed)', () => {
    expect(cornYieldLossFromSpacingSd({ spacingSdIn: 4.5 }).buPerAcre).toBeCloseTo(6.25, 12)
    expect(cornYieldLossFromSpacingSd({ spacingSdIn: 1.5 }).buPerAcre).toBe(0)
  })
})

describe('spacing CSV reader', () => {
  it('reads one value per line, skips a header and blank lines, reports junk by line number', () => {
    const r = parseSpacingCsv('spacing\n6.1\n\n5.9\nabc\n-2\n0\n"6.4"\n1e1\n0x10\n')
    expect(r.values).toEqual([6.1, 5.9, 6.4, 10])
    expect(r.errors).toEqual([
      { line: 5, message: '"abc" is not a number' },
      { line: 6, message: 'A spacing must be more than 0' },
      { line: 7, message: 'A spacing must be more than 0' },
      { line: 10, message: '"0x10" is not a number' },
    ])
  })

  it('reads a named column, case-insensitive, and reports short lines', () => {
    const r = parseSpacingCsv('plot,Spacing_In\r\n1,6.2\r\n2\r\n3,n/a\r\n4,5.8', 'spacing_in')
    expect(r.values).toEqual([6.2, 5.8])
    expect(r.errors).toEqual([{ line: 3, message: 'No value in this line' }, { line: 4, message: '"n/a" is not a number' }])
  })

  it('reads tab-separated tables and reports a missing column once', () => {
    expect(parseSpacingCsv('a\tb\n1\t2', 'b').values).toEqual([2])
    expect(parseSpacingCsv('a,b\n1,2', 'c')).toEqual({ values: [], errors: [{ line: 1, message: 'No column named "c" in the header' }] })
    expect(parseSpacingCsv('')).toEqual({ values: [], errors: [] })
  })
})
