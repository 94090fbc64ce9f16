// Runs vitest with a JSON reporter and sums the results into one closing line.
import { spawnSync } from 'node:child_process'
import { readFileSync, mkdirSync } from 'node:fs'
import { resolve } from 'node:path'
import { root } from './deps.mjs'

function run(cmd, args, env = {}) {
  const r = spawnSync(cmd, args, { cwd: root, stdio: 'inherit', env: { ...process.env, ...env } })
  return r.status ?? 1
}

export async function runSuites() {
  mkdirSync(resolve(root, 'test-results'), { recursive: true })
  let failed = 0
  let passed = 0
  let skipped = 0
  const out = resolve(root, 'test-results', 'vitest.json')
  const code = run('npx', ['vitest', 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${out}`])
  try {
    const report = JSON.parse(readFileSync(out, 'utf8'))
    passed += report.numPassedTests
    failed += report.numFailedTests
    skipped += report.numPendingTests + (report.numTodoTests ?? 0)
  } catch {
    failed += 1
  }
  if (code !== 0 && failed === 0) failed = 1
  console.log(`tests: ${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`)
  return failed > 0 ? 1 : 0
}
