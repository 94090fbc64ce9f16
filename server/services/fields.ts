import { and, asc, desc, eq, ilike, or, sql, type SQL } from 'drizzle-orm'
import type { z } from 'zod'
import type { fieldBody, fieldImportBody, fieldListQuery, fieldPatch, seedLotBody, seedLotListQuery, seedLotPatch } from '#shared/schemas/fields'
import { boundaryOutlinePath, checkBoundary } from '#shared/utils/boundary'
import { parseFieldCsv } from '#shared/utils/field-import'
import { seedLotUnit } from '#shared/utils/seed-lots'
import type { Member } from '../utils/membership'
import type { Tx } from '../utils/db'

const { fields, seedLots, cropPlans } = schema

export type FieldRow = typeof fields.$inferSelect
export type SeedLotRow = typeof seedLots.$inferSelect
type ListQuery = z.infer<typeof fieldListQuery>

const SORT_COLUMNS = {
  name: fields.name, acres: fields.acres, soilTexture: fields.soilTexture, tillage: fields.tillage,
  drainage: fields.drainage, boundaryAcres: fields.boundaryAcres, updatedAt: fields.updatedAt,
} as const

const likeText = (q: string) => `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`

// A list row carries the outline as a ready SVG path instead of the whole geometry.
function listRow(f: FieldRow) {
  const { boundary, ...rest } = f
  return { ...rest, hasBoundary: !!boundary, outlinePath: boundaryOutlinePath(boundary as never) }
}

export async function listFields(farmId: number, q: Partial<ListQuery> = {}) {
  const { sort = 'name', dir = 'asc', page = 1, limit = 25 } = q
  const where: SQL[] = [eq(fields.farmId, farmId)]
  if (q.q) where.push(or(ilike(fields.name, likeText(q.q)), ilike(fields.soilTexture, likeText(q.q)), ilike(fields.notes, likeText(q.q)))!)
  if (q.tillage) where.push(eq(fields.tillage, q.tillage))
  const order = dir === 'desc' ? desc : asc
  const db = useDb()
  const [rows, [count]] = await Promise.all([
    db.select().from(fields).where(and(...where))
      .orderBy(sql`${order(SORT_COLUMNS[sort])} nulls last`, order(fields.id))
      .limit(limit).offset((page - 1) * limit),
    db.select({ n: sql<number>`count(*)::int`, acres: sql<number>`coalesce(sum(${fields.acres}), 0)::float` }).from(fields).where(and(...where)),
  ])
  return { items: rows.map(listRow), total: count!.n, totalAcres: count!.acres, page, limit }
}

export async function getField(farmId: number, id: number, tx?: Tx) {
  const [row] = await (tx ?? useDb()).select().from(fields).where(and(eq(fields.id, id), eq(fields.farmId, farmId)))
  if (!row) notFound('Field')
  return { ...row, outlinePath: boundaryOutlinePath(row.boundary as never, 240, 180, 8) }
}

async function lockField(tx: Tx, farmId: number, id: number) {
  const [row] = await tx.select().from(fields).where(and(eq(fields.id, id), eq(fields.farmId, farmId))).for('update')
  if (!row) notFound('Field')
  return row
}

async function nameTaken(tx: Tx, farmId: number, name: string, exceptId?: number) {
  const [row] = await tx.select({ id: fields.id }).from(fields).where(and(eq(fields.farmId, farmId), sql`lower(${fields.name}) = lower(${name})`))
  return !!row && row.id !== exceptId
}

function duplicateName(name: string): never {
  throw createError({ statusCode: 409, message: `A field named "${name}" already exists`, data: { fields: { name: 'Another field has this name' } } })
}

export async function createField(member: Member, body: z.infer<typeof fieldBody>) {
  return useDb().transaction(async (tx) => {
    if (await nameTaken(tx, member.farmId, body.name)) duplicateName(body.name)
    const [row] = await tx.insert(fields).values({ ...body, farmId: member.farmId }).returning()
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'create', entity: 'field', entityId: row!.id, after: row })
    return getField(member.farmId, row!.id, tx)
  })
}

export async function updateField(member: Member, id: number, patch: z.infer<typeof fieldPatch>) {
  return useDb().transaction(async (tx) => {
    const before = await lockField(tx, member.farmId, id)
    if (!Object.values(patch).some((v) => v !== undefined)) badRequest('There is nothing to change', { _: 'Change at least one field' })
    if (patch.name && await nameTaken(tx, member.farmId, patch.name, id)) duplicateName(patch.name)
    const [after] = await tx.update(fields).set(patch).where(eq(fields.id, id)).returning()
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'update', entity: 'field', entityId: id, before, after })
    return getField(member.farmId, id, tx)
  })
}

export async function deleteField(member: Member, id: number) {
  return useDb().transaction(async (tx) => {
    const before = await lockField(tx, member.farmId, id)
    const [used] = await tx.select({ n: sql<number>`count(*)::int` }).from(cropPlans).where(eq(cropPlans.fieldId, id))
    if (used!.n > 0) throw createError({ statusCode: 409, message: `${used!.n === 1 ? 'A crop plan uses' : `${used!.n} crop plans use`} this field; delete or move ${used!.n === 1 ? 'that plan' : 'those plans'} first` })
    await tx.delete(fields).where(eq(fields.id, id))
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'delete', entity: 'field', entityId: id, before })
    return { deleted: id }
  })
}

// Stores a checked outline and its acres; useAcres also makes them the field's acres.
export async function setFieldBoundary(member: Member, id: number, input: unknown, useAcres: boolean) {
  const checked = checkBoundary(input)
  if (!checked.ok) badRequest(checked.message, { boundary: checked.message })
  return useDb().transaction(async (tx) => {
    const before = await lockField(tx, member.farmId, id)
    const set = { boundary: checked.geometry, boundaryAcres: checked.acres, ...(useAcres ? { acres: checked.acres } : {}) }
    const [after] = await tx.update(fields).set(set).where(eq(fields.id, id)).returning()
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'set-boundary', entity: 'field', entityId: id, before: { acres: before.acres, boundaryAcres: before.boundaryAcres, boundary: before.boundary }, after: { acres: after!.acres, boundaryAcres: after!.boundaryAcres, positions: checked.positions } })
    return { ...(await getField(member.farmId, id, tx)), measuredAcres: checked.acres }
  })
}

export async function clearFieldBoundary(member: Member, id: number) {
  return useDb().transaction(async (tx) => {
    const before = await lockField(tx, member.farmId, id)
    if (!before.boundary) notFound('Boundary')
    await tx.update(fields).set({ boundary: null, boundaryAcres: null }).where(eq(fields.id, id))
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'clear-boundary', entity: 'field', entityId: id, before: { boundaryAcres: before.boundaryAcres, boundary: before.boundary } })
    return getField(member.farmId, id, tx)
  })
}

// Seed lots carry their unit in seeds and in lb, derived from the unit kind.
function withUnit(lot: SeedLotRow) {
  return { ...lot, ...seedLotUnit(lot) }
}

export async function listSeedLots(farmId: number, q: Partial<z.infer<typeof seedLotListQuery>> = {}) {
  const where: SQL[] = [eq(seedLots.farmId, farmId)]
  if (q.crop) where.push(eq(seedLots.crop, q.crop))
  if (q.q) where.push(or(ilike(seedLots.variety, likeText(q.q)), ilike(seedLots.lotNumber, likeText(q.q)), ilike(seedLots.treatment, likeText(q.q)))!)
  const rows = await useDb().select().from(seedLots).where(and(...where)).orderBy(asc(seedLots.crop), asc(seedLots.variety), asc(seedLots.lotNumber)).limit(1000)
  return { items: rows.map(withUnit) }
}

export async function getSeedLot(farmId: number, id: number, tx?: Tx) {
  const [row] = await (tx ?? useDb()).select().from(seedLots).where(and(eq(seedLots.id, id), eq(seedLots.farmId, farmId)))
  if (!row) notFound('Seed lot')
  return withUnit(row)
}

async function lockLot(tx: Tx, farmId: number, id: number) {
  const [row] = await tx.select().from(seedLots).where(and(eq(seedLots.id, id), eq(seedLots.farmId, farmId))).for('update')
  if (!row) notFound('Seed lot')
  return row
}

async function lotNumberTaken(tx: Tx, farmId: number, lotNumber: string, exceptId?: number) {
  const [row] = await tx.select({ id: seedLots.id }).from(seedLots).where(and(eq(seedLots.farmId, farmId), eq(seedLots.lotNumber, lotNumber)))
  if (row && row.id !== exceptId) throw createError({ statusCode: 409, message: `Lot ${lotNumber} is already on file`, data: { fields: { lotNumber: 'Another lot has this number' } } })
}

// A weight unit above a tote's worth is almost surely a seed count typed as lb.
function checkUnit(kind: string, size: number) {
  if (kind === 'lb' && size > 5_000) badRequest('A unit sold by weight is at most 5,000 lb', { unitSize: 'A weight unit is at most 5,000 lb; for a seed count choose "seeds"' })
  if (kind === 'seeds' && size < 100) badRequest('A seed-count unit holds at least 100 seeds', { unitSize: 'A seed-count unit holds at least 100 seeds; for a weight choose "lb"' })
}

export async function createSeedLot(member: Member, body: z.infer<typeof seedLotBody>) {
  checkUnit(body.unitKind, body.unitSize)
  return useDb().transaction(async (tx) => {
    await lotNumberTaken(tx, member.farmId, body.lotNumber)
    const [row] = await tx.insert(seedLots).values({ ...body, farmId: member.farmId }).returning()
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'create', entity: 'seed_lot', entityId: row!.id, after: row })
    return withUnit(row!)
  })
}

export async function updateSeedLot(member: Member, id: number, patch: z.infer<typeof seedLotPatch>) {
  return useDb().transaction(async (tx) => {
    const before = await lockLot(tx, member.farmId, id)
    if (!Object.values(patch).some((v) => v !== undefined)) badRequest('There is nothing to change', { _: 'Change at least one field' })
    checkUnit(patch.unitKind ?? before.unitKind, patch.unitSize ?? before.unitSize)
    if (patch.lotNumber) await lotNumberTaken(tx, member.farmId, patch.lotNumber, id)
    const [after] = await tx.update(seedLots).set(patch).where(eq(seedLots.id, id)).returning()
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'update', entity: 'seed_lot', entityId: id, before, after })
    return withUnit(after!)
  })
}

export async function deleteSeedLot(member: Member, id: number) {
  return useDb().transaction(async (tx) => {
    const before = await lockLot(tx, member.farmId, id)
    const [used] = await tx.select({ n: sql<number>`count(*)::int` }).from(cropPlans).where(eq(cropPlans.seedLotId, id))
    if (used!.n > 0) throw createError({ statusCode: 409, message: `${used!.n === 1 ? 'A crop plan uses' : `${used!.n} crop plans use`} this seed lot; choose another lot in ${used!.n === 1 ? 'that plan' : 'those plans'} first` })
    await tx.delete(seedLots).where(eq(seedLots.id, id))
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'delete', entity: 'seed_lot', entityId: id, before })
    return { deleted: id }
  })
}

// One transaction: names on the farm are read in it, and the import is one audit entry.
export async function importFields(member: Member, body: z.infer<typeof fieldImportBody>) {
  return useDb().transaction(async (tx) => {
    const existing = await tx.select({ name: fields.name }).from(fields).where(eq(fields.farmId, member.farmId))
    const parsed = parseFieldCsv(body.csv, existing.map((e) => e.name))
    const report = { mode: body.mode, dataRows: parsed.dataRows, valid: parsed.rows.length, errors: parsed.errors }
    if (body.mode === 'check') return { ...report, imported: 0, items: [] }
    if (parsed.errors.length && (body.mode === 'all-or-nothing' || !parsed.rows.length)) {
      const n = parsed.errors.length
      const message = parsed.rows.length
        ? `${n} ${n === 1 ? 'line needs' : 'lines need'} attention; nothing was imported`
        : `No line can be imported; ${n} ${n === 1 ? 'line needs' : 'lines need'} attention`
      throw createError({ statusCode: 400, statusMessage: 'Bad Request', message, data: { fields: { csv: message }, errors: parsed.errors, valid: parsed.rows.length, dataRows: parsed.dataRows } })
    }
    if (!parsed.rows.length) badRequest('The file has no fields to import', { csv: 'Add at least one line below the header' })
    const created = await tx.insert(fields).values(parsed.rows.map((r) => ({ ...r.field, farmId: member.farmId }))).returning()
    await writeAudit(tx, {
      farmId: member.farmId, userId: member.user.id, action: 'import', entity: 'field',
      after: { mode: body.mode, created: created.map((c) => ({ id: c.id, name: c.name, acres: c.acres })), skippedLines: parsed.errors.map((e) => e.line) },
    })
    return { ...report, imported: created.length, items: created.map((c, i) => ({ id: c.id, name: c.name, line: parsed.rows[i]!.line })) }
  })
}
