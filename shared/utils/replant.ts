import Decimal from 'decimal.js'

// Corn yield in % of the maximum by stand and planting date, Iowa State University PM 1885, "Corn
// Planting Guide". Stands in plants per acre; 28,000–32,000 is one published column (the plateau),
// entered at both ends. Each date row sits at its window's middle day, except the first window
// (Apr 20–May 5), which is flat across its whole span.
const STANDS = [12_000, 16_000, 20_000, 24_000, 28_000, 32_000]
const ROWS: { day: number, yields: number[] }[] = [
  { day: 110, yields: [68, 74, 81, 94, 100, 100] }, // Apr 20
  { day: 125, yields: [68, 74, 81, 94, 100, 100] }, // May 5
  { day: 136, yields: [67, 73, 80, 93, 99, 99] }, // May 13–19, middle May 16
  { day: 149, yields: [61, 67, 73, 85, 90, 90] }, // May 26–Jun 1, middle May 29
  { day: 164, yields: [46, 50, 55, 64, 68, 68] }, // Jun 10–16, middle Jun 13
  { day: 177, yields: [35, 38, 42, 49, 52, 52] }, // Jun 24–28, middle Jun 26
]
// Jun 28, the table's last published day; after the last middle day the value is held.
const LAST_PUBLISHED_DAY = 179
const MONTH_START = [0, 31, 59, 90, 120, 151, 181, 212, 243, 273, 304, 334]
const MONTH_DAYS = [31, 29, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31]

// Day of the year (1–365, counted as in a year without Feb 29, which counts as Feb 28) from
// "YYYY-MM-DD" or "MM-DD", so a date sits at the same place in the table every year.
export function plantingDayOfYear(date: string): number {
  const m = /^(?:(\d{4})-)?(\d{1,2})-(\d{1,2})$/.exec(date.trim())
  const year = m?.[1] === undefined ? null : Number(m[1])
  const month = m ? Number(m[2]) : NaN
  const day = m ? Number(m[3]) : NaN
  // Feb 29 only in a leap year, or when no year is given.
  const leap = year === null || (year % 4 === 0 && (year % 100 !== 0 || year % 400 === 0))
  const monthDays = month === 2 && !leap ? 28 : MONTH_DAYS[month - 1]!
  if (!(month >= 1 && month <= 12 && day >= 1 && day <= monthDays)) throw new RangeError(`"${date}" is not a date (use YYYY-MM-DD)`)
  return MONTH_START[month - 1]! + Math.min(day, month === 2 ? 28 : 31)
}

// Where x falls between two of the sorted points: the lower index and the share of the way on.
function bracket(points: number[], x: number): { i: number, t: Decimal } {
  let i = 0
  while (i < points.length - 2 && x > points[i + 1]!) i++
  const lo = points[i]!
  const hi = points[i + 1]!
  return { i, t: new Decimal(x).minus(lo).div(hi - lo) }
}

const lerp = (a: number, b: number, t: Decimal) => new Decimal(a).plus(new Decimal(b).minus(a).mul(t))

// Bilinear interpolation in the PM 1885 table, by stand and by day of year. Outside the table the
// nearest edge is used and extrapolated is true.
export function cornYieldPercent(input: { standPerAcre: number, plantingDate: string }): { yieldPercent: number, extrapolated: boolean } {
  const day = plantingDayOfYear(input.plantingDate)
  const firstDay = ROWS[0]!.day
  const lastDay = ROWS[ROWS.length - 1]!.day
  const stand = Math.min(Math.max(input.standPerAcre, STANDS[0]!), STANDS[STANDS.length - 1]!)
  const d = Math.min(Math.max(day, firstDay), lastDay)
  const extrapolated = stand !== input.standPerAcre || day < firstDay || day > LAST_PUBLISHED_DAY
  const s = bracket(STANDS, stand)
  const r = bracket(ROWS.map((row) => row.day), d)
  const atStand = (row: { yields: number[] }) => lerp(row.yields[s.i]!, row.yields[s.i + 1]!, s.t)
  const low = atStand(ROWS[r.i]!)
  const high = atStand(ROWS[r.i + 1]!)
  return { yieldPercent: low.plus(high.minus(low).mul(r.t)).toNumber(), extrapolated }
}

export interface ReplantInput {
  currentStand: number
  currentPlantingDate: string
  replantStand: number
  replantDate: string
  // Yield at 100 % of the table: the field's expected yield with a full stand planted early.
  expectedYieldBuPerAcre: number
  pricePerBu: number
  replantCostPerAcre: number
}

export interface ReplantResult {
  currentYieldPercent: number
  replantYieldPercent: number
  currentBuPerAcre: number
  replantBuPerAcre: number
  // Replant minus keep.
  buDifferencePerAcre: number
  valueDifferencePerAcre: number
  // Value difference less the replant cost; above 0 favours replanting.
  netPerAcre: number
  extrapolated: boolean
  advice: string
}

// bu = expected yield × yield % ÷ 100 for each choice (PM 1885 table); $ = bu difference × price;
// net = $ difference − replant cost.
export function replantDecision(input: ReplantInput): ReplantResult {
  const keep = cornYieldPercent({ standPerAcre: input.currentStand, plantingDate: input.currentPlantingDate })
  const again = cornYieldPercent({ standPerAcre: input.replantStand, plantingDate: input.replantDate })
  const bu = (pct: number) => new Decimal(input.expectedYieldBuPerAcre).mul(pct).div(100)
  const buDiff = bu(again.yieldPercent).minus(bu(keep.yieldPercent))
  const valueDiff = buDiff.mul(input.pricePerBu)
  const net = valueDiff.minus(input.replantCostPerAcre)
  const extrapolated = keep.extrapolated || again.extrapolated
  return {
    currentYieldPercent: keep.yieldPercent,
    replantYieldPercent: again.yieldPercent,
    currentBuPerAcre: bu(keep.yieldPercent).toNumber(),
    replantBuPerAcre: bu(again.yieldPercent).toNumber(),
    buDifferencePerAcre: buDiff.toNumber(),
    valueDifferencePerAcre: valueDiff.toNumber(),
    netPerAcre: net.toNumber(),
    extrapolated,
    advice: replantAdvice(net, extrapolated),
  }
}

// The verdict follows the amount it shows: under half a cent either way is even, not "$0.00 ahead".
function replantAdvice(net: Decimal, extrapolated: boolean): string {
  const cents = net.toDecimalPlaces(2, Decimal.ROUND_HALF_UP)
  const dollars = `$${cents.abs().toFixed(2)}`
  const verdict = cents.gt(0)
    ? `Replanting comes out about ${dollars} per acre ahead of keeping the stand, after its cost.`
    : cents.lt(0)
      ? `Keeping the stand comes out about ${dollars} per acre ahead of replanting, after the replant cost.`
      : 'Replanting and keeping the stand come out even.'
  const edge = extrapolated ? ' A stand or date lies outside the table, so the nearest table value was used.' : ''
  return `${verdict}${edge} This is an aid built on average yield figures; it does not see gaps, plant health, weather or seed supply. The agronomist decides.`
}
