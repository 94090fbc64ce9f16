import { and, asc, desc, eq, gte, inArray, isNull, ne, sql } from 'drizzle-orm'
import type { z } from 'zod'
import type { inspectionBody, inspectionItemPatch, serviceEventBody, templateBody, templatePatch, workItemPatch, workItemQuery } from '#shared/schemas/shop'
import type { Member } from '../utils/membership'
import type { Tx } from '../utils/db'

const { checklistTemplates, inspections, inspectionItems, workItems, serviceEvents, planters, users, cropPlans, fields, memberships } = schema

const RESULT_WORDS = { 'ok': 'ok', 'needs-fixing': 'needs fixing', 'replaced': 'replaced' } as const

// ── Checklist templates ────────────────────────────────────────────────────────────────────────
export async function listTemplates(farmId: number) {
  const rows = await useDb().select().from(checklistTemplates).where(and(eq(checklistTemplates.farmId, farmId), isNull(checklistTemplates.archivedAt))).orderBy(asc(checklistTemplates.name))
  return { items: rows, defaultItems: DEFAULT_CHECKLIST, defaultName: DEFAULT_CHECKLIST_NAME }
}

async function templateOfFarm(tx: Tx, farmId: number, id: number) {
  const [t] = await tx.select().from(checklistTemplates).where(and(eq(checklistTemplates.id, id), eq(checklistTemplates.farmId, farmId), isNull(checklistTemplates.archivedAt))).for('update')
  if (!t) notFound('Checklist')
  return t
}

export async function createTemplate(member: Member, body: z.infer<typeof templateBody>) {
  return useDb().transaction(async (tx) => {
    const [t] = await tx.insert(checklistTemplates).values({ farmId: member.farmId, name: body.name, items: body.items }).returning()
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'create', entity: 'checklist_template', entityId: t!.id, after: t })
    return t!
  })
}

export async function updateTemplate(member: Member, id: number, patch: z.infer<typeof templatePatch>) {
  return useDb().transaction(async (tx) => {
    const before = await templateOfFarm(tx, member.farmId, id)
    if (patch.name === undefined && patch.items === undefined) badRequest('There is nothing to change', { _: 'Change the name or the items' })
    const [after] = await tx.update(checklistTemplates).set(patch).where(eq(checklistTemplates.id, id)).returning()
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'update', entity: 'checklist_template', entityId: id, before, after })
    return after!
  })
}

// Inspections keep their own copy of the items, so retiring a list loses no record.
export async function archiveTemplate(member: Member, id: number) {
  return useDb().transaction(async (tx) => {
    const before = await templateOfFarm(tx, member.farmId, id)
    await tx.update(checklistTemplates).set({ archivedAt: new Date() }).where(eq(checklistTemplates.id, id))
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'archive', entity: 'checklist_template', entityId: id, before })
    return { archived: id }
  })
}

// ── Inspections ────────────────────────────────────────────────────────────────────────────────
export async function listInspections(farmId: number, planterId?: number) {
  const where = [eq(inspections.farmId, farmId)]
  if (planterId) where.push(eq(inspections.planterId, planterId))
  return useDb().select({
    id: inspections.id, planterId: inspections.planterId, planterName: planters.name, templateName: inspections.templateName, status: inspections.status,
    createdAt: inspections.createdAt, completedAt: inspections.completedAt, inspectedByName: users.name,
    total: sql<number>`(select count(*)::int from ${inspectionItems} where ${inspectionItems.inspectionId} = ${inspections.id})`,
    answered: sql<number>`(select count(*)::int from ${inspectionItems} where ${inspectionItems.inspectionId} = ${inspections.id} and ${inspectionItems.result} is not null)`,
    toFix: sql<number>`(select count(*)::int from ${inspectionItems} where ${inspectionItems.inspectionId} = ${inspections.id} and ${inspectionItems.result} = 'needs-fixing')`,
  }).from(inspections).innerJoin(planters, eq(planters.id, inspections.planterId)).leftJoin(users, eq(users.id, inspections.inspectedBy))
    .where(and(...where)).orderBy(desc(inspections.createdAt)).limit(100)
}

export async function getInspection(farmId: number, id: number, tx?: Tx) {
  const db = tx ?? useDb()
  const [row] = await db.select({ inspection: inspections, planterName: planters.name, inspectedByName: users.name }).from(inspections)
    .innerJoin(planters, eq(planters.id, inspections.planterId)).leftJoin(users, eq(users.id, inspections.inspectedBy))
    .where(and(eq(inspections.id, id), eq(inspections.farmId, farmId)))
  if (!row) notFound('Inspection')
  const items = await db.select().from(inspectionItems).where(eq(inspectionItems.inspectionId, id)).orderBy(asc(inspectionItems.position))
  return { ...row.inspection, planterName: row.planterName, inspectedByName: row.inspectedByName, items }
}

export async function startInspection(member: Member, body: z.infer<typeof inspectionBody>) {
  return useDb().transaction(async (tx) => {
    const [planter] = await tx.select().from(planters).where(and(eq(planters.id, body.planterId), eq(planters.farmId, member.farmId), isNull(planters.archivedAt)))
    if (!planter) badRequest('Choose one of this farm\'s planters', { planterId: 'Unknown planter' })
    let name = DEFAULT_CHECKLIST_NAME
    let items = DEFAULT_CHECKLIST
    if (body.templateId) {
      const [t] = await tx.select().from(checklistTemplates).where(and(eq(checklistTemplates.id, body.templateId), eq(checklistTemplates.farmId, member.farmId), isNull(checklistTemplates.archivedAt)))
      if (!t) badRequest('Choose one of this farm\'s checklists', { templateId: 'Unknown checklist' })
      name = t.name
      items = t.items
    }
    const [ins] = await tx.insert(inspections).values({ farmId: member.farmId, planterId: planter.id, templateId: body.templateId ?? null, templateName: name, notes: body.notes ?? null, inspectedBy: member.user.id }).returning()
    await tx.insert(inspectionItems).values(items.map((it, i) => ({ inspectionId: ins!.id, position: i + 1, area: it.area, label: it.label, hint: it.hint })))
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'create', entity: 'inspection', entityId: ins!.id, after: { planterId: planter.id, templateName: name, items: items.length } })
    return getInspection(member.farmId, ins!.id, tx)
  })
}

export async function updateInspectionItem(member: Member, itemId: number, patch: z.infer<typeof inspectionItemPatch>) {
  return useDb().transaction(async (tx) => {
    const [row] = await tx.select({ item: inspectionItems, status: inspections.status }).from(inspectionItems)
      .innerJoin(inspections, eq(inspections.id, inspectionItems.inspectionId))
      .where(and(eq(inspectionItems.id, itemId), eq(inspections.farmId, member.farmId))).for('update')
    if (!row) notFound('Inspection item')
    if (patch.result === undefined && patch.notes === undefined && patch.photoUploadIds === undefined) badRequest('There is nothing to change', { result: 'Choose a result or add a note' })
    if (row.status === 'completed') throw createError({ statusCode: 409, message: 'This inspection is completed; start a new one to record changes.' })
    // Only this farm's photos may be linked; the ids are kept once each, in the order sent.
    if (patch.photoUploadIds) await assertFarmUploads(tx, member.farmId, patch.photoUploadIds, PHOTO_TYPES, 'photoUploadIds')
    const changes = patch.photoUploadIds ? { ...patch, photoUploadIds: [...new Set(patch.photoUploadIds)] } : patch
    const [after] = await tx.update(inspectionItems).set(changes).where(eq(inspectionItems.id, itemId)).returning()
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'update', entity: 'inspection_item', entityId: itemId, before: row.item, after })
    return after!
  })
}

// Completing needs every item answered; each "needs fixing" becomes an open work item.
export async function completeInspection(member: Member, id: number, notes?: string | null) {
  return useDb().transaction(async (tx) => {
    const [ins] = await tx.select().from(inspections).where(and(eq(inspections.id, id), eq(inspections.farmId, member.farmId))).for('update')
    if (!ins) notFound('Inspection')
    if (ins.status === 'completed') throw createError({ statusCode: 409, message: 'This inspection is already completed.' })
    const items = await tx.select().from(inspectionItems).where(eq(inspectionItems.inspectionId, id)).orderBy(asc(inspectionItems.position))
    const open = items.filter((i) => i.result == null)
    if (open.length) badRequest(`${open.length} item${open.length > 1 ? 's are' : ' is'} not checked yet`, Object.fromEntries(open.map((i) => [`items.${i.position}`, `Check “${i.label}”`])))
    const toFix = items.filter((i) => i.result === 'needs-fixing')
    const created = toFix.length
      ? await tx.insert(workItems).values(toFix.map((i) => ({ farmId: member.farmId, planterId: ins.planterId, inspectionItemId: i.id, title: `${i.area}: ${i.label}`, notes: i.notes, createdBy: member.user.id }))).returning()
      : []
    await tx.update(inspections).set({ status: 'completed', completedAt: new Date(), notes: notes ?? ins.notes }).where(eq(inspections.id, id))
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'complete', entity: 'inspection', entityId: id, after: { results: items.map((i) => [i.label, RESULT_WORDS[i.result!]]), workItems: created.map((w) => w.id) } })
    return { ...(await getInspection(member.farmId, id, tx)), workItems: created }
  })
}

// ── Work items ─────────────────────────────────────────────────────────────────────────────────
export async function listWorkItems(farmId: number, q: z.infer<typeof workItemQuery>) {
  const where = [eq(workItems.farmId, farmId)]
  if (q.status) where.push(eq(workItems.status, q.status))
  if (q.planterId) where.push(eq(workItems.planterId, q.planterId))
  const assignee = sql<string | null>`(select ${users.name} from ${users} where ${users.id} = ${workItems.assignedTo})`
  return useDb().select({
    id: workItems.id, planterId: workItems.planterId, planterName: planters.name, title: workItems.title, notes: workItems.notes, status: workItems.status,
    assignedTo: workItems.assignedTo, assignedToName: assignee, inspectionItemId: workItems.inspectionItemId, createdAt: workItems.createdAt, closedAt: workItems.closedAt,
    photoUploadIds: sql<number[]>`coalesce(${inspectionItems.photoUploadIds}, '{}')`,
  }).from(workItems).innerJoin(planters, eq(planters.id, workItems.planterId)).leftJoin(inspectionItems, eq(inspectionItems.id, workItems.inspectionItemId))
    .where(and(...where)).orderBy(desc(workItems.createdAt)).limit(300)
}

export async function updateWorkItem(member: Member, id: number, patch: z.infer<typeof workItemPatch>) {
  return useDb().transaction(async (tx) => {
    const [before] = await tx.select().from(workItems).where(and(eq(workItems.id, id), eq(workItems.farmId, member.farmId))).for('update')
    if (!before) notFound('Work item')
    if (patch.status === undefined && patch.notes === undefined && patch.assignedTo === undefined) badRequest('There is nothing to change', { status: 'Change the status, notes or who does it' })
    if (patch.assignedTo != null) {
      const [m] = await tx.select({ id: memberships.id }).from(memberships).where(and(eq(memberships.userId, patch.assignedTo), eq(memberships.farmId, member.farmId)))
      if (!m) badRequest('Assign it to a member of this farm', { assignedTo: 'Not a member of this farm' })
    }
    const closing = patch.status === 'closed' && before.status !== 'closed'
    const reopening = patch.status !== undefined && patch.status !== 'closed' && before.status === 'closed'
    const [after] = await tx.update(workItems).set({
      ...patch,
      ...(closing ? { closedAt: new Date(), closedBy: member.user.id } : {}),
      ...(reopening ? { closedAt: null, closedBy: null } : {}),
    }).where(eq(workItems.id, id)).returning()
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'update', entity: 'work_item', entityId: id, before, after })
    return after!
  })
}

// ── Maintenance log ────────────────────────────────────────────────────────────────────────────
async function plantedSince(planterIds: number[], since: string | null) {
  if (!planterIds.length) return [] as { planterId: number, acres: number }[]
  const acres = sql<number>`coalesce(sum(coalesce(${cropPlans.plantedAcres}, ${fields.acres})), 0)::float`
  const where = [inArray(cropPlans.planterId, planterIds), eq(cropPlans.status, 'planted')]
  if (since) where.push(gte(sql`coalesce(${cropPlans.plantedOn}, ${cropPlans.updatedAt}::date)`, since))
  return useDb().select({ planterId: sql<number>`${cropPlans.planterId}`, acres }).from(cropPlans).innerJoin(fields, eq(fields.id, cropPlans.fieldId))
    .where(and(...where)).groupBy(cropPlans.planterId)
}

const today = () => new Date().toISOString().slice(0, 10)

// Acres since each task's last service, planted acres come from crop plans marked planted.
async function dueFor(farmId: number, planterIds: number[]) {
  if (!planterIds.length) return []
  const events = await useDb().select().from(serviceEvents).where(and(eq(serviceEvents.farmId, farmId), inArray(serviceEvents.planterId, planterIds))).orderBy(desc(serviceEvents.servicedOn), desc(serviceEvents.id))
  const latest = new Map<string, typeof events[number]>()
  for (const e of events) {
    const key = `${e.planterId}:${e.task.toLowerCase()}`
    if (!latest.has(key) && (e.intervalAcres != null || e.nextDueOn != null)) latest.set(key, e)
  }
  const out = []
  for (const e of latest.values()) {
    const [since] = await plantedSince([e.planterId], e.servicedOn)
    const acresSinceService = since?.acres ?? 0
    out.push({ eventId: e.id, planterId: e.planterId, task: e.task, servicedOn: e.servicedOn, intervalAcres: e.intervalAcres, nextDueOn: e.nextDueOn, acresSinceService, ...serviceDue({ servicedOn: e.servicedOn, intervalAcres: e.intervalAcres, nextDueOn: e.nextDueOn, acresSinceService, today: today() }) })
  }
  const rank = { due: 0, soon: 1, ok: 2 }
  return out.sort((a, b) => rank[a.state] - rank[b.state] || (a.daysLeft ?? 9e9) - (b.daysLeft ?? 9e9))
}

export async function maintenanceLog(farmId: number, planterId: number) {
  const db = useDb()
  const [planter] = await db.select({ id: planters.id, name: planters.name }).from(planters).where(and(eq(planters.id, planterId), eq(planters.farmId, farmId)))
  if (!planter) notFound('Planter')
  const events = await db.select({ event: serviceEvents, performedByName: users.name }).from(serviceEvents).leftJoin(users, eq(users.id, serviceEvents.performedBy))
    .where(eq(serviceEvents.planterId, planterId)).orderBy(desc(serviceEvents.servicedOn), desc(serviceEvents.id))
  const [total] = await plantedSince([planterId], null)
  const plantings = await db.select({ field: fields.name, acres: sql<number>`coalesce(${cropPlans.plantedAcres}, ${fields.acres})::float`, plantedOn: cropPlans.plantedOn, season: cropPlans.season, crop: cropPlans.crop })
    .from(cropPlans).innerJoin(fields, eq(fields.id, cropPlans.fieldId))
    .where(and(eq(cropPlans.planterId, planterId), eq(cropPlans.status, 'planted'))).orderBy(desc(cropPlans.plantedOn))
  return {
    planter,
    acresPlanted: total?.acres ?? 0,
    plantings,
    events: events.map((e) => ({ ...e.event, performedByName: e.performedByName })),
    due: await dueFor(farmId, [planterId]),
  }
}

export async function addServiceEvent(member: Member, planterId: number, body: z.infer<typeof serviceEventBody>) {
  return useDb().transaction(async (tx) => {
    const [planter] = await tx.select({ id: planters.id }).from(planters).where(and(eq(planters.id, planterId), eq(planters.farmId, member.farmId)))
    if (!planter) notFound('Planter')
    const [e] = await tx.insert(serviceEvents).values({ farmId: member.farmId, planterId, servicedOn: body.servicedOn, task: body.task, notes: body.notes ?? null, intervalAcres: body.intervalAcres ?? null, nextDueOn: body.nextDueOn ?? null, performedBy: member.user.id }).returning()
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'create', entity: 'service_event', entityId: e!.id, after: e })
    return e!
  })
}

// The foreman's view: service due or soon on every planter, and work items not yet closed.
export async function shopOverview(farmId: number) {
  const list = await useDb().select({ id: planters.id, name: planters.name }).from(planters).where(and(eq(planters.farmId, farmId), isNull(planters.archivedAt)))
  const names = new Map(list.map((p) => [p.id, p.name]))
  const due = (await dueFor(farmId, list.map((p) => p.id))).map((d) => ({ ...d, planterName: names.get(d.planterId) ?? '' }))
  const open = await useDb().select({ id: workItems.id, title: workItems.title, status: workItems.status, planterId: workItems.planterId, planterName: planters.name, createdAt: workItems.createdAt })
    .from(workItems).innerJoin(planters, eq(planters.id, workItems.planterId))
    .where(and(eq(workItems.farmId, farmId), ne(workItems.status, 'closed'))).orderBy(asc(workItems.createdAt)).limit(50)
  return { due, openWorkItems: open }
}
