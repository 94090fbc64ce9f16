// A session secret for local use, generated once and kept under .data; production must set its own.
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs'
import { randomBytes } from 'node:crypto'
import { resolve } from 'node:path'
import { root } from './deps.mjs'

export function sessionSecret() {
  if (process.env.NUXT_SESSION_PASSWORD) return process.env.NUXT_SESSION_PASSWORD
  if (process.env.NODE_ENV === 'production' && process.env.ROWBENCH_DEMO !== '1') {
    throw new Error('NUXT_SESSION_PASSWORD must be set (32+ characters) when NODE_ENV=production')
  }
  const file = resolve(root, '.data/session-secret')
  if (existsSync(file)) return readFileSync(file, 'utf8').trim()
  mkdirSync(resolve(root, '.data'), { recursive: true })
  const secret = randomBytes(32).toString('hex')
  writeFileSync(file, secret, { mode: 0o600 })
  return secret
}
