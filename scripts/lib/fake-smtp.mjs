// A local SMTP server that stores every message it receives as JSON in a folder (demo and tests).
import { SMTPServer } from 'smtp-server'
import { simpleParser } from 'mailparser'
import { mkdirSync, writeFileSync } from 'node:fs'
import { join } from 'node:path'

export function startFakeSmtp({ port, dir, host = '127.0.0.1' }) {
  mkdirSync(dir, { recursive: true })
  let n = 0
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream).then((mail) => {
        const id = `${Date.now()}-${String(++n).padStart(5, '0')}`
        const record = {
          id,
          date: (mail.date ?? new Date()).toISOString(),
          from: mail.from?.text ?? '',
          to: session.envelope.rcptTo.map((r) => r.address),
          subject: mail.subject ?? '',
          // The farm the message belongs to (none for password resets), from Rowbench's own header.
          farmId: Number(mail.headers.get('x-rowbench-farm')) || null,
          text: mail.text ?? '',
          attachments: (mail.attachments ?? []).map((a) => ({ filename: a.filename, contentType: a.contentType, size: a.size, contentBase64: a.content.toString('base64') })),
        }
        writeFileSync(join(dir, `${id}.json`), JSON.stringify(record))
        callback()
      }, callback)
    },
  })
  return new Promise((resolvePromise, reject) => {
    server.once('error', reject)
    server.listen(port, host, () => resolvePromise(server))
  })
}
