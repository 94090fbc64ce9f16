import Decimal from 'decimal.js'
import { and, desc, eq, lt, sql } from 'drizzle-orm'
import { alias } from 'drizzle-orm/pg-core'
import type { z } from 'zod'
import type { applySlipBody, checkCreateBody, checkPhotosBody, checkListQuery, checkReviewBody, SeedDropCheckBody, SpacingCheckBody, StandCountCheckBody } from '#shared/schemas/checks'
import { CHECK_REVIEWER_ROLES, type CheckResults, type SeedDropResults, type SpacingResults, type StandCountResults } from '#shared/types/checks'
import type { SetupConfig, SetupResults } from '#shared/types/setup'
import type { Member } from '../utils/membership'
import { solvePlanter } from './equipment'
import { getRevision } from './setups'
import { MAX_PHOTOS_PER_RECORD } from '#shared/utils/upload-limits'

const { fieldChecks, setups, planters, users, fields, cropPlans, seedLots } = schema

interface RevisionRef { setupId: number, revision: number, planterId: number, config: SetupConfig, results: SetupResults }

interface PlanRef { planId: number | null, fieldId: number | null, targetStand: number | null, targetSeedsPerAcre: number | null }

// The field and crop plan a check was taken on, both of this farm; the plan gives the targets:
// seeding rate = target stand ÷ (germination × survival), from the plan and its seed lot.
async function planFor(member: Member, planId: number | undefined, fieldId: number | undefined): Promise<PlanRef> {
  if (planId !== undefined) {
    const [plan] = await useDb().select({ plan: cropPlans, germinationPercent: seedLots.germinationPercent }).from(cropPlans)
      .leftJoin(seedLots, eq(seedLots.id, cropPlans.seedLotId))
      .where(and(eq(cropPlans.id, planId), eq(cropPlans.farmId, member.farmId)))
    if (!plan) badRequest('Choose one of this farm\'s crop plans', { planId: 'Unknown crop plan' })
    if (fieldId !== undefined && fieldId !== plan.plan.fieldId) badRequest('The crop plan is for another field', { fieldId: 'This is not the plan\'s field' })
    const targetSeedsPerAcre = seedingRateForStand({ targetStand: plan.plan.targetStand, germinationPercent: plan.germinationPercent ?? 100, survivalPercent: plan.plan.survivalPercent }).seedsPerAcre
    return { planId, fieldId: plan.plan.fieldId, targetStand: plan.plan.targetStand, targetSeedsPerAcre }
  }
  if (fieldId !== undefined) {
    const [field] = await useDb().select({ id: fields.id }).from(fields).where(and(eq(fields.id, fieldId), eq(fields.farmId, member.farmId)))
    if (!field) badRequest('Choose one of this farm\'s fields', { fieldId: 'Unknown field' })
  }
  return { planId: null, fieldId: fieldId ?? null, targetStand: null, targetSeedsPerAcre: null }
}

const pct = (a: Decimal.Value, b: Decimal.Value) => new Decimal(a).div(b).minus(1).mul(100).toNumber()

async function revisionFor(member: Member, setupId: number | undefined, revision: number | undefined): Promise<RevisionRef | null> {
  if (setupId === undefined) {
    if (revision !== undefined) badRequest('A setup revision needs its setup', { setupId: 'Choose the setup' })
    return null
  }
  const row = await getRevision(member.farmId, setupId, revision).catch(() => badRequest('Choose one of this farm\'s setups and one of its revisions', revision ? { setupRevision: `The setup has no revision ${revision}` } : { setupId: 'Unknown setup' }))
  return { setupId, revision: row.rev.revision, planterId: row.setup.planterId, config: row.rev.config, results: row.rev.results }
}

// Seeds per acre on each row and for the planter; the error against the setup revision and the
// target; the slip the count implies; and the solver's choice that lands on the target once the
// difference found is allowed for.
async function seedDropResults(member: Member, body: SeedDropCheckBody, rev: RevisionRef, plan: PlanRef): Promise<SeedDropResults> {
  const rowSpacingIn = body.rowSpacingIn ?? rev.config.rowSpacingIn
  const target = plan.targetSeedsPerAcre ?? rev.config.targetSeedsPerAcre
  const [planter] = await useDb().select({ slipPercent: planters.slipPercent }).from(planters).where(and(eq(planters.id, rev.planterId), eq(planters.farmId, member.farmId)))
  // Compared with the sections of the rows counted, not the planter's mean: with sections at
  // different rates the mean would read as slip.
  const setupSeedsPerAcre = seedsPerAcreOnRows(rev.config, rev.results, body.rows.map((r) => r.row))
  const s = seedDropSummary({
    rows: body.rows, lengthFt: body.lengthFt, wheelRevolutions: body.wheelRevolutions, rowSpacingIn, wheelCircumferenceIn: rev.config.wheelCircumferenceIn,
    setupSeedsPerAcre, setupSlipPercent: rev.config.slipPercent, targetSeedsPerAcre: target, planterSlipPercent: planter?.slipPercent ?? rev.config.slipPercent,
  })
  const fix: SeedDropResults['fix'] = { solverTargetSeedsPerAcre: s.solverTargetSeedsPerAcre, choices: [], message: null }
  if (!s.solverTargetSeedsPerAcre) fix.message = 'No seed was counted, so no corrected choice can be worked out. Check that the meters turn and the hoppers feed.'
  else {
    const sectionId = rev.config.sections.find((sec) => sec.rows.includes(body.rows[0]!.row))?.sectionId ?? undefined
    try {
      const solved = await solvePlanter(member, rev.planterId, {
        targetSeedsPerAcre: Math.min(s.solverTargetSeedsPerAcre, 2_000_000), rowSpacingIn, sectionId, crop: rev.config.crop as never, limit: 3,
      })
      fix.choices = solved.choices
      if (!solved.choices.length) fix.message = 'The solver found no plate and sprockets on hand for this rate.'
    } catch (err) {
      fix.message = `The solver could not suggest a choice: ${(err as { message?: string }).message ?? 'unknown reason'}`
    }
  }
  const { solverTargetSeedsPerAcre: _t, ...summary } = s
  return {
    ...summary, rowSpacingIn,
    setupSeedsPerAcre,
    targetSeedsPerAcre: target,
    targetFrom: plan.targetSeedsPerAcre ? 'plan' : 'setup',
    setupSlipPercent: rev.config.slipPercent,
    fix,
  }
}

async function standCountResults(member: Member, body: StandCountCheckBody, rev: RevisionRef | null, plan: PlanRef): Promise<StandCountResults> {
  const rowSpacingIn = body.rowSpacingIn ?? rev?.config.rowSpacingIn
  if (rowSpacingIn === undefined) badRequest('Give the row spacing or choose the setup', { rowSpacingIn: 'Give the row spacing' })
  const summary = standCountSummary({ counts: body.counts, lengthFt: body.lengthFt, rowSpacingIn })
  const targetStand = body.targetStand ?? plan.targetStand
  // The seed dropped: the latest seed-drop check on this setup revision, else its computed rate.
  let seedsDroppedPerAcre: number | null = null
  let seedsDroppedFrom: string | null = null
  if (rev) {
    const [drop] = await useDb().select({ id: fieldChecks.id, results: fieldChecks.results }).from(fieldChecks)
      .where(and(eq(fieldChecks.farmId, member.farmId), eq(fieldChecks.kind, 'seed-drop'), eq(fieldChecks.setupId, rev.setupId), eq(fieldChecks.setupRevision, rev.revision)))
      .orderBy(desc(fieldChecks.id)).limit(1)
    if (drop) {
      seedsDroppedPerAcre = seedsOnGroundPerAcre(drop.results as SeedDropResults)
      seedsDroppedFrom = `seed-drop check ${drop.id}`
    } else {
      seedsDroppedPerAcre = rev.results.seedsPerAcre
      seedsDroppedFrom = `setup revision ${rev.revision}`
    }
  }
  return {
    ...summary, lengthFt: body.lengthFt, rowSpacingIn, targetStand,
    targetFrom: body.targetStand !== undefined ? 'entered' : plan.targetStand !== null ? 'plan' : null,
    errorVsTargetPercent: targetStand ? pct(summary.meanPerAcre, targetStand) : null,
    seedsDroppedPerAcre, seedsDroppedFrom,
    survivalPercent: seedsDroppedPerAcre ? new Decimal(summary.meanPerAcre).div(seedsDroppedPerAcre).mul(100).toNumber() : null,
  }
}

async function spacingValues(member: Member, body: SpacingCheckBody): Promise<number[]> {
  if (body.spacingsIn) return body.spacingsIn
  const file = await readUpload(member.farmId, body.csvUploadId!).catch(() => badRequest('Choose a CSV file this farm uploaded', { csvUploadId: 'Unknown file' }))
  if (file.upload.contentType !== 'text/csv') badRequest('The file is not a CSV or text file', { csvUploadId: 'Not a CSV file' })
  const parsed = parseSpacingCsv(file.bytes.toString('utf8').replace(/^\uFEFF/, ''), body.csvColumn)
  if (parsed.errors.length) {
    const listed = parsed.errors.slice(0, 20).map((e) => `line ${e.line}: ${e.message}`).join('; ')
    throw createError({ statusCode: 400, message: `The CSV has ${parsed.errors.length} line(s) Rowbench cannot read: ${listed}`, data: { fields: { csvUploadId: listed }, lines: parsed.errors.slice(0, 200) } })
  }
  if (!parsed.values.length) badRequest('The CSV holds no spacings', { csvUploadId: 'No spacings in the file' })
  if (parsed.values.length > 100_000) badRequest('The CSV holds more than 100,000 spacings', { csvUploadId: 'Give at most 100,000 spacings' })
  return parsed.values
}

async function spacingResults(member: Member, body: SpacingCheckBody, rev: RevisionRef | null): Promise<{ results: SpacingResults, spacingsIn: number[] }> {
  const theoreticalIn = body.theoreticalIn ?? rev?.results.seedSpacingIn
  if (!theoreticalIn) badRequest('Give the theoretical spacing or choose the setup', { theoreticalIn: 'Give the theoretical spacing' })
  const spacingsIn = await spacingValues(member, body)
  const q = spacingQuality({ spacingsIn, theoreticalIn })
  return {
    spacingsIn,
    results: {
      ...q, theoreticalIn,
      histogram: spacingHistogram({ spacingsIn, theoreticalIn }),
      cornYieldLossBuPerAcre: rev?.config.crop === 'corn' ? cornYieldLossFromSpacingSd({ spacingSdIn: q.sdIn }).buPerAcre : null,
    },
  }
}

export async function createCheck(member: Member, body: z.infer<typeof checkCreateBody>) {
  const rev = await revisionFor(member, body.setupId, body.setupRevision)
  const plan = await planFor(member, body.planId, body.fieldId)
  let results: CheckResults
  let inputs: Record<string, unknown> = { ...body }
  let rows: number[] = []
  if (body.kind === 'seed-drop') {
    results = await seedDropResults(member, body, rev!, plan)
    rows = body.rows.map((r) => r.row)
  } else if (body.kind === 'stand-count') {
    results = await standCountResults(member, body, rev, plan)
    rows = body.rows ?? []
  } else {
    const s = await spacingResults(member, body, rev)
    results = s.results
    inputs = { ...body, spacingsIn: s.spacingsIn }
    rows = body.row ? [body.row] : []
  }
  return useDb().transaction(async (tx) => {
    await assertFarmUploads(tx, member.farmId, body.photoUploadIds ?? [], PHOTO_TYPES)
    // Read above; locked here so the orphan sweep cannot take it before the check names it.
    if (body.kind === 'spacing' && body.csvUploadId) await assertFarmUploads(tx, member.farmId, [body.csvUploadId], ['text/csv'], 'csvUploadId')
    const [check] = await tx.insert(fieldChecks).values({
      farmId: member.farmId, kind: body.kind, fieldId: plan.fieldId, planId: plan.planId,
      setupId: rev?.setupId ?? null, setupRevision: rev?.revision ?? null, rows,
      checkedOn: body.checkedOn ?? new Date().toISOString().slice(0, 10), authorId: member.user.id,
      inputs, results, csvUploadId: body.kind === 'spacing' ? body.csvUploadId ?? null : null,
      photoUploadIds: [...new Set(body.photoUploadIds ?? [])], note: body.note || null,
    }).returning()
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'create', entity: 'field_check', entityId: check!.id, after: { ...check!, inputs: undefined } })
    return check!
  })
}

const author = alias(users, 'author')
const reviewer = alias(users, 'reviewer')

const listColumns = {
  id: fieldChecks.id, kind: fieldChecks.kind, fieldId: fieldChecks.fieldId, fieldName: fields.name, planId: fieldChecks.planId,
  setupId: fieldChecks.setupId, setupRevision: fieldChecks.setupRevision, setupName: setups.name, rows: fieldChecks.rows,
  checkedOn: fieldChecks.checkedOn, authorName: author.name, results: fieldChecks.results, note: fieldChecks.note,
  reviewStatus: fieldChecks.reviewStatus, reviewComment: fieldChecks.reviewComment, reviewerName: reviewer.name, reviewedAt: fieldChecks.reviewedAt,
  photoUploadIds: fieldChecks.photoUploadIds, csvUploadId: fieldChecks.csvUploadId,
  slipAppliedPercent: fieldChecks.slipAppliedPercent, slipAppliedAt: fieldChecks.slipAppliedAt, createdAt: fieldChecks.createdAt,
}

export async function listChecks(farmId: number, q: z.infer<typeof checkListQuery>) {
  const where = [eq(fieldChecks.farmId, farmId)]
  if (q.kind) where.push(eq(fieldChecks.kind, q.kind))
  if (q.setupId) where.push(eq(fieldChecks.setupId, q.setupId))
  if (q.fieldId) where.push(eq(fieldChecks.fieldId, q.fieldId))
  if (q.planId) where.push(eq(fieldChecks.planId, q.planId))
  if (q.reviewStatus) where.push(eq(fieldChecks.reviewStatus, q.reviewStatus))
  if (q.after) where.push(lt(fieldChecks.id, q.after))
  const rows = await useDb().select(listColumns).from(fieldChecks)
    .leftJoin(setups, eq(setups.id, fieldChecks.setupId))
    .leftJoin(fields, eq(fields.id, fieldChecks.fieldId))
    .leftJoin(author, eq(author.id, fieldChecks.authorId))
    .leftJoin(reviewer, eq(reviewer.id, fieldChecks.reviewedBy))
    .where(and(...where)).orderBy(desc(fieldChecks.id)).limit(q.limit + 1)
  const more = rows.length > q.limit
  const items = more ? rows.slice(0, q.limit) : rows
  return { items, nextAfter: more ? items[items.length - 1]!.id : null }
}

export async function getCheck(farmId: number, id: number) {
  const [row] = await useDb().select({ ...listColumns, authorId: fieldChecks.authorId, inputs: fieldChecks.inputs, planterId: setups.planterId, planterName: planters.name, planterSlipPercent: planters.slipPercent, planterConfigVersion: planters.configVersion })
    .from(fieldChecks)
    .leftJoin(setups, eq(setups.id, fieldChecks.setupId))
    .leftJoin(planters, eq(planters.id, setups.planterId))
    .leftJoin(fields, eq(fields.id, fieldChecks.fieldId))
    .leftJoin(author, eq(author.id, fieldChecks.authorId))
    .leftJoin(reviewer, eq(reviewer.id, fieldChecks.reviewedBy))
    .where(and(eq(fieldChecks.id, id), eq(fieldChecks.farmId, farmId)))
  if (!row) notFound('Check')
  return row
}

export async function reviewCheck(member: Member, id: number, body: z.infer<typeof checkReviewBody>) {
  return useDb().transaction(async (tx) => {
    const [before] = await tx.select({ reviewStatus: fieldChecks.reviewStatus, reviewComment: fieldChecks.reviewComment }).from(fieldChecks)
      .where(and(eq(fieldChecks.id, id), eq(fieldChecks.farmId, member.farmId))).for('update')
    if (!before) notFound('Check')
    const [after] = await tx.update(fieldChecks).set({ reviewStatus: body.status, reviewComment: body.comment || null, reviewedBy: member.user.id, reviewedAt: new Date() })
      .where(eq(fieldChecks.id, id)).returning({ id: fieldChecks.id, reviewStatus: fieldChecks.reviewStatus, reviewComment: fieldChecks.reviewComment, reviewedAt: fieldChecks.reviewedAt })
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'review', entity: 'field_check', entityId: id, before, after })
    return { ...after!, reviewerName: member.user.name }
  })
}

// Stores the slip a seed-drop check implies on the planter of its setup, and records on the check
// (and in the planter's audit entry) that it came from there.
export async function applyCheckSlip(member: Member, id: number, body: z.infer<typeof applySlipBody>) {
  return useDb().transaction(async (tx) => {
    const [check] = await tx.select().from(fieldChecks).where(and(eq(fieldChecks.id, id), eq(fieldChecks.farmId, member.farmId))).for('update')
    if (!check) notFound('Check')
    const results = check.results as SeedDropResults
    if (check.kind !== 'seed-drop' || !results.slipStorable || results.impliedSlipPercent === null) {
      throw createError({ statusCode: 409, message: 'This check implies no drive slip that can be stored (only a seed-drop check over a measured length, with a slip from 0 to 50 %).' })
    }
    if (check.slipAppliedAt) throw createError({ statusCode: 409, message: 'The slip from this check is already stored on the planter.' })
    const [setup] = check.setupId ? await tx.select({ planterId: setups.planterId }).from(setups).where(eq(setups.id, check.setupId)) : []
    const [before] = setup ? await tx.select().from(planters).where(and(eq(planters.id, setup.planterId), eq(planters.farmId, member.farmId))).for('update') : []
    if (!before) throw createError({ statusCode: 409, message: 'The planter of this check\'s setup no longer exists.' })
    if (body.configVersion !== undefined && body.configVersion !== before.configVersion) {
      throw createError({ statusCode: 409, message: 'Someone else changed this planter since you opened it. Reload to see their changes.' })
    }
    const slipPercent = new Decimal(results.impliedSlipPercent).toDecimalPlaces(2).toNumber() || 0
    const [after] = await tx.update(planters).set({ slipPercent, configVersion: sql`${planters.configVersion} + 1` }).where(eq(planters.id, before.id)).returning()
    await tx.update(fieldChecks).set({ slipAppliedPercent: slipPercent, slipAppliedPlanterId: before.id, slipAppliedBy: member.user.id, slipAppliedAt: new Date() }).where(eq(fieldChecks.id, id))
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'update', entity: 'planter', entityId: before.id, before: { slipPercent: before.slipPercent }, after: { slipPercent, fromCheckId: id } })
    return { planterId: before.id, slipPercent: after!.slipPercent, configVersion: after!.configVersion, fromCheckId: id }
  })
}

// Adds photos to a check already taken: its author, the owner or an agronomist; ids already on the
// check are kept once.
export async function addCheckPhotos(member: Member, id: number, body: z.infer<typeof checkPhotosBody>) {
  return useDb().transaction(async (tx) => {
    const [check] = await tx.select({ authorId: fieldChecks.authorId, photoUploadIds: fieldChecks.photoUploadIds }).from(fieldChecks)
      .where(and(eq(fieldChecks.id, id), eq(fieldChecks.farmId, member.farmId))).for('update')
    if (!check) notFound('Check')
    const reviewer = (CHECK_REVIEWER_ROLES as readonly string[]).includes(member.role)
    if (!reviewer && check.authorId !== member.user.id) throw createError({ statusCode: 403, message: 'Only the author of the check, the owner or an agronomist can add photos to it' })
    await assertFarmUploads(tx, member.farmId, body.uploadIds, PHOTO_TYPES, 'uploadIds')
    const photoUploadIds = [...new Set([...check.photoUploadIds, ...body.uploadIds])]
    if (photoUploadIds.length > MAX_PHOTOS_PER_RECORD) {
      badRequest(`A check keeps at most ${MAX_PHOTOS_PER_RECORD} photos`, { uploadIds: `This check has ${check.photoUploadIds.length}; add at most ${MAX_PHOTOS_PER_RECORD - check.photoUploadIds.length}` })
    }
    await tx.update(fieldChecks).set({ photoUploadIds }).where(eq(fieldChecks.id, id))
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'add-photos', entity: 'field_check', entityId: id, before: { photoUploadIds: check.photoUploadIds }, after: { photoUploadIds } })
    return { id, photoUploadIds }
  })
}
