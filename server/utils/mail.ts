import nodemailer, { type Transporter } from 'nodemailer'
import { and, asc, isNull, lte, eq, sql } from 'drizzle-orm'
import type { Db, Tx } from './db'

export interface MailAttachment { filename: string, contentBase64: string, contentType: string }
export interface Mail { to: string, subject: string, text: string, html?: string, farmId?: number | null, attachments?: MailAttachment[] }

let transport: Transporter | undefined
function useTransport() {
  transport ??= nodemailer.createTransport(process.env.SMTP_URL || useRuntimeConfig().smtpUrl, { from: useRuntimeConfig().mailFrom })
  return transport
}

// Mail is queued in the outbox (inside the caller's transaction when given) and sent afterwards;
// an action never fails because the SMTP server is away.
export async function queueMail(mail: Mail | Mail[], tx?: Tx | Db) {
  const list = Array.isArray(mail) ? mail : [mail]
  if (!list.length) return
  await (tx ?? useDb()).insert(schema.outbox).values(list.map((m) => ({
    farmId: m.farmId ?? null,
    to: m.to,
    subject: m.subject,
    text: m.text,
    html: m.html ?? null,
    attachments: m.attachments ?? null,
  })))
  if (!tx) void flushOutbox()
}

let flushing: Promise<number> | undefined

export function flushOutbox(): Promise<number> {
  flushing ??= sendDue().finally(() => { flushing = undefined })
  return flushing
}

async function sendDue(): Promise<number> {
  const db = useDb()
  const due = await db.select().from(schema.outbox)
    .where(and(isNull(schema.outbox.sentAt), lte(schema.outbox.nextAttemptAt, new Date())))
    .orderBy(asc(schema.outbox.id)).limit(50)
  let sent = 0
  for (const m of due) {
    try {
      await useTransport().sendMail({
        to: m.to,
        subject: m.subject,
        text: m.text,
        html: m.html ?? undefined,
        // Which farm a message belongs to, so the demo mailbox shows each farm only its own mail.
        headers: m.farmId ? { 'X-Rowbench-Farm': String(m.farmId) } : undefined,
        attachments: m.attachments?.map((a) => ({ filename: a.filename, content: Buffer.from(a.contentBase64, 'base64'), contentType: a.contentType })),
      })
      await db.update(schema.outbox).set({ sentAt: new Date(), attempts: m.attempts + 1, lastError: null }).where(eq(schema.outbox.id, m.id))
      sent++
    } catch (err) {
      // Back off: 10 s, 20 s, 40 s … up to 10 minutes.
      const delay = Math.min(600_000, 10_000 * 2 ** m.attempts)
      await db.update(schema.outbox).set({
        attempts: sql`${schema.outbox.attempts} + 1`,
        lastError: (err as Error).message.slice(0, 500),
        nextAttemptAt: new Date(Date.now() + delay),
      }).where(eq(schema.outbox.id, m.id))
    }
  }
  return sent
}

export function appUrl(path = '') {
  return `${useRuntimeConfig().public.appUrl.replace(/\/$/, '')}${path}`
}
