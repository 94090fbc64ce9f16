// Install node_modules with `npm ci` when it is missing or older than the lock file.
import { existsSync, statSync } from 'node:fs'
import { execSync } from 'node:child_process'
import { resolve } from 'node:path'

export const root = resolve(import.meta.dirname, '..', '..')

export function ensureDependencies() {
  const lock = resolve(root, 'package-lock.json')
  const marker = resolve(root, 'node_modules', '.package-lock.json')
  if (existsSync(marker) && statSync(marker).mtimeMs >= statSync(lock).mtimeMs) return
  console.log('[rowbench] installing dependencies (npm ci)…')
  execSync('npm ci --no-audit --no-fund', { cwd: root, stdio: 'inherit' })
}
