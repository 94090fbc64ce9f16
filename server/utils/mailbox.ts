import { readdir, readFile } from 'node:fs/promises'
import { join } from 'node:path'

export interface StoredMail { id: string, date: string, from: string, to: string[], subject: string, text: string, farmId?: number | null, attachments: { filename: string, contentType: string, size: number }[] }

export function mailboxDir(): string {
  if (process.env.SMTP_URL) return ''
  return process.env.ROWBENCH_MAILBOX_DIR || useRuntimeConfig().mailboxDir
}

// One farm's mail, newest first. Mail of no farm (password resets) is never shown: its links would
// let one farm's owner take over another farm's accounts; in the demo it is read from the folder.
export async function readMailbox(dir: string, farmId: number, limit = 200): Promise<StoredMail[]> {
  const files = (await readdir(dir).catch(() => [] as string[])).filter((f) => f.endsWith('.json')).sort().reverse()
  const mine: StoredMail[] = []
  for (const f of files) {
    if (mine.length >= limit) break
    const mail = JSON.parse(await readFile(join(dir, f), 'utf8')) as StoredMail
    if (mail.farmId === farmId) mine.push(mail)
  }
  return mine
}
