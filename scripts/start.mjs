#!/usr/bin/env node
// npm start: everything a fresh machine needs, then the production server with demo data.
import { ensureDependencies, root } from './lib/deps.mjs'

ensureDependencies()

const { spawn } = await import('node:child_process')
const { resolve } = await import('node:path')
const { dbUp, ensureDatabase, localUrl } = await import('./lib/pg.mjs')
const { runMigrations } = await import('./migrate.mjs')
const { ensureBuild } = await import('./lib/build.mjs')
const { sessionSecret } = await import('./lib/secret.mjs')
const { startFakeSmtp } = await import('./lib/fake-smtp.mjs')
const { createJiti } = await import('jiti')
const { SLOT, suffix } = await import('./lib/slot.mjs')
const { SERVER_NODE_ARGS } = await import('./lib/server-args.mjs')

const host = process.env.HOST || '127.0.0.1'
const port = Number(process.env.PORT || 3000 + SLOT * 10)
const env = { ...process.env, HOST: host, PORT: String(port), NITRO_HOST: host, NITRO_PORT: String(port) }

let databaseUrl = process.env.DATABASE_URL
if (!databaseUrl) {
  dbUp()
  ensureDatabase(`rowbench${suffix}`)
  databaseUrl = localUrl(`rowbench${suffix}`)
}
env.DATABASE_URL = databaseUrl

try {
  await runMigrations(databaseUrl)
} catch (err) {
  console.error(`[rowbench] database migration failed, not starting: ${err.message}`)
  process.exit(1)
}

const jiti = createJiti(import.meta.url)
const { seedDemo } = await jiti.import('./seed/index.ts')
if (await seedDemo(databaseUrl)) console.log('[rowbench] demo data seeded')

if (!process.env.SMTP_URL) {
  const smtpPort = Number(process.env.ROWBENCH_SMTP_PORT || 2526 + SLOT * 10)
  const mailbox = resolve(root, '.data/mailbox')
  await startFakeSmtp({ port: smtpPort, dir: mailbox })
  env.NUXT_SMTP_URL = `smtp://127.0.0.1:${smtpPort}`
  env.ROWBENCH_MAILBOX_DIR = mailbox
}
env.NUXT_SESSION_PASSWORD = sessionSecret()
env.NUXT_PUBLIC_APP_URL ||= `http://${host === '0.0.0.0' ? '127.0.0.1' : host}:${port}`
env.NUXT_UPLOAD_DIR ||= resolve(root, '.data/uploads')

ensureBuild()

const server = spawn(process.execPath, [...SERVER_NODE_ARGS, resolve(root, '.output/server/index.mjs')], { env, stdio: ['ignore', 'inherit', 'inherit'] })
server.on('exit', (code) => process.exit(code ?? 0))
for (const sig of ['SIGINT', 'SIGTERM']) process.on(sig, () => server.kill(sig))

console.log(`
  Rowbench is running at ${env.NUXT_PUBLIC_APP_URL}

  Demo sign-ins (password rowbench-demo, demo only):
    owner@demo.test       farm owner
    agronomist@demo.test  agronomist
    operator@demo.test    operator
    foreman@demo.test     shop foreman
${process.env.SMTP_URL ? '' : '\n  Mail goes to the local mailbox (owner → Mailbox).\n'}`)
