import { and, asc, desc, eq, inArray, or, type SQL } from 'drizzle-orm'
import { alias } from 'drizzle-orm/pg-core'
import type { z } from 'zod'
import { PLAN_STATUS_LABELS, type PlanBody, type PlanPatch, type PlanStatus, type TransitionBody, type planListQuery } from '#shared/schemas/plans'
import { PLAN_NEXT, PLAN_STATUS_ROLES } from '#shared/utils/plan-workflow'
import { planCapacity, planHopper, planSeed, summariseSeason, type SeasonPlan } from '#shared/utils/season'
import { ROLE_LABELS } from '#shared/types/roles'
import type { Member } from '../utils/membership'
import type { Tx } from '../utils/db'
import { solvePlanter } from './equipment'

const { cropPlans, planEvents, planComments, fields, seedLots, planters, setups, setupRevisions, users, memberships } = schema
const proposer = alias(users, 'proposer')
const approver = alias(users, 'approver')

export type PlanRow = Awaited<ReturnType<typeof selectPlans>>[number]

function selectPlans(db: Tx | ReturnType<typeof useDb>, where: SQL | undefined) {
  return db.select({
    plan: cropPlans,
    fieldName: fields.name,
    fieldAcres: fields.acres,
    lot: seedLots,
    planter: { id: planters.id, name: planters.name, rowCount: planters.rowCount, rowSpacingIn: planters.rowSpacingIn, seedHopperLb: planters.seedHopperLb },
    setup: { id: setups.id, name: setups.name, crop: setups.crop, planterId: setups.planterId, latestRevision: setups.latestRevision },
    proposerName: proposer.name,
    approverName: approver.name,
  })
    .from(cropPlans)
    .innerJoin(fields, eq(fields.id, cropPlans.fieldId))
    .leftJoin(seedLots, eq(seedLots.id, cropPlans.seedLotId))
    .leftJoin(planters, eq(planters.id, cropPlans.planterId))
    .leftJoin(setups, eq(setups.id, cropPlans.setupId))
    .leftJoin(proposer, eq(proposer.id, cropPlans.proposedBy))
    .leftJoin(approver, eq(approver.id, cropPlans.approvedBy))
    .where(where)
    .orderBy(asc(cropPlans.sortOrder), asc(cropPlans.windowStart), asc(cropPlans.id))
}

function asSeasonPlan(r: PlanRow): SeasonPlan {
  const p = r.plan
  return {
    id: p.id, fieldName: r.fieldName, acres: r.fieldAcres, crop: p.crop, status: p.status, targetStand: p.targetStand, survivalPercent: p.survivalPercent,
    marginPercent: p.marginPercent, speedMph: p.speedMph, rowSpacingIn: p.rowSpacingIn, windowStart: p.windowStart, sortOrder: p.sortOrder,
    lot: r.lot ? { id: r.lot.id, lotNumber: r.lot.lotNumber, variety: r.lot.variety, crop: r.lot.crop, seedsPerLb: r.lot.seedsPerLb, germinationPercent: r.lot.germinationPercent, unitKind: r.lot.unitKind, unitSize: r.lot.unitSize, unitsOnHand: r.lot.unitsOnHand } : null,
    planter: r.planter?.id ? { id: r.planter.id, name: r.planter.name, rowCount: r.planter.rowCount, rowSpacingIn: r.planter.rowSpacingIn, seedHopperLb: r.planter.seedHopperLb } : null,
  }
}

// A plan as the API shows it: its own columns, the names it points at and what it computes to.
function present(r: PlanRow) {
  const sp = asSeasonPlan(r)
  const seed = planSeed(sp)
  return {
    ...r.plan,
    fieldName: r.fieldName,
    fieldAcres: r.fieldAcres,
    lot: sp.lot,
    planterName: r.planter?.name ?? null,
    setupName: r.setup?.name ?? null,
    setupLatestRevision: r.setup?.latestRevision ?? null,
    proposerName: r.proposerName,
    approverName: r.approverName,
    setupChangedSinceApproval: r.plan.approvedRevision != null && r.setup?.latestRevision != null && r.setup.latestRevision !== r.plan.approvedRevision,
    seed,
  }
}

export async function listPlans(farmId: number, q: z.infer<typeof planListQuery>) {
  const where = [eq(cropPlans.farmId, farmId)]
  if (q.season) where.push(eq(cropPlans.season, q.season))
  if (q.status) where.push(eq(cropPlans.status, q.status))
  if (q.fieldId) where.push(eq(cropPlans.fieldId, q.fieldId))
  if (q.planterId) where.push(eq(cropPlans.planterId, q.planterId))
  const rows = await selectPlans(useDb(), and(...where))
  return { items: rows.map(present) }
}

async function planRow(db: Tx | ReturnType<typeof useDb>, farmId: number, id: number) {
  const [row] = await selectPlans(db, and(eq(cropPlans.id, id), eq(cropPlans.farmId, farmId)))
  if (!row) notFound('Plan')
  return row
}

// Setup recommended by the solver for the plan's planter at the plan's seeding rate.
async function recommend(member: Member, r: PlanRow, seedsPerAcre: number) {
  if (!r.planter?.id) return { choices: [], message: 'Choose a planter for this plan to get a recommended setup' }
  try {
    const solved = await solvePlanter(member, r.planter.id, { targetSeedsPerAcre: seedsPerAcre, rowSpacingIn: r.plan.rowSpacingIn, crop: r.plan.crop as never, limit: 3 })
    return { choices: solved.choices, message: solved.choices.length ? null : 'No plate and sprocket choice on hand comes near this rate' }
  } catch (err) {
    const e = err as { statusCode?: number, message?: string }
    if (e.statusCode && e.statusCode < 500) return { choices: [], message: e.message ?? 'No recommendation' }
    throw err
  }
}

export async function getPlan(member: Member, id: number, opts: { recommend?: boolean } = {}) {
  const db = useDb()
  const r = await planRow(db, member.farmId, id)
  const plan = present(r)
  const sp = asSeasonPlan(r)
  const events = await db.select({ event: planEvents, userName: users.name }).from(planEvents)
    .leftJoin(users, eq(users.id, planEvents.userId))
    .where(eq(planEvents.planId, id)).orderBy(asc(planEvents.createdAt), asc(planEvents.id))
  const revisions = r.setup?.id
    ? await db.select({ revision: setupRevisions.revision, savedAt: setupRevisions.savedAt, note: setupRevisions.note, results: setupRevisions.results, savedByName: users.name })
      .from(setupRevisions).leftJoin(users, eq(users.id, setupRevisions.savedBy))
      .where(eq(setupRevisions.setupId, r.setup.id)).orderBy(desc(setupRevisions.revision))
    : []
  return {
    ...plan,
    hopper: planHopper(sp, plan.seed.seedsPerAcre),
    capacity: planCapacity(sp, { hoursPerDay: 10, efficiencyPercent: 65 }),
    setupRevisions: revisions.map((v) => ({ revision: v.revision, savedAt: v.savedAt, note: v.note, savedByName: v.savedByName, seedsPerAcre: v.results.seedsPerAcre, errorPercent: v.results.errorPercent })),
    events: events.map((e) => ({ ...e.event, userName: e.userName })),
    recommendation: opts.recommend ? await recommend(member, r, plan.seed.seedsPerAcre) : null,
  }
}

// Field, lot and planter must be this farm's, and the lot of the plan's crop.
async function checkRefs(tx: Tx, farmId: number, next: { fieldId: number, crop: string, seedLotId: number | null, planterId: number | null }) {
  const problems: Record<string, string> = {}
  const [field] = await tx.select({ id: fields.id }).from(fields).where(and(eq(fields.id, next.fieldId), eq(fields.farmId, farmId)))
  if (!field) problems.fieldId = 'Choose one of this farm\'s fields'
  if (next.seedLotId) {
    const [lot] = await tx.select({ crop: seedLots.crop }).from(seedLots).where(and(eq(seedLots.id, next.seedLotId), eq(seedLots.farmId, farmId)))
    if (!lot) problems.seedLotId = 'Choose one of this farm\'s seed lots'
    else if (lot.crop !== next.crop) problems.seedLotId = `This lot is ${lot.crop} seed; the plan is for ${next.crop}`
  }
  if (next.planterId) {
    const [p] = await tx.select({ id: planters.id }).from(planters).where(and(eq(planters.id, next.planterId), eq(planters.farmId, farmId)))
    if (!p) problems.planterId = 'Choose one of this farm\'s planters'
  }
  if (Object.keys(problems).length) badRequest('Some fields need attention', problems)
}

export async function createPlan(member: Member, body: PlanBody) {
  return useDb().transaction(async (tx) => {
    await checkRefs(tx, member.farmId, { fieldId: body.fieldId, crop: body.crop, seedLotId: body.seedLotId ?? null, planterId: body.planterId ?? null })
    const [plan] = await tx.insert(cropPlans).values({ ...body, farmId: member.farmId, createdBy: member.user.id }).returning()
    await tx.insert(planEvents).values({ planId: plan!.id, fromStatus: null, toStatus: 'draft', comment: 'Plan created', userId: member.user.id })
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'create', entity: 'crop-plan', entityId: plan!.id, after: plan })
    return plan!
  })
}

// Changes that alter what the setup has to deliver; after approval they send the plan back to review.
const AGRONOMIC: (keyof PlanPatch)[] = ['crop', 'seedLotId', 'targetStand', 'survivalPercent', 'rowSpacingIn', 'planterId']

export async function updatePlan(member: Member, id: number, patch: PlanPatch) {
  if (!Object.values(patch).some((v) => v !== undefined)) badRequest('There is nothing to change', { _: 'Change at least one field' })
  const updated = await useDb().transaction(async (tx) => {
    const [plan] = await tx.select().from(cropPlans).where(and(eq(cropPlans.id, id), eq(cropPlans.farmId, member.farmId))).for('update')
    if (!plan) notFound('Plan')
    if (plan.status === 'planted') throw createError({ statusCode: 409, message: 'This field is planted; its plan is now the record of what was done and no longer changes' })
    const next = { ...plan, ...Object.fromEntries(Object.entries(patch).filter(([, v]) => v !== undefined)) } as typeof plan
    if (next.windowStart && next.windowEnd && next.windowStart > next.windowEnd) badRequest('Some fields need attention', { windowEnd: 'The planting window ends on or after the day it starts' })
    await checkRefs(tx, member.farmId, next)
    const changed = AGRONOMIC.some((k) => patch[k] !== undefined && patch[k] !== plan[k as keyof typeof plan])
    const reopen = changed && (plan.status === 'approved' || plan.status === 'set-up')
    const [row] = await tx.update(cropPlans).set({
      ...patch,
      ...(reopen ? { status: 'submitted' as const, approvedBy: null, approvedAt: null, approvedRevision: null } : {}),
      updatedAt: new Date(),
    }).where(eq(cropPlans.id, id)).returning()
    if (reopen) {
      await recordTransition(tx, member, plan, 'submitted', 'The plan changed after approval; the setup needs another look', null)
    }
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'update', entity: 'crop-plan', entityId: id, before: plan, after: row })
    return row!
  })
  void flushOutbox()
  return updated
}

export async function deletePlan(member: Member, id: number) {
  return useDb().transaction(async (tx) => {
    const [plan] = await tx.select().from(cropPlans).where(and(eq(cropPlans.id, id), eq(cropPlans.farmId, member.farmId))).for('update')
    if (!plan) notFound('Plan')
    if (plan.status === 'planted') throw createError({ statusCode: 409, message: 'This field is planted; its plan is the record of what was done and stays' })
    await tx.delete(cropPlans).where(eq(cropPlans.id, id))
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'delete', entity: 'crop-plan', entityId: id, before: plan })
    return { deleted: id }
  })
}

type PlanRecord = typeof cropPlans.$inferSelect

// People to tell about a plan: its proposer, the farm's agronomists and owners, not the one acting.
async function concerned(tx: Tx, farmId: number, proposedBy: number | null, actorId: number) {
  const rows = await tx.selectDistinct({ id: users.id, email: users.email, name: users.name }).from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.farmId, farmId), or(inArray(memberships.role, ['agronomist', 'owner']), proposedBy ? eq(users.id, proposedBy) : undefined)))
  return rows.filter((u) => u.id !== actorId)
}

// Stores the event and queues its e-mails in the caller's transaction.
async function recordTransition(tx: Tx, member: Member, plan: PlanRecord, to: PlanStatus, comment: string | null, setupRevision: number | null, proposedBy = plan.proposedBy) {
  await tx.insert(planEvents).values({ planId: plan.id, fromStatus: plan.status, toStatus: to, setupRevision, comment, userId: member.user.id })
  const [field] = await tx.select({ name: fields.name }).from(fields).where(eq(fields.id, plan.fieldId))
  const people = await concerned(tx, member.farmId, proposedBy, member.user.id)
  const what = `${field?.name ?? 'A field'} (${plan.crop}, ${plan.season})`
  await queueMail(people.map((u) => ({
    farmId: member.farmId,
    to: u.email,
    subject: `Crop plan ${what}: ${PLAN_STATUS_LABELS[to].toLowerCase()}`,
    text: `Hello ${u.name},\n\n${member.user.name} moved the crop plan for ${what} from "${PLAN_STATUS_LABELS[plan.status]}" to "${PLAN_STATUS_LABELS[to]}"${setupRevision ? ` (setup revision ${setupRevision})` : ''}.\n${comment ? `\n“${comment}”\n` : ''}\nOpen the plan: ${appUrl(`/plans/${plan.id}`)}\n`,
  })), tx)
}

function roleNames(roles: readonly string[]) {
  return roles.map((r) => ROLE_LABELS[r as keyof typeof ROLE_LABELS].toLowerCase()).join(' or ')
}

export async function transitionPlan(member: Member, id: number, body: TransitionBody) {
  const roles = PLAN_STATUS_ROLES[body.to]
  if (!roles.includes(member.role)) {
    throw createError({ statusCode: 403, message: roles.length ? `Only the ${roleNames(roles)} can move a plan to "${PLAN_STATUS_LABELS[body.to]}"` : `A plan cannot be moved back to "${PLAN_STATUS_LABELS[body.to]}"` })
  }
  await useDb().transaction(async (tx) => {
    const [plan] = await tx.select().from(cropPlans).where(and(eq(cropPlans.id, id), eq(cropPlans.farmId, member.farmId))).for('update')
    if (!plan) notFound('Plan')
    const next = PLAN_NEXT[plan.status]
    if (!next.includes(body.to)) {
      throw createError({ statusCode: 409, message: `This plan is "${PLAN_STATUS_LABELS[plan.status]}"; from there it ${next.length ? `can go to ${next.map((s) => `"${PLAN_STATUS_LABELS[s]}"`).join(' or ')}` : 'goes no further'}, not to "${PLAN_STATUS_LABELS[body.to]}"` })
    }
    let set: Partial<PlanRecord> = {}
    let revision: number | null = null
    let proposedBy = plan.proposedBy
    const latestOf = async (setupId: number | null) => {
      if (!setupId) return null
      const [s] = await tx.select().from(setups).where(and(eq(setups.id, setupId), eq(setups.farmId, member.farmId)))
      return s ?? null
    }
    if (body.to === 'submitted') {
      const setup = await latestOf(body.setupId ?? plan.setupId)
      if (!setup) badRequest('Choose the setup you propose for this plan', { setupId: body.setupId ? 'Choose one of this farm\'s setups' : 'Choose the setup you propose' })
      if (plan.planterId && setup.planterId !== plan.planterId) badRequest('This setup is for another planter', { setupId: 'This setup is for another planter than the plan\'s' })
      if (setup.crop !== plan.crop) badRequest(`This setup is for ${setup.crop}; the plan is for ${plan.crop}`, { setupId: `This setup is for ${setup.crop}` })
      proposedBy = member.user.id
      revision = setup.latestRevision
      set = { setupId: setup.id, planterId: setup.planterId, proposedBy, approvedRevision: null, approvedBy: null, approvedAt: null }
    } else if (body.to === 'approved') {
      if (plan.proposedBy === member.user.id) {
        throw createError({ statusCode: 403, message: 'You proposed this setup, so someone else approves it: another agronomist or the owner' })
      }
      const setup = await latestOf(plan.setupId)
      if (!setup) throw createError({ statusCode: 409, message: 'The proposed setup no longer exists; ask for changes instead' })
      // The plan may have changed planter or crop since the proposal (an edit reopens it).
      if ((plan.planterId && setup.planterId !== plan.planterId) || setup.crop !== plan.crop) {
        throw createError({ statusCode: 409, message: 'The proposed setup is for another planter or crop than the plan now has; ask for changes so a matching setup is proposed' })
      }
      if (body.setupRevision !== undefined && body.setupRevision !== setup.latestRevision) {
        throw createError({ statusCode: 409, message: `Revision ${setup.latestRevision} of the setup was saved after the revision ${body.setupRevision} you reviewed; look at it before approving` })
      }
      revision = setup.latestRevision
      set = { approvedRevision: revision, approvedBy: member.user.id, approvedAt: new Date() }
    } else if (body.to === 'changes-requested') {
      if (!body.comment) badRequest('Say what should change', { comment: 'Say what should change' })
      set = { approvedRevision: null, approvedBy: null, approvedAt: null }
    } else if (body.to === 'set-up') {
      const setup = await latestOf(plan.setupId)
      if (!setup || setup.latestRevision !== plan.approvedRevision) throw createError({ statusCode: 409, message: 'The setup changed after approval; it needs another review first' })
      revision = plan.approvedRevision
    } else if (body.to === 'planted') {
      const [field] = await tx.select({ acres: fields.acres }).from(fields).where(eq(fields.id, plan.fieldId))
      set = { plantedOn: body.plantedOn ?? new Date().toISOString().slice(0, 10), plantedAcres: body.plantedAcres ?? field!.acres }
      revision = plan.approvedRevision
    }
    const [row] = await tx.update(cropPlans).set({ ...set, status: body.to, updatedAt: new Date() }).where(eq(cropPlans.id, id)).returning()
    await recordTransition(tx, member, plan, body.to, body.comment ?? null, revision, proposedBy)
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'transition', entity: 'crop-plan', entityId: id, before: { status: plan.status }, after: { status: row!.status, setupId: row!.setupId, approvedRevision: row!.approvedRevision, comment: body.comment ?? null } })
  })
  void flushOutbox()
  return getPlan(member, id)
}

// A new revision of a setup that an approved (or set-up) plan relies on sends that plan back to review;
// a plan still waiting for review notes the revision in its history and tells its reviewers.
export async function setupRevised(tx: Tx, member: Member, setupId: number, revision: number) {
  const waiting = await tx.select({ plan: cropPlans, fieldName: fields.name }).from(cropPlans)
    .innerJoin(fields, eq(fields.id, cropPlans.fieldId))
    .where(and(eq(cropPlans.setupId, setupId), eq(cropPlans.farmId, member.farmId), eq(cropPlans.status, 'submitted')))
  for (const { plan, fieldName } of waiting) {
    await tx.insert(planEvents).values({ planId: plan.id, fromStatus: 'submitted', toStatus: 'submitted', setupRevision: revision, comment: `Revision ${revision} of the setup was saved while the plan waited for review`, userId: member.user.id })
    const what = `${fieldName} (${plan.crop}, ${plan.season})`
    const reviewers = (await concerned(tx, member.farmId, null, member.user.id))
    await queueMail(reviewers.map((u) => ({
      farmId: member.farmId,
      to: u.email,
      subject: `Crop plan ${what}: the setup waiting for review changed`,
      text: `Hello ${u.name},\n\n${member.user.name} saved revision ${revision} of the setup proposed for ${what} while it waited for your review. Look at revision ${revision} before approving.\n\nOpen the plan: ${appUrl(`/plans/${plan.id}`)}\n`,
    })), tx)
  }
  const affected = await tx.select().from(cropPlans)
    .where(and(eq(cropPlans.setupId, setupId), eq(cropPlans.farmId, member.farmId), inArray(cropPlans.status, ['approved', 'set-up']))).for('update')
  for (const plan of affected) {
    await tx.update(cropPlans).set({ status: 'submitted', proposedBy: member.user.id, approvedBy: null, approvedAt: null, approvedRevision: null, updatedAt: new Date() }).where(eq(cropPlans.id, plan.id))
    await recordTransition(tx, member, plan, 'submitted', `The setup changed after approval: revision ${revision} was saved`, revision, member.user.id)
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'reopen', entity: 'crop-plan', entityId: plan.id, before: { status: plan.status, approvedRevision: plan.approvedRevision }, after: { status: 'submitted', setupRevision: revision } })
  }
}

// Putting a setup's approved revision on the planter is the "planter set" step of the plans that
// approved it; a plan approved on another revision stays where it is.
export async function setupInstalled(tx: Tx, member: Member, setupId: number, revision: number) {
  const ready = await tx.select().from(cropPlans)
    .where(and(eq(cropPlans.setupId, setupId), eq(cropPlans.farmId, member.farmId), eq(cropPlans.status, 'approved'), eq(cropPlans.approvedRevision, revision))).for('update')
  for (const plan of ready) {
    await tx.update(cropPlans).set({ status: 'set-up', updatedAt: new Date() }).where(eq(cropPlans.id, plan.id))
    await recordTransition(tx, member, plan, 'set-up', `Revision ${revision} was installed on the planter`, revision)
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'transition', entity: 'crop-plan', entityId: plan.id, before: { status: plan.status }, after: { status: 'set-up', installedRevision: revision } })
  }
  return ready.map((p) => p.id)
}

export async function listComments(farmId: number, planId: number) {
  const db = useDb()
  await planRow(db, farmId, planId)
  const rows = await db.select({ comment: planComments, authorName: users.name }).from(planComments)
    .leftJoin(users, eq(users.id, planComments.userId))
    .where(eq(planComments.planId, planId)).orderBy(asc(planComments.createdAt), asc(planComments.id))
  return { items: rows.map((r) => ({ ...r.comment, authorName: r.authorName })) }
}

export async function addPlanComment(member: Member, planId: number, body: { body: string }) {
  const comment = await useDb().transaction(async (tx) => {
    const [plan] = await tx.select({ id: cropPlans.id, proposedBy: cropPlans.proposedBy, crop: cropPlans.crop, season: cropPlans.season, fieldName: fields.name }).from(cropPlans)
      .innerJoin(fields, eq(fields.id, cropPlans.fieldId))
      .where(and(eq(cropPlans.id, planId), eq(cropPlans.farmId, member.farmId)))
    if (!plan) notFound('Plan')
    const [c] = await tx.insert(planComments).values({ planId, userId: member.user.id, body: body.body }).returning()
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'comment', entity: 'crop-plan', entityId: planId, after: c })
    // The thread reaches those the plan concerns and everyone who has written in it, not the writer.
    const writers = await tx.selectDistinct({ id: users.id, email: users.email, name: users.name }).from(planComments)
      .innerJoin(users, eq(users.id, planComments.userId))
      .innerJoin(memberships, and(eq(memberships.userId, users.id), eq(memberships.farmId, member.farmId)))
      .where(eq(planComments.planId, planId))
    const people = new Map([...await concerned(tx, member.farmId, plan.proposedBy, member.user.id), ...writers].filter((u) => u.id !== member.user.id).map((u) => [u.id, u]))
    const what = `${plan.fieldName} (${plan.crop}, ${plan.season})`
    await queueMail([...people.values()].map((u) => ({
      farmId: member.farmId,
      to: u.email,
      subject: `Crop plan ${what}: a comment from ${member.user.name}`,
      text: `Hello ${u.name},\n\n${member.user.name} wrote on the crop plan for ${what}:\n\n“${body.body}”\n\nOpen the plan: ${appUrl(`/plans/${planId}`)}\n`,
    })), tx)
    return { ...c!, authorName: member.user.name }
  })
  void flushOutbox()
  return comment
}

export async function seasonSummary(farmId: number, season: number, opts: { hoursPerDay: number, efficiencyPercent: number }) {
  const rows = await selectPlans(useDb(), and(eq(cropPlans.farmId, farmId), eq(cropPlans.season, season)))
  return { season, ...opts, ...summariseSeason(rows.map(asSeasonPlan), opts) }
}
