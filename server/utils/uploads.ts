/**
 * Uploaded files (CSV and text, JPEG, PNG, WebP) for any area of Rowbench.
 *
 * The bytes live in Nitro's `uploads` storage mount: the file system under .data/uploads by
 * default (nuxt.config.ts `nitro.storage.uploads`; `NUXT_UPLOAD_DIR` moves it at run time), or any
 * unstorage driver such as S3 when `NUXT_UPLOAD_STORAGE=config` keeps the mount as configured. A row
 * in the `uploads` table records the owning farm, the storage key, the type, the size and who sent it.
 *
 * API (auto-imported on the server):
 * - `receiveUpload(event, member, { accept, fileName })` reads the raw request body (the file itself,
 *   not a multipart form). More than UPLOAD_MAX_BYTES (by Content-Length or by the bytes actually
 *   read) is a 413 before anything is stored; an empty body a 400; a type found in the bytes that is
 *   not in `accept` a 415. Then stores the bytes and writes the row and an audit entry in one
 *   transaction, and returns the row.
 * - `readUpload(farmId, id)` gives `{ upload, bytes }`; another farm's or a missing file is a 404.
 * - `assertFarmUploads(tx, farmId, ids, accept?, field?)` is a 400 unless every id is one of the
 *   farm's uploads (of an accepted type); use it before linking uploads to a record.
 * - `sniffUploadType(bytes)` names the type from the content, or null.
 * - `sweepOrphanUploads(graceHours)` deletes the files no record has named for `graceHours` since
 *   they were sent (a photo removed from a checklist line, an upload never attached), rows and audit
 *   entries in one transaction, then the bytes; it keeps every file a column of the schema's
 *   `UPLOAD_REFERENCES` names.
 */
import { randomUUID } from 'node:crypto'
import type { H3Event } from 'h3'
import { and, eq, inArray, sql } from 'drizzle-orm'
import type { Member } from './membership'
import type { Tx } from './db'
import { UPLOAD_MAX_BYTES } from '#shared/utils/upload-limits'

export const UPLOAD_TYPES = ['text/csv', 'image/jpeg', 'image/png', 'image/webp'] as const
export type UploadType = (typeof UPLOAD_TYPES)[number]
export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const satisfies readonly UploadType[]
export type UploadRow = typeof schema.uploads.$inferSelect

const TYPE_NAMES: Record<UploadType, string> = { 'text/csv': 'CSV or text', 'image/jpeg': 'JPEG', 'image/png': 'PNG', 'image/webp': 'WebP' }
const storage = () => useStorage('uploads')
const MB = UPLOAD_MAX_BYTES / 1024 / 1024
const tooLarge = () => createError({ statusCode: 413, message: `The file is larger than ${MB} MB; nothing was stored` })

// Text is UTF-8 (an optional byte-order mark) with no control characters but tab, line breaks and form feed.
function looksLikeText(bytes: Uint8Array): boolean {
  try {
    new TextDecoder('utf-8', { fatal: true }).decode(bytes)
  } catch {
    return false
  }
  for (const b of bytes) if (b < 0x20 && b !== 0x09 && b !== 0x0a && b !== 0x0d && b !== 0x0c) return false
  return true
}

export function sniffUploadType(bytes: Uint8Array): UploadType | null {
  const at = (i: number, ...sig: number[]) => sig.every((s, j) => bytes[i + j] === s)
  if (at(0, 0xff, 0xd8, 0xff)) return 'image/jpeg'
  if (at(0, 0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a)) return 'image/png'
  if (at(0, 0x52, 0x49, 0x46, 0x46) && at(8, 0x57, 0x45, 0x42, 0x50)) return 'image/webp'
  return bytes.length && looksLikeText(bytes) ? 'text/csv' : null
}

// The body, refused with a 413 as soon as it passes the limit. The rest is read and dropped (up to
// a bound) so the client gets the answer instead of a reset connection.
async function readCapped(event: H3Event, max: number): Promise<Buffer> {
  const declared = Number(getRequestHeader(event, 'content-length'))
  const req = event.node.req
  if (Number.isFinite(declared) && declared > max * 3) {
    setResponseHeader(event, 'Connection', 'close')
    throw tooLarge()
  }
  let over = Number.isFinite(declared) && declared > max
  const chunks: Buffer[] = []
  let total = 0
  for await (const chunk of req as AsyncIterable<Buffer>) {
    total += chunk.length
    if (total > max) over = true
    if (!over) chunks.push(chunk)
    else if (total > max * 3) {
      setResponseHeader(event, 'Connection', 'close')
      break
    }
  }
  if (over) throw tooLarge()
  return Buffer.concat(chunks)
}

export async function receiveUpload(event: H3Event, member: Member, opts: { accept?: readonly UploadType[], fileName?: string | null } = {}): Promise<UploadRow> {
  const accept = opts.accept ?? UPLOAD_TYPES
  const bytes = await readCapped(event, UPLOAD_MAX_BYTES)
  if (!bytes.length) badRequest('The file is empty', { file: 'Choose a file that is not empty' })
  const type = sniffUploadType(bytes)
  if (!type || !accept.includes(type)) {
    const names = accept.map((t) => TYPE_NAMES[t])
    const list = names.length > 1 ? `${names.slice(0, -1).join(', ')} or ${names[names.length - 1]}` : names[0]
    throw createError({ statusCode: 415, message: `This file is not ${list}; nothing was stored` })
  }
  const storageKey = `farm-${member.farmId}:${randomUUID()}`
  let written = false
  try {
    return await useDb().transaction(async (tx) => {
      const [row] = await tx.insert(schema.uploads).values({ farmId: member.farmId, storageKey, contentType: type, sizeBytes: bytes.length, fileName: opts.fileName ?? null, uploadedBy: member.user.id }).returning()
      await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'upload', entity: 'upload', entityId: row!.id, after: row })
      await storage().setItemRaw(storageKey, bytes)
      written = true
      return row!
    })
  } catch (err) {
    // The row was rolled back; the bytes must go too.
    if (written) await storage().removeItem(storageKey).catch(() => {})
    throw err
  }
}

export async function readUpload(farmId: number, id: number): Promise<{ upload: UploadRow, bytes: Buffer }> {
  const [upload] = await useDb().select().from(schema.uploads).where(and(eq(schema.uploads.id, id), eq(schema.uploads.farmId, farmId)))
  if (!upload) notFound('File')
  const raw = await storage().getItemRaw(upload.storageKey)
  if (raw == null) notFound('File')
  const bytes = Buffer.isBuffer(raw) ? raw : Buffer.from(raw as ArrayBuffer)
  return { upload, bytes }
}

export async function assertFarmUploads(tx: Tx, farmId: number, ids: number[], accept: readonly UploadType[] = UPLOAD_TYPES, field = 'photoUploadIds'): Promise<UploadRow[]> {
  const unique = [...new Set(ids)]
  if (!unique.length) return []
  // Key-share locks keep the sweeper from deleting a file while this transaction links it.
  const rows = await tx.select().from(schema.uploads).where(and(eq(schema.uploads.farmId, farmId), inArray(schema.uploads.id, unique))).for('key share')
  const ok = rows.filter((r) => accept.includes(r.contentType as UploadType))
  if (ok.length !== unique.length) badRequest('An attached file is unknown or of the wrong type', { [field]: 'Unknown file or wrong type' })
  return ok
}

// No record names upload `u`: one test per column of the schema's UPLOAD_REFERENCES (an *_ids
// column holds an array of ids), so the list is the only place that knows them.
const unreferenced = sql.join(schema.UPLOAD_REFERENCES.map((ref) => {
  const [table, column] = ref.split('.') as [string, string]
  const names = column.endsWith('_ids') ? `u.id = any(r.${column})` : `r.${column} = u.id`
  return sql.raw(`not exists (select 1 from ${table} r where ${names})`)
}), sql` and `)

export async function sweepOrphanUploads(graceHours: number): Promise<number> {
  const removed = await useDb().transaction(async (tx) => {
    // Lock the candidates first (skipping any a linking transaction holds), then delete those still
    // unnamed by a fresh look: a link committed in between keeps its file.
    const candidates = await tx.execute<{ id: number }>(sql`select u.id from uploads u
      where u.created_at < now() - make_interval(hours => ${graceHours}) and ${unreferenced}
      order by u.id limit 500 for update of u skip locked`)
    if (!candidates.rows.length) return []
    const ids = candidates.rows.map((r) => Number(r.id))
    const gone = await tx.execute<{ id: number, farm_id: number, storage_key: string, file_name: string | null, content_type: string, created_at: string }>(sql`delete from uploads u
      where u.id in ${ids} and ${unreferenced}
      returning u.id, u.farm_id, u.storage_key, u.file_name, u.content_type, u.created_at`)
    for (const r of gone.rows) {
      await writeAudit(tx, { farmId: r.farm_id, userId: null, action: 'delete', entity: 'upload', entityId: r.id, before: { fileName: r.file_name, contentType: r.content_type, createdAt: r.created_at }, after: { reason: `no record named it for ${graceHours} h` } })
    }
    return gone.rows
  })
  for (const r of removed) {
    await storage().removeItem(r.storage_key).catch((err) => console.warn(`[uploads] could not remove ${r.storage_key}: ${(err as Error).message}`))
  }
  return removed.length
}
