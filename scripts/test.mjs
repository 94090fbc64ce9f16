#!/usr/bin/env node
// npm test: installs what is missing (dependencies, Debian's chromium, PostgreSQL), builds once, then
// runs type-check, lint, vitest (unit, nuxt, API) and Playwright, ending with one summary line.
import { existsSync } from 'node:fs'
import { execSync } from 'node:child_process'
import { ensureDependencies } from './lib/deps.mjs'

ensureDependencies()

if (!existsSync(process.env.CHROMIUM_PATH || '/usr/bin/chromium')) {
  console.log('[rowbench] installing Debian chromium for the browser tests…')
  execSync('apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium', { stdio: 'inherit', shell: '/bin/bash' })
}

const { dbUp } = await import('./lib/pg.mjs')
const { ensureBuild } = await import('./lib/build.mjs')
const { runSuites } = await import('./lib/suites.mjs')

dbUp()
ensureBuild()
process.exit(await runSuites())
