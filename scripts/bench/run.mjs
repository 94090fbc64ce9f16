#!/usr/bin/env node
// npm run bench: every benchmark in turn; figures only, no pass/fail.
import { spawnSync } from 'node:child_process'
import { existsSync } from 'node:fs'
import { resolve } from 'node:path'
import { root } from '../lib/deps.mjs'
import { ensureBuild } from '../lib/build.mjs'
import { dbUp } from '../lib/pg.mjs'

dbUp()
ensureBuild()
console.log(`machine: ${(await import('node:os')).cpus().length} cores, ${Math.round((await import('node:os')).totalmem() / 2 ** 30)} GiB, Node ${process.version}`)
const benches = [
  ['jiti', 'scripts/bench/solver.ts'],
  ['jiti', 'scripts/bench/spacing.ts'],
  ['node', 'scripts/bench/http.mjs'],
  ['node', 'scripts/bench/setups-pages.mjs'],
  ['node', 'scripts/bench/bundle.mjs'],
]
for (const [runner, file] of benches) {
  if (!existsSync(resolve(root, file))) continue
  const cmd = runner === 'jiti' ? ['npx', ['jiti', file]] : [process.execPath, [file]]
  spawnSync(cmd[0], cmd[1], { cwd: root, stdio: 'inherit' })
}
