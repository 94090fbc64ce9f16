import { readdir, readFile } from 'node:fs/promises'
import { join } from 'node:path'

export interface StoredMail { id: string, date: string, from: string, to: string[], subject: string, text: string, attachments: { filename: string, contentType: string, size: number }[] }

export function mailboxDir(): string {
  if (process.env.SMTP_URL) return ''
  return process.env.ROWBENCH_MAILBOX_DIR || useRuntimeConfig().mailboxDir
}

export async function readMailbox(dir: string, limit = 200): Promise<StoredMail[]> {
  const files = (await readdir(dir).catch(() => [] as string[])).filter((f) => f.endsWith('.json')).sort().reverse().slice(0, limit)
  return Promise.all(files.map(async (f) => JSON.parse(await readFile(join(dir, f), 'utf8')) as StoredMail))
}
