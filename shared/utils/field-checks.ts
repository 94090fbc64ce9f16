import Decimal from 'decimal.js'

const SQ_FT_PER_ACRE = 43_560

// Seeds (or plants) per acre from a count over a known length of one row:
// count × 43,560 ÷ (length ft × row spacing ft). Over the 1/1000-acre length that is count × 1,000.
export function seedCheckRate(input: { seedsCounted: number, lengthFt: number, rowSpacingIn: number }): { seedsPerAcre: number } {
  const rowAreaFt2 = new Decimal(input.lengthFt).mul(new Decimal(input.rowSpacingIn).div(12))
  return { seedsPerAcre: new Decimal(input.seedsCounted).mul(SQ_FT_PER_ACRE).div(rowAreaFt2).toNumber() }
}

export interface StandCountSummary {
  plantsPerAcre: number[]
  meanPerAcre: number
  minPerAcre: number
  maxPerAcre: number
  // Sample standard deviation (n − 1) ÷ mean × 100; 0 for a single count.
  cvPercent: number
}

// Each count → per acre as seedCheckRate; mean, range and coefficient of variation across counts.
export function standCountSummary(input: { counts: number[], lengthFt: number, rowSpacingIn: number }): StandCountSummary {
  if (!input.counts.length) throw new RangeError('Give at least one stand count')
  const perAcre = input.counts.map((c) => new Decimal(seedCheckRate({ seedsCounted: c, lengthFt: input.lengthFt, rowSpacingIn: input.rowSpacingIn }).seedsPerAcre))
  const n = perAcre.length
  const mean = Decimal.sum(...perAcre).div(n)
  const sd = n > 1 ? Decimal.sum(...perAcre.map((v) => v.minus(mean).pow(2))).div(n - 1).sqrt() : new Decimal(0)
  return {
    plantsPerAcre: perAcre.map((v) => v.toNumber()),
    meanPerAcre: mean.toNumber(),
    minPerAcre: Decimal.min(...perAcre).toNumber(),
    maxPerAcre: Decimal.max(...perAcre).toNumber(),
    cvPercent: mean.isZero() ? 0 : sd.div(mean).mul(100).toNumber(),
  }
}

export interface SpacingQuality {
  count: number
  meanIn: number
  // Sample standard deviation (n − 1) of all spacings.
  sdIn: number
  multiplesIndex: number
  missIndex: number
  qualityOfFeedIndex: number
  // null with fewer than two singles, where a spread is not defined.
  precision: number | null
}

// Kachman & Smith (1995), Transactions of the ASAE 38(2), and ISO 7256-1: with xref the theoretical
// spacing, multiples are spacings ≤ 0.5 xref, misses > 1.5 xref, singles the rest; multiples index and
// miss index are their shares in percent, quality of feed index = 100 − multiples − misses, and
// precision = standard deviation of the singles ÷ xref × 100. Plain floating point in one pass
// (Welford's running variance): decimal.js is far too slow for 100,000 spacings, and doubles carry
// ample digits for a measured spacing.
export function spacingQuality(input: { spacingsIn: number[], theoreticalIn: number }): SpacingQuality {
  const xs = input.spacingsIn
  if (!xs.length) throw new RangeError('Give at least one spacing')
  const low = 0.5 * input.theoreticalIn
  const high = 1.5 * input.theoreticalIn
  const all = { n: 0, mean: 0, m2: 0 }
  const singles = { n: 0, mean: 0, m2: 0 }
  const add = (acc: typeof all, x: number) => {
    acc.n++
    const d = x - acc.mean
    acc.mean += d / acc.n
    acc.m2 += d * (x - acc.mean)
  }
  let multiples = 0
  let misses = 0
  for (const x of xs) {
    add(all, x)
    if (x <= low) multiples++
    else if (x > high) misses++
    else add(singles, x)
  }
  const n = xs.length
  const multiplesIndex = (multiples / n) * 100
  const missIndex = (misses / n) * 100
  return {
    count: n,
    meanIn: all.mean,
    sdIn: n > 1 ? Math.sqrt(all.m2 / (n - 1)) : 0,
    multiplesIndex,
    missIndex,
    qualityOfFeedIndex: 100 - multiplesIndex - missIndex,
    precision: singles.n > 1 ? (Math.sqrt(singles.m2 / (singles.n - 1)) / input.theoreticalIn) * 100 : null,
  }
}

export interface SpacingBin {
  // Spacing ÷ theoretical; the bin holds ratios above fromRatio up to and including toRatio
  // (toRatio null: the open last bin), so the bins up to 0.5 are exactly the multiples.
  fromRatio: number
  toRatio: number | null
  count: number
  percent: number
}

// Counts of spacing ÷ theoretical in bins binWidth wide from 0 to maxRatio, plus one open bin above.
// The 0.5 and 1.5 class limits are tested exactly as spacingQuality tests them, so bins and indices agree.
export function spacingHistogram(input: { spacingsIn: number[], theoreticalIn: number, binWidth?: number, maxRatio?: number }): SpacingBin[] {
  const width = input.binWidth ?? 0.1
  const closed = Math.round((input.maxRatio ?? 3) / width)
  const counts = new Array<number>(closed + 1).fill(0)
  const limits = [0.5, 1.5]
    .map((ratio) => ({ limitIn: ratio * input.theoreticalIn, bin: Math.round(ratio / width), exact: Math.abs(ratio / width - Math.round(ratio / width)) < 1e-9 }))
    .filter((l) => l.exact && l.bin > 0 && l.bin <= closed)
  for (const x of input.spacingsIn) {
    // The small allowance keeps 0.3 ÷ 0.1 = 2.9999999999999996 in the bin ending at 0.3.
    let i = Math.ceil(x / input.theoreticalIn / width - 1e-9) - 1
    for (const l of limits) i = x <= l.limitIn ? Math.min(i, l.bin - 1) : Math.max(i, l.bin)
    counts[Math.min(Math.max(i, 0), closed)]!++
  }
  const n = input.spacingsIn.length
  return counts.map((count, i) => ({
    fromRatio: new Decimal(width).mul(i).toNumber(),
    toRatio: i < closed ? new Decimal(width).mul(i + 1).toNumber() : null,
    count,
    percent: n ? (count / n) * 100 : 0,
  }))
}

// Corn yield falls about 2.5 bu/acre per inch of spacing standard deviation above 2 in (Nielsen 1991,
// as cited by University of Wisconsin Extension, "Corn Stand Uniformity in Wisconsin", 2000).
export function cornYieldLossFromSpacingSd(input: { spacingSdIn: number }): { buPerAcre: number } {
  return { buPerAcre: Decimal.max(0, new Decimal(input.spacingSdIn).minus(2)).mul('2.5').toNumber() }
}

export interface SpacingCsvResult { values: number[], errors: { line: number, message: string }[] }

// The same ceiling as a typed spacing; it also keeps out 1e400, which reads as Infinity.
export const SPACING_CSV_MAX_IN = 1000

const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/

const unquote = (cell: string) => {
  const c = cell.trim()
  return c.length > 1 && c[0] === '"' && c[c.length - 1] === '"' ? c.slice(1, -1).trim() : c
}
const cells = (line: string, sep: string) => line.split(sep).map(unquote)

// Spacings (in) from pasted text: one value per line, or the named column of a comma, semicolon or
// tab separated table whose first line is the header. Without a column a first line that is not a
// number is taken as a header. Blank lines are skipped; every other line that gives no spacing
// above 0 and up to SPACING_CSV_MAX_IN is reported with its line number (1-based).
export function parseSpacingCsv(text: string, column?: string): SpacingCsvResult {
  const lines = text.split(/\r?\n/)
  const out: SpacingCsvResult = { values: [], errors: [] }
  const firstIdx = lines.findIndex((l) => l.trim() !== '')
  if (firstIdx < 0) return out
  const first = lines[firstIdx]!
  const sep = first.includes('\t') ? '\t' : first.includes(';') && !first.includes(',') ? ';' : ','
  let col = 0
  let start = firstIdx
  if (column !== undefined) {
    col = cells(first, sep).findIndex((c) => c.toLowerCase() === column.trim().toLowerCase())
    if (col < 0) {
      out.errors.push({ line: firstIdx + 1, message: `No column named "${column}" in the header` })
      return out
    }
    start = firstIdx + 1
  }
  else if (!NUMBER.test(cells(first, sep)[0] ?? '')) start = firstIdx + 1
  for (let i = start; i < lines.length; i++) {
    const line = lines[i]!
    if (line === '' || line.trim() === '') continue
    const raw = column !== undefined ? cells(line, sep)[col] : unquote(line)
    if (raw === undefined || raw === '') out.errors.push({ line: i + 1, message: 'No value in this line' })
    else if (!NUMBER.test(raw)) out.errors.push({ line: i + 1, message: `"${raw.slice(0, 40)}" is not a number` })
    else if (!(Number(raw) > 0)) out.errors.push({ line: i + 1, message: 'A spacing must be more than 0' })
    else if (!(Number(raw) <= SPACING_CSV_MAX_IN)) out.errors.push({ line: i + 1, message: `A spacing must be at most ${SPACING_CSV_MAX_IN.toLocaleString('en-US')} in` })
    else out.values.push(Number(raw))
  }
  return out
}
