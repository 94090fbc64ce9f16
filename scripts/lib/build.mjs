// Builds the production server when .output is missing or older than any source file.
import { existsSync, readdirSync, statSync } from 'node:fs'
import { execSync } from 'node:child_process'
import { join, resolve } from 'node:path'
import { root } from './deps.mjs'

const SOURCES = ['app.vue', 'error.vue', 'nuxt.config.ts', 'tailwind.config.ts', 'package-lock.json', 'pages', 'components', 'composables', 'stores', 'layouts', 'middleware', 'plugins', 'server', 'shared', 'assets', 'public']

function newest(path) {
  if (!existsSync(path)) return 0
  const st = statSync(path)
  if (!st.isDirectory()) return st.mtimeMs
  let max = st.mtimeMs
  for (const entry of readdirSync(path)) max = Math.max(max, newest(join(path, entry)))
  return max
}

export function buildIsStale() {
  const marker = resolve(root, '.output/nitro.json')
  if (!existsSync(marker)) return true
  const built = statSync(marker).mtimeMs
  return SOURCES.some((s) => newest(resolve(root, s)) > built)
}

export function ensureBuild({ force = false } = {}) {
  if (!force && !buildIsStale()) return false
  console.log('[rowbench] building the production server (nuxt build)…')
  execSync('npx nuxt build', { cwd: root, stdio: 'inherit', env: { ...process.env, NUXT_TELEMETRY_DISABLED: '1' } })
  return true
}
