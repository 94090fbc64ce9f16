// Spacing uniformity indices and the histogram on 100,000 measured spacings. Run with
// `npx jiti scripts/bench/spacing.ts`. Prints figures only.
import { parseSpacingCsv, spacingHistogram, spacingQuality } from '../../shared/utils/field-checks'

// Invented spacings around 6 in: a repeatable pseudo-random spread with some doubles and skips.
let seed = 42
const next = () => (seed = (seed * 1_103_515_245 + 12_345) % 2 ** 31) / 2 ** 31
const spacingsIn = Array.from({ length: 100_000 }, () => {
  const r = next()
  return r < 0.03 ? 1 + next() * 2 : r > 0.96 ? 10 + next() * 4 : 6 + (next() - 0.5) * 2
})
const text = spacingsIn.map((x) => x.toFixed(2)).join('\n')

function median(fn: () => unknown, runs = 9) {
  fn()
  const times: number[] = []
  for (let i = 0; i < runs; i++) {
    const t = performance.now()
    fn()
    times.push(performance.now() - t)
  }
  return times.sort((a, b) => a - b)[runs >> 1]!
}

console.log('\nSpacing uniformity on 100,000 spacings (median of 9 runs after one warm-up)')
console.log(`spacingQuality    ${median(() => spacingQuality({ spacingsIn, theoreticalIn: 6 })).toFixed(1)} ms`)
console.log(`spacingHistogram  ${median(() => spacingHistogram({ spacingsIn, theoreticalIn: 6 })).toFixed(1)} ms`)
console.log(`parseSpacingCsv   ${median(() => parseSpacingCsv(text)).toFixed(1)} ms`)
const q = spacingQuality({ spacingsIn, theoreticalIn: 6 })
console.log(`multiples ${q.multiplesIndex.toFixed(2)} %, misses ${q.missIndex.toFixed(2)} %, quality of feed ${q.qualityOfFeedIndex.toFixed(2)} %, precision ${q.precision?.toFixed(2)} %`)
