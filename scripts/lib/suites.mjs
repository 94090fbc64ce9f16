// Runs every suite and sums vitest and Playwright into one closing line.
import { spawnSync } from 'node:child_process'
import { existsSync, readFileSync, mkdirSync, rmSync } from 'node:fs'
import { resolve } from 'node:path'
import { root } from './deps.mjs'

function run(label, cmd, args, env = {}) {
  console.log(`\n[rowbench] ── ${label} ──`)
  const r = spawnSync(cmd, args, { cwd: root, stdio: 'inherit', env: { ...process.env, ...env } })
  return r.status ?? 1
}

function readJson(file) {
  try {
    return JSON.parse(readFileSync(file, 'utf8'))
  } catch {
    return null
  }
}

function countPlaywright(report) {
  const totals = { passed: 0, failed: 0, skipped: 0 }
  const walk = (suite) => {
    for (const spec of suite.specs ?? []) {
      for (const t of spec.tests ?? []) {
        if (t.status === 'skipped') totals.skipped++
        else if (t.status === 'expected' || t.status === 'flaky') totals.passed++
        else totals.failed++
      }
    }
    for (const s of suite.suites ?? []) walk(s)
  }
  for (const s of report?.suites ?? []) walk(s)
  return totals
}

export async function runSuites() {
  const results = resolve(root, 'test-results')
  rmSync(results, { recursive: true, force: true })
  mkdirSync(results, { recursive: true })
  const totals = { passed: 0, failed: 0, skipped: 0 }
  const checks = []

  checks.push(['typecheck', run('type-check', 'npx', ['nuxt', 'typecheck'])])
  checks.push(['lint', run('lint', 'npm', ['run', '--silent', 'lint'])])

  const vitestOut = resolve(results, 'vitest.json')
  const vitestCode = run('vitest', 'npx', ['vitest', 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${vitestOut}`])
  const v = readJson(vitestOut)
  if (v) {
    totals.passed += v.numPassedTests
    totals.failed += v.numFailedTests
    totals.skipped += v.numPendingTests + (v.numTodoTests ?? 0)
  }
  if (vitestCode !== 0 && (!v || v.numFailedTests === 0)) checks.push(['vitest', vitestCode])

  const pwCode = run('playwright', 'npx', ['playwright', 'test'])
  const pwReport = resolve(results, 'playwright.json')
  const p = existsSync(pwReport) ? countPlaywright(readJson(pwReport)) : null
  if (p) {
    totals.passed += p.passed
    totals.failed += p.failed
    totals.skipped += p.skipped
  }
  if (pwCode !== 0 && (!p || p.failed === 0)) checks.push(['playwright', pwCode])

  const broken = checks.filter(([, code]) => code !== 0).map(([name]) => name)
  if (broken.length) console.log(`[rowbench] failed steps: ${broken.join(', ')}`)
  // Each failed step that has no test count of its own counts as one failure.
  totals.failed += broken.length
  console.log(`tests: ${totals.passed} passed, ${totals.failed} failed${totals.skipped ? `, ${totals.skipped} skipped` : ''}`)
  return totals.failed > 0 ? 1 : 0
}
