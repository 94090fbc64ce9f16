import type { TestProject } from 'vitest/node'
import { startTestServer } from '../../scripts/lib/test-server.mjs'
import { apiPort, apiSmtpPort, suffix } from '../../scripts/lib/slot.mjs'

// One built server on a fresh test database for every API test file.
export default async function setup(project: TestProject) {
  const server = await startTestServer({ database: `rowbench_test${suffix}`, port: apiPort, smtpPort: apiSmtpPort })
  project.provide('baseUrl', server.baseUrl)
  project.provide('databaseUrl', server.databaseUrl)
  project.provide('mailbox', server.mailbox)
  project.provide('uploadsDir', server.uploads)
  return async () => server.stop()
}

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string
    databaseUrl: string
    mailbox: string
    uploadsDir: string
  }
}
