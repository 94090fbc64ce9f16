// Starts the built server against a database of its own, with its own fake SMTP, for tests.
import { spawn } from 'node:child_process'
import { createServer } from 'node:net'
import { mkdtempSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join, resolve } from 'node:path'
import { root } from './deps.mjs'
import { dbUp, ensureDatabase, localUrl } from './pg.mjs'
import { runMigrations } from '../migrate.mjs'
import { startFakeSmtp } from './fake-smtp.mjs'
import { SERVER_NODE_ARGS } from './server-args.mjs'

export const TEST_SESSION_SECRET = 'test-only-session-secret-0123456789abcdef'

export async function waitForHttp(url, timeoutMs = 60_000) {
  const until = Date.now() + timeoutMs
  while (Date.now() < until) {
    try {
      const r = await fetch(url)
      if (r.ok) return
    } catch { /* not up yet */ }
    await new Promise((r) => setTimeout(r, 250))
  }
  throw new Error(`server at ${url} did not answer within ${timeoutMs} ms`)
}

// The preferred port when it is free, else any free one (another run may hold it).
export function freePort(preferred) {
  return new Promise((resolvePort) => {
    const srv = createServer()
    srv.once('error', () => {
      const any = createServer()
      any.listen(0, '127.0.0.1', () => {
        const { port } = any.address()
        any.close(() => resolvePort(port))
      })
    })
    srv.listen(preferred, '127.0.0.1', () => srv.close(() => resolvePort(preferred)))
  })
}

export async function startTestServer({ database, port: wantPort, smtpPort: wantSmtp, seed = false, fresh = true, smtp = true, env: extra = {}, nodeArgs = [], captureOutput = false }) {
  const port = await freePort(wantPort)
  const smtpPort = await freePort(wantSmtp)
  dbUp()
  ensureDatabase(database, { fresh })
  const databaseUrl = localUrl(database)
  await runMigrations(databaseUrl)
  if (seed) {
    const { createJiti } = await import('jiti')
    const { seedDemo } = await createJiti(import.meta.url).import('../seed/index.ts')
    await seedDemo(databaseUrl)
  }
  const mailbox = mkdtempSync(join(tmpdir(), 'rowbench-mail-'))
  const smtpServer = smtp ? await startFakeSmtp({ port: smtpPort, dir: mailbox }) : null
  const uploads = mkdtempSync(join(tmpdir(), 'rowbench-uploads-'))
  const baseUrl = `http://127.0.0.1:${port}`
  const child = spawn(process.execPath, [...SERVER_NODE_ARGS, ...nodeArgs, resolve(root, '.output/server/index.mjs')], {
    env: {
      ...process.env,
      DATABASE_URL: databaseUrl,
      NITRO_HOST: '127.0.0.1',
      NITRO_PORT: String(port),
      HOST: '127.0.0.1',
      PORT: String(port),
      NUXT_SESSION_PASSWORD: TEST_SESSION_SECRET,
      NUXT_SMTP_URL: `smtp://127.0.0.1:${smtpPort}`,
      NUXT_PUBLIC_APP_URL: baseUrl,
      NUXT_UPLOAD_DIR: uploads,
      ROWBENCH_MAILBOX_DIR: mailbox,
      ROWBENCH_OUTBOX_INTERVAL_MS: '500',
      SMTP_URL: '',
      ROWBENCH_TRUST_PROXY: '1',
      ROWBENCH_LOGIN_IP_LIMIT: '20',
      ...extra,
    },
    // captureOutput keeps what the server prints, for tests that read its log.
    stdio: ['ignore', captureOutput ? 'pipe' : 'inherit', captureOutput ? 'pipe' : 'inherit'],
  })
  const output = []
  if (captureOutput) for (const stream of [child.stdout, child.stderr]) stream.on('data', (chunk) => output.push(String(chunk)))
  await waitForHttp(`${baseUrl}/api/health`)
  return {
    baseUrl, databaseUrl, mailbox, uploads, smtpPort, child,
    log: () => output.join(''),
    async stop() {
      child.kill('SIGTERM')
      await new Promise((r) => (smtpServer ? smtpServer.close(r) : r()))
      await new Promise((r) => (child.exitCode !== null ? r() : child.once('exit', r)))
    },
  }
}
