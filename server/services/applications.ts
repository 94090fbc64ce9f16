import { and, desc, eq } from 'drizzle-orm'
import { alias } from 'drizzle-orm/pg-core'
import type { ApplicationRecordBody, CalibrationBody } from '#shared/schemas/applications'
import type { SetupConfigBody } from '#shared/schemas/setups'
import { catchLengthFromRevolutions, fitCatchTest } from '#shared/utils/application'
import type { Member } from '../utils/membership'
import type { Tx } from '../utils/db'
import { getRevision, saveRevision } from './setups'

const { calibrationRuns, applicationRecords, fields, setups, users } = schema

// Days a restricted-use application may wait to be recorded (7 CFR 110.3).
export const RECORD_WITHIN_DAYS = 14

type RunRow = typeof calibrationRuns.$inferSelect
const runOut = (r: RunRow, runByName?: string | null) => ({ ...r, runByName: runByName ?? null })

// A catch test on a setup revision; with saveToSetup its dial setting becomes the next revision.
export async function createCalibration(member: Member, setupId: number, body: CalibrationBody) {
  const { rev } = await getRevision(member.farmId, setupId, body.baseRevision)
  const config = rev.config
  const positions = new Set(config.rowUnits.map((u) => u.position))
  const fieldErrors: Record<string, string> = {}
  const missing = (rows: number[]) => rows.filter((r) => !positions.has(r))
  if (missing(body.rows).length) fieldErrors.rows = `Rows ${missing(body.rows).join(', ')} are not in this setup`
  if (body.applyToRows && missing(body.applyToRows).length) fieldErrors.applyToRows = `Rows ${missing(body.applyToRows).join(', ')} are not in this setup`
  const settings = body.points.map((p) => p.setting)
  if (body.saveToSetup && body.dialSetting !== undefined && (body.dialSetting < Math.min(...settings) || body.dialSetting > Math.max(...settings))) {
    fieldErrors.dialSetting = `Catch at settings on both sides of ${body.dialSetting} before saving it; the tested range is ${Math.min(...settings)} to ${Math.max(...settings)}`
  }
  if (Object.keys(fieldErrors).length) badRequest('The catch test does not fit this setup', fieldErrors)
  const courseFt = body.courseFt ?? catchLengthFromRevolutions({ revolutions: body.revolutions!, wheelCircumferenceIn: config.wheelCircumferenceIn }).lengthFt
  const current = config.rowUnits.find((u) => body.rows.includes(u.position))?.granularDialSetting ?? undefined
  const fit = fitCatchTest({ points: body.points, courseFt, rowSpacingIn: config.rowSpacingIn, targetLbPerAcre: body.targetLbPerAcre, currentSetting: current ?? undefined })
  const values = {
    farmId: member.farmId, setupId, setupRevisionId: rev.id, revision: rev.revision, productName: body.productName || null, rows: body.rows,
    courseFt, revolutions: body.revolutions ?? null, rowSpacingIn: config.rowSpacingIn, targetLbPerAcre: body.targetLbPerAcre,
    points: body.points, fit, r2: fit.r2, dialSetting: body.dialSetting ?? null, note: body.note || null, runBy: member.user.id,
  }
  const insertRun = async (tx: Tx, appliedRevision: number | null) => {
    const [run] = await tx.insert(calibrationRuns).values({ ...values, appliedRevision }).returning()
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'create', entity: 'calibration_run', entityId: run!.id, after: run })
    return run!
  }
  if (!body.saveToSetup) return runOut(await useDb().transaction((tx) => insertRun(tx, null)), member.user.name)

  const granularRows = config.rowUnits.filter((u) => u.granular !== 'none').map((u) => u.position)
  const target = new Set(body.applyToRows ?? (granularRows.length ? granularRows : body.rows))
  const next = { ...config, rowUnits: config.rowUnits.map((u) => target.has(u.position) ? { ...u, granularDialSetting: body.dialSetting! } : u) }
  let run: RunRow | undefined
  const note = `Granular dial set to ${body.dialSetting} on rows ${[...target].sort((a, b) => a - b).join(', ')} from a catch test${body.productName ? ` of ${body.productName}` : ''} (r² ${fit.r2.toFixed(3)}).`
  const saved = await saveRevision(member, setupId, { baseRevision: body.baseRevision, config: next as SetupConfigBody, note }, async (tx, newRev) => {
    run = await insertRun(tx, newRev.revision)
  })
  return { ...runOut(run!, member.user.name), savedRevision: saved.revision }
}

export async function listCalibrations(farmId: number, setupId: number) {
  const [setup] = await useDb().select({ id: setups.id }).from(setups).where(and(eq(setups.id, setupId), eq(setups.farmId, farmId)))
  if (!setup) notFound('Setup')
  const rows = await useDb().select({ run: calibrationRuns, runByName: users.name }).from(calibrationRuns)
    .leftJoin(users, eq(users.id, calibrationRuns.runBy))
    .where(eq(calibrationRuns.setupId, setupId)).orderBy(desc(calibrationRuns.createdAt), desc(calibrationRuns.id))
  return rows.map((r) => runOut(r.run, r.runByName))
}

// What the record form offers: the farm's fields and its recent catch tests.
export async function recordChoices(farmId: number) {
  const db = useDb()
  const fieldRows = await db.select({ id: fields.id, name: fields.name, acres: fields.acres }).from(fields).where(eq(fields.farmId, farmId)).orderBy(fields.name)
  const runs = await db.select({ id: calibrationRuns.id, setupId: calibrationRuns.setupId, setupName: setups.name, revision: calibrationRuns.revision, productName: calibrationRuns.productName, dialSetting: calibrationRuns.dialSetting, targetLbPerAcre: calibrationRuns.targetLbPerAcre, r2: calibrationRuns.r2, createdAt: calibrationRuns.createdAt })
    .from(calibrationRuns).innerJoin(setups, eq(setups.id, calibrationRuns.setupId))
    .where(eq(calibrationRuns.farmId, farmId)).orderBy(desc(calibrationRuns.createdAt)).limit(100)
  return { fields: fieldRows, calibrations: runs }
}

const correction = alias(applicationRecords, 'correction')
const recordSelect = { record: applicationRecords, recordedByName: users.name, correctedById: correction.id }

function recordOut(r: { record: typeof applicationRecords.$inferSelect, recordedByName: string | null, correctedById: number | null }) {
  const recordedAfterDays = Math.floor((r.record.createdAt.getTime() - new Date(`${r.record.appliedOn}T00:00:00Z`).getTime()) / 86_400_000)
  const keep = new Date(`${r.record.appliedOn}T00:00:00Z`)
  keep.setUTCFullYear(keep.getUTCFullYear() + 2)
  return {
    ...r.record,
    appliedTime: r.record.appliedTime?.slice(0, 5) ?? null,
    recordedByName: r.recordedByName,
    correctedById: r.correctedById,
    current: r.correctedById === null,
    recordedAfterDays,
    // A correction carries no lateness of its own: the original shows when the application was first recorded.
    recordedLate: r.record.restrictedUse && !r.record.correctsId && recordedAfterDays > RECORD_WITHIN_DAYS,
    // The federal rule asks restricted-use records be kept 2 years; Rowbench never deletes them.
    keepUntil: r.record.restrictedUse ? keep.toISOString().slice(0, 10) : null,
  }
}
export type RecordOut = ReturnType<typeof recordOut>

const recordsQuery = () => useDb().select(recordSelect).from(applicationRecords)
  .leftJoin(users, eq(users.id, applicationRecords.recordedBy))
  .leftJoin(correction, eq(correction.correctsId, applicationRecords.id))

export async function listRecords(farmId: number, season?: number) {
  const where = [eq(applicationRecords.farmId, farmId)]
  if (season) where.push(eq(applicationRecords.season, season))
  const rows = await recordsQuery().where(and(...where)).orderBy(desc(applicationRecords.appliedOn), desc(applicationRecords.id))
  return rows.map(recordOut)
}

export async function recordSeasons(farmId: number) {
  const rows = await useDb().selectDistinct({ season: applicationRecords.season }).from(applicationRecords).where(eq(applicationRecords.farmId, farmId)).orderBy(desc(applicationRecords.season))
  return rows.map((r) => r.season)
}

export async function getRecord(farmId: number, id: number) {
  const [row] = await recordsQuery().where(and(eq(applicationRecords.id, id), eq(applicationRecords.farmId, farmId)))
  if (!row) notFound('Application record')
  // The chain back through the records this one corrects.
  const history: RecordOut[] = []
  let prev = row.record.correctsId
  while (prev) {
    const [p] = await recordsQuery().where(and(eq(applicationRecords.id, prev), eq(applicationRecords.farmId, farmId)))
    if (!p) break
    history.push(recordOut(p))
    prev = p.record.correctsId
  }
  return { ...recordOut(row), history }
}

async function checkRefs(tx: Tx, farmId: number, body: ApplicationRecordBody) {
  const errors: Record<string, string> = {}
  let fieldName = body.fieldName
  if (body.fieldId) {
    const [f] = await tx.select({ name: fields.name }).from(fields).where(and(eq(fields.id, body.fieldId), eq(fields.farmId, farmId)))
    if (!f) errors.fieldId = 'Choose one of this farm\'s fields'
    else fieldName = f.name
  }
  if (body.calibrationRunId) {
    const [c] = await tx.select({ id: calibrationRuns.id }).from(calibrationRuns).where(and(eq(calibrationRuns.id, body.calibrationRunId), eq(calibrationRuns.farmId, farmId)))
    if (!c) errors.calibrationRunId = 'Choose one of this farm\'s catch tests'
  }
  if (Object.keys(errors).length) badRequest('Some fields need attention', errors)
  return fieldName
}

function recordValues(member: Member, body: ApplicationRecordBody, fieldName: string) {
  return {
    farmId: member.farmId, season: Number(body.appliedOn.slice(0, 4)), appliedOn: body.appliedOn, appliedTime: body.appliedTime ?? null,
    fieldId: body.fieldId ?? null, fieldName, location: body.location ?? null, crop: body.crop, productName: body.productName,
    epaRegNumber: body.epaRegNumber ?? null, restrictedUse: body.restrictedUse, rate: body.rate, rateUnit: body.rateUnit,
    totalAmount: body.totalAmount ?? null, totalUnit: body.totalUnit ?? null, areaTreatedAcres: body.areaTreatedAcres,
    bandWidthIn: body.bandWidthIn ?? null, rowSpacingIn: body.rowSpacingIn ?? null, applicatorName: body.applicatorName,
    certificationNumber: body.certificationNumber ?? null, calibrationRunId: body.calibrationRunId ?? null,
    weatherNotes: body.weatherNotes ?? null, notes: body.notes ?? null, recordedBy: member.user.id,
  }
}

export async function createRecord(member: Member, body: ApplicationRecordBody) {
  const id = await useDb().transaction(async (tx) => {
    const fieldName = await checkRefs(tx, member.farmId, body)
    const [rec] = await tx.insert(applicationRecords).values(recordValues(member, body, fieldName)).returning()
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'create', entity: 'application_record', entityId: rec!.id, after: rec })
    return rec!.id
  })
  return getRecord(member.farmId, id)
}

// A correction is a new record pointing at the one it corrects; the original stays as it was.
export async function correctRecord(member: Member, id: number, reason: string, body: ApplicationRecordBody) {
  const newId = await useDb().transaction(async (tx) => {
    const [orig] = await tx.select().from(applicationRecords).where(and(eq(applicationRecords.id, id), eq(applicationRecords.farmId, member.farmId))).for('update')
    if (!orig) notFound('Application record')
    const [later] = await tx.select({ id: applicationRecords.id }).from(applicationRecords).where(eq(applicationRecords.correctsId, id))
    if (later) throw createError({ statusCode: 409, message: `Record ${id} was already corrected by record ${later.id}; correct that one instead.`, data: { correctedById: later.id } })
    const fieldName = await checkRefs(tx, member.farmId, body)
    const [rec] = await tx.insert(applicationRecords).values({ ...recordValues(member, body, fieldName), correctsId: id, correctionReason: reason }).returning()
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'correct', entity: 'application_record', entityId: rec!.id, before: { id }, after: rec })
    return rec!.id
  })
  return getRecord(member.farmId, newId)
}

const csvNum = (n: number | null) => n == null ? '' : String(n)

export const RECORD_CSV_COLUMNS = [
  'record',
  'date',
  'time',
  'field',
  'location',
  'crop',
  'product',
  'EPA reg. no.',
  'restricted use',
  'rate',
  'rate unit',
  'total amount',
  'total unit',
  'area treated (acres)',
  'band width (in)',
  'row spacing (in)',
  'applicator',
  'certification no.',
  'catch test',
  'weather',
  'notes',
  'corrects record',
  'correction reason',
  'corrected by record',
  'recorded at',
  'recorded by',
] as const

// One line per record of the season, corrected ones included and marked, oldest first.
export async function recordsCsv(farmId: number, season?: number) {
  const rows = (await listRecords(farmId, season)).reverse()
  const objects = rows.map((r) => ({
    'record': r.id,
    'date': r.appliedOn,
    'time': r.appliedTime ?? '',
    'field': r.fieldName,
    'location': r.location ?? '',
    'crop': r.crop,
    'product': r.productName,
    'EPA reg. no.': r.epaRegNumber ?? '',
    'restricted use': r.restrictedUse ? 'yes' : 'no',
    'rate': csvNum(r.rate),
    'rate unit': r.rateUnit,
    'total amount': csvNum(r.totalAmount),
    'total unit': r.totalUnit ?? '',
    'area treated (acres)': csvNum(r.areaTreatedAcres),
    'band width (in)': csvNum(r.bandWidthIn),
    'row spacing (in)': csvNum(r.rowSpacingIn),
    'applicator': r.applicatorName,
    'certification no.': r.certificationNumber ?? '',
    'catch test': r.calibrationRunId ?? '',
    'weather': r.weatherNotes ?? '',
    'notes': r.notes ?? '',
    'corrects record': r.correctsId ?? '',
    'correction reason': r.correctionReason ?? '',
    'corrected by record': r.correctedById ?? '',
    'recorded at': r.createdAt.toISOString(),
    'recorded by': r.recordedByName ?? '',
  }))
  return { fields: RECORD_CSV_COLUMNS, data: objects.map((o) => RECORD_CSV_COLUMNS.map((k) => o[k])) }
}

