#!/usr/bin/env node
// Serves the built app for Playwright on a freshly seeded database of its own.
import { startTestServer } from './lib/test-server.mjs'
import { e2ePort, e2eSmtpPort, suffix } from './lib/slot.mjs'

const server = await startTestServer({ database: `rowbench_e2e${suffix}`, port: e2ePort, smtpPort: e2eSmtpPort, seed: true, env: { ROWBENCH_LOGIN_IP_LIMIT: '1000' } })
const stop = async () => {
  await server.stop()
  process.exit(0)
}
process.on('SIGTERM', stop)
process.on('SIGINT', stop)
