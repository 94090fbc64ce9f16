import { and, asc, eq, inArray, isNull, sql } from 'drizzle-orm'
import type { z } from 'zod'
import type { bulkRowUnitBody, planterBody, planterPatch, plateBody, platePatch, rowUnitPatch, sectionBody, sectionPatch, solveBody, sprocketBody, sprocketPatch, stageBody, stagePatch } from '#shared/schemas/equipment'
import type { Member } from '../utils/membership'
import type { Tx } from '../utils/db'

const { planters, driveSections, driveStages, rowUnits, seedPlates, sprockets, setups } = schema

export type PlanterDetail = Awaited<ReturnType<typeof getPlanter>>

export async function listPlanters(farmId: number) {
  const rows = await useDb().select().from(planters).where(and(eq(planters.farmId, farmId), isNull(planters.archivedAt))).orderBy(asc(planters.name))
  return rows
}

export async function getPlanter(farmId: number, id: number, tx?: Tx) {
  const db = tx ?? useDb()
  const [planter] = await db.select().from(planters).where(and(eq(planters.id, id), eq(planters.farmId, farmId)))
  if (!planter) notFound('Planter')
  const sections = await db.select().from(driveSections).where(eq(driveSections.planterId, id)).orderBy(asc(driveSections.sortOrder), asc(driveSections.id))
  const stages = sections.length
    ? await db.select().from(driveStages).where(inArray(driveStages.sectionId, sections.map((s) => s.id))).orderBy(asc(driveStages.position))
    : []
  const units = await db.select().from(rowUnits).where(eq(rowUnits.planterId, id)).orderBy(asc(rowUnits.position))
  return {
    ...planter,
    sections: sections.map((s) => ({ ...s, stages: stages.filter((st) => st.sectionId === s.id) })),
    rowUnits: units,
  }
}

function circumference(body: { wheelCircumferenceIn?: number, circumferenceRun?: { revolutions: number, distanceFt: number } }) {
  if (body.circumferenceRun) {
    return { wheelCircumferenceIn: rollingCircumferenceFromRun(body.circumferenceRun), circumferenceRevolutions: body.circumferenceRun.revolutions, circumferenceDistanceFt: body.circumferenceRun.distanceFt }
  }
  return body.wheelCircumferenceIn !== undefined ? { wheelCircumferenceIn: body.wheelCircumferenceIn, circumferenceRevolutions: null, circumferenceDistanceFt: null } : {}
}

// An edit that sets no field would only bump versions and write empty audit entries.
function requireChanges(patch: Record<string, unknown>, field = '_') {
  if (!Object.values(patch).some((v) => v !== undefined)) badRequest('There is nothing to change', { [field]: 'Change at least one field' })
}

async function bumpConfig(tx: Tx, planterId: number) {
  await tx.update(planters).set({ configVersion: sql`${planters.configVersion} + 1` }).where(eq(planters.id, planterId))
}

export async function createPlanter(member: Member, body: z.infer<typeof planterBody>) {
  return useDb().transaction(async (tx) => {
    const { stages: stageList, circumferenceRun: _run, wheelCircumferenceIn: _c, ...fields } = body
    const [p] = await tx.insert(planters).values({ ...fields, ...circumference(body), farmId: member.farmId } as typeof planters.$inferInsert).returning()
    const rows = Array.from({ length: body.rowCount }, (_, i) => i + 1)
    const [section] = await tx.insert(driveSections).values({ planterId: p!.id, name: 'Main drive', rows }).returning()
    const given = stageList ?? [{ driverTeeth: 20, drivenTeeth: 20, driverOptions: [], drivenOptions: [] }]
    await tx.insert(driveStages).values(given.map((s, i) => ({ ...s, sectionId: section!.id, position: i + 1 })))
    await tx.insert(rowUnits).values(rows.map((position) => ({ planterId: p!.id, position })))
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'create', entity: 'planter', entityId: p!.id, after: p })
    return getPlanter(member.farmId, p!.id, tx)
  })
}

export async function updatePlanter(member: Member, id: number, patch: z.infer<typeof planterPatch>) {
  return useDb().transaction(async (tx) => {
    const [before] = await tx.select().from(planters).where(and(eq(planters.id, id), eq(planters.farmId, member.farmId))).for('update')
    if (!before) notFound('Planter')
    requireChanges({ ...patch, configVersion: undefined })
    if (patch.configVersion !== undefined && patch.configVersion !== before.configVersion) {
      throw createError({ statusCode: 409, message: 'Someone else changed this planter since you opened it. Reload to see their changes.' })
    }
    const { circumferenceRun: _run, wheelCircumferenceIn: _c, configVersion: _v, ...fields } = patch
    const [after] = await tx.update(planters).set({ ...fields, ...circumference(patch), configVersion: before.configVersion + 1 }).where(eq(planters.id, id)).returning()
    if (patch.rowCount !== undefined && patch.rowCount !== before.rowCount) await resizeRows(tx, id, before.rowCount, patch.rowCount)
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'update', entity: 'planter', entityId: id, before, after })
    return getPlanter(member.farmId, id, tx)
  })
}

// Adding rows adds units (and puts them on the first section); removing drops the last units.
async function resizeRows(tx: Tx, planterId: number, from: number, to: number) {
  if (to > from) {
    const added = Array.from({ length: to - from }, (_, i) => from + i + 1)
    await tx.insert(rowUnits).values(added.map((position) => ({ planterId, position })))
    const [first] = await tx.select().from(driveSections).where(eq(driveSections.planterId, planterId)).orderBy(asc(driveSections.sortOrder)).limit(1)
    if (first) await tx.update(driveSections).set({ rows: [...first.rows, ...added] }).where(eq(driveSections.id, first.id))
  } else {
    await tx.delete(rowUnits).where(and(eq(rowUnits.planterId, planterId), sql`${rowUnits.position} > ${to}`))
    const sections = await tx.select().from(driveSections).where(eq(driveSections.planterId, planterId))
    for (const s of sections) await tx.update(driveSections).set({ rows: s.rows.filter((r) => r <= to) }).where(eq(driveSections.id, s.id))
  }
}

export async function deletePlanter(member: Member, id: number) {
  return useDb().transaction(async (tx) => {
    const [before] = await tx.select().from(planters).where(and(eq(planters.id, id), eq(planters.farmId, member.farmId)))
    if (!before) notFound('Planter')
    const [used] = await tx.select({ n: sql<number>`count(*)::int` }).from(setups).where(eq(setups.planterId, id))
    if (used!.n > 0) {
      await tx.update(planters).set({ archivedAt: new Date() }).where(eq(planters.id, id))
      await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'archive', entity: 'planter', entityId: id, before })
      return { archived: id, message: 'The planter has saved setups, so it was archived instead of deleted; its setups stay readable.' }
    }
    await tx.delete(planters).where(eq(planters.id, id))
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'delete', entity: 'planter', entityId: id, before })
    return { deleted: id }
  })
}

async function sectionOfFarm(tx: Tx, farmId: number, sectionId: number) {
  const [row] = await tx.select({ section: driveSections }).from(driveSections)
    .innerJoin(planters, eq(planters.id, driveSections.planterId))
    .where(and(eq(driveSections.id, sectionId), eq(planters.farmId, farmId))).for('update')
  if (!row) notFound('Drive section')
  return row.section
}

function checkRows(rows: number[], rowCount: number) {
  const bad = rows.filter((r) => r > rowCount)
  if (bad.length) badRequest(`This planter has ${rowCount} rows`, { rows: `Rows ${bad.join(', ')} do not exist on this planter` })
}

export async function addSection(member: Member, planterId: number, body: z.infer<typeof sectionBody>) {
  return useDb().transaction(async (tx) => {
    const p = await getPlanter(member.farmId, planterId, tx)
    checkRows(body.rows, p.rowCount)
    const [section] = await tx.insert(driveSections).values({ planterId, name: body.name, rows: body.rows, sortOrder: p.sections.length }).returning()
    // Rows moved to the new section leave the others.
    for (const s of p.sections) await tx.update(driveSections).set({ rows: s.rows.filter((r) => !body.rows.includes(r)) }).where(eq(driveSections.id, s.id))
    await tx.insert(driveStages).values({ sectionId: section!.id, position: 1, driverTeeth: 20, drivenTeeth: 20, driverOptions: [], drivenOptions: [] })
    await bumpConfig(tx, planterId)
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'create', entity: 'drive_section', entityId: section!.id, after: section })
    return getPlanter(member.farmId, planterId, tx)
  })
}

export async function updateSection(member: Member, sectionId: number, patch: z.infer<typeof sectionPatch>) {
  return useDb().transaction(async (tx) => {
    const before = await sectionOfFarm(tx, member.farmId, sectionId)
    requireChanges(patch)
    const p = await getPlanter(member.farmId, before.planterId, tx)
    if (patch.rows) {
      checkRows(patch.rows, p.rowCount)
      for (const s of p.sections) if (s.id !== sectionId) await tx.update(driveSections).set({ rows: s.rows.filter((r) => !patch.rows!.includes(r)) }).where(eq(driveSections.id, s.id))
    }
    const [after] = await tx.update(driveSections).set(patch).where(eq(driveSections.id, sectionId)).returning()
    await bumpConfig(tx, before.planterId)
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'update', entity: 'drive_section', entityId: sectionId, before, after })
    return getPlanter(member.farmId, before.planterId, tx)
  })
}

export async function deleteSection(member: Member, sectionId: number) {
  return useDb().transaction(async (tx) => {
    const before = await sectionOfFarm(tx, member.farmId, sectionId)
    const p = await getPlanter(member.farmId, before.planterId, tx)
    if (p.sections.length === 1) throw createError({ statusCode: 409, message: 'A planter keeps at least one drive section' })
    await tx.delete(driveSections).where(eq(driveSections.id, sectionId))
    // Its rows go back to the first remaining section.
    const keep = p.sections.find((s) => s.id !== sectionId)!
    await tx.update(driveSections).set({ rows: [...new Set([...keep.rows, ...before.rows])].sort((a, b) => a - b) }).where(eq(driveSections.id, keep.id))
    await bumpConfig(tx, before.planterId)
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'delete', entity: 'drive_section', entityId: sectionId, before })
    return getPlanter(member.farmId, before.planterId, tx)
  })
}

async function stageOfFarm(tx: Tx, farmId: number, stageId: number) {
  const [row] = await tx.select({ stage: driveStages, planterId: driveSections.planterId }).from(driveStages)
    .innerJoin(driveSections, eq(driveSections.id, driveStages.sectionId))
    .innerJoin(planters, eq(planters.id, driveSections.planterId))
    .where(and(eq(driveStages.id, stageId), eq(planters.farmId, farmId))).for('update')
  if (!row) notFound('Drive stage')
  return row
}

export async function addStage(member: Member, sectionId: number, body: z.infer<typeof stageBody>) {
  return useDb().transaction(async (tx) => {
    const section = await sectionOfFarm(tx, member.farmId, sectionId)
    const [count] = await tx.select({ n: sql<number>`count(*)::int` }).from(driveStages).where(eq(driveStages.sectionId, sectionId))
    if (count!.n >= 6) badRequest('A drive has at most 6 stages', { stages: 'A drive has at most 6 stages' })
    const [stage] = await tx.insert(driveStages).values({ ...body, sectionId, position: count!.n + 1 }).returning()
    await bumpConfig(tx, section.planterId)
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'create', entity: 'drive_stage', entityId: stage!.id, after: stage })
    return getPlanter(member.farmId, section.planterId, tx)
  })
}

export async function updateStage(member: Member, stageId: number, patch: z.infer<typeof stagePatch>) {
  return useDb().transaction(async (tx) => {
    const { stage: before, planterId } = await stageOfFarm(tx, member.farmId, stageId)
    requireChanges(patch)
    const [after] = await tx.update(driveStages).set(patch).where(eq(driveStages.id, stageId)).returning()
    await bumpConfig(tx, planterId)
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'update', entity: 'drive_stage', entityId: stageId, before, after })
    return getPlanter(member.farmId, planterId, tx)
  })
}

export async function deleteStage(member: Member, stageId: number) {
  return useDb().transaction(async (tx) => {
    const { stage: before, planterId } = await stageOfFarm(tx, member.farmId, stageId)
    const rest = await tx.select().from(driveStages).where(eq(driveStages.sectionId, before.sectionId)).orderBy(asc(driveStages.position))
    if (rest.length === 1) throw createError({ statusCode: 409, message: 'A drive section keeps at least one stage' })
    await tx.delete(driveStages).where(eq(driveStages.id, stageId))
    // Close the gap in the order; positions are unique per section, so move the later ones one by one.
    for (const s of rest.filter((r) => r.position > before.position)) await tx.update(driveStages).set({ position: s.position - 1 }).where(eq(driveStages.id, s.id))
    await bumpConfig(tx, planterId)
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'delete', entity: 'drive_stage', entityId: stageId, before })
    return getPlanter(member.farmId, planterId, tx)
  })
}

async function checkPlate(tx: Tx, farmId: number, plateId: number | null | undefined) {
  if (!plateId) return
  const [p] = await tx.select({ id: seedPlates.id }).from(seedPlates).where(and(eq(seedPlates.id, plateId), eq(seedPlates.farmId, farmId)))
  if (!p) badRequest('That seed plate is not in this farm\'s inventory', { seedPlateId: 'Unknown seed plate' })
}

export async function updateRowUnit(member: Member, unitId: number, patch: z.infer<typeof rowUnitPatch>) {
  return useDb().transaction(async (tx) => {
    const [row] = await tx.select({ unit: rowUnits }).from(rowUnits).innerJoin(planters, eq(planters.id, rowUnits.planterId))
      .where(and(eq(rowUnits.id, unitId), eq(planters.farmId, member.farmId))).for('update')
    if (!row) notFound('Row unit')
    requireChanges(patch)
    await checkPlate(tx, member.farmId, patch.seedPlateId)
    const [after] = await tx.update(rowUnits).set(patch).where(eq(rowUnits.id, unitId)).returning()
    await bumpConfig(tx, row.unit.planterId)
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'update', entity: 'row_unit', entityId: unitId, before: row.unit, after })
    return after!
  })
}

export async function updateRowUnits(member: Member, planterId: number, body: z.infer<typeof bulkRowUnitBody>) {
  return useDb().transaction(async (tx) => {
    const p = await getPlanter(member.farmId, planterId, tx)
    requireChanges(body.changes, 'changes')
    checkRows(body.positions, p.rowCount)
    await checkPlate(tx, member.farmId, body.changes.seedPlateId)
    const after = await tx.update(rowUnits).set(body.changes).where(and(eq(rowUnits.planterId, planterId), inArray(rowUnits.position, body.positions))).returning()
    await bumpConfig(tx, planterId)
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'update-many', entity: 'row_unit', entityId: planterId, before: { positions: body.positions }, after: body.changes })
    return after
  })
}

// Inventory: seed plates and sprockets.
export async function listPlates(farmId: number) {
  return useDb().select().from(seedPlates).where(eq(seedPlates.farmId, farmId)).orderBy(asc(seedPlates.code))
}

function checkSeedRange(p: { seedsPerLbMin?: number | null, seedsPerLbMax?: number | null }) {
  if (p.seedsPerLbMin != null && p.seedsPerLbMax != null && p.seedsPerLbMax < p.seedsPerLbMin) {
    badRequest('The seed-size range is upside down', { seedsPerLbMax: 'The upper end must not be below the lower end' })
  }
}

export async function createPlate(member: Member, body: z.infer<typeof plateBody>) {
  checkSeedRange(body)
  return useDb().transaction(async (tx) => {
    const [p] = await tx.insert(seedPlates).values({ ...body, farmId: member.farmId }).returning()
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'create', entity: 'seed_plate', entityId: p!.id, after: p })
    return p!
  })
}

export async function updatePlate(member: Member, id: number, patch: z.infer<typeof platePatch>) {
  return useDb().transaction(async (tx) => {
    const [before] = await tx.select().from(seedPlates).where(and(eq(seedPlates.id, id), eq(seedPlates.farmId, member.farmId))).for('update')
    if (!before) notFound('Seed plate')
    requireChanges(patch)
    checkSeedRange({ seedsPerLbMin: patch.seedsPerLbMin !== undefined ? patch.seedsPerLbMin : before.seedsPerLbMin, seedsPerLbMax: patch.seedsPerLbMax !== undefined ? patch.seedsPerLbMax : before.seedsPerLbMax })
    const [after] = await tx.update(seedPlates).set(patch).where(eq(seedPlates.id, id)).returning()
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'update', entity: 'seed_plate', entityId: id, before, after })
    return after!
  })
}

export async function deletePlate(member: Member, id: number) {
  return useDb().transaction(async (tx) => {
    const [before] = await tx.delete(seedPlates).where(and(eq(seedPlates.id, id), eq(seedPlates.farmId, member.farmId))).returning()
    if (!before) notFound('Seed plate')
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'delete', entity: 'seed_plate', entityId: id, before })
    return { deleted: id }
  })
}

export async function listSprockets(farmId: number) {
  return useDb().select().from(sprockets).where(eq(sprockets.farmId, farmId)).orderBy(asc(sprockets.chainPitch), asc(sprockets.teeth))
}

export async function createSprocket(member: Member, body: z.infer<typeof sprocketBody>) {
  return useDb().transaction(async (tx) => {
    const [s] = await tx.insert(sprockets).values({ ...body, farmId: member.farmId }).returning()
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'create', entity: 'sprocket', entityId: s!.id, after: s })
    return s!
  })
}

export async function updateSprocket(member: Member, id: number, patch: z.infer<typeof sprocketPatch>) {
  return useDb().transaction(async (tx) => {
    const [before] = await tx.select().from(sprockets).where(and(eq(sprockets.id, id), eq(sprockets.farmId, member.farmId))).for('update')
    if (!before) notFound('Sprocket')
    requireChanges(patch)
    const [after] = await tx.update(sprockets).set(patch).where(eq(sprockets.id, id)).returning()
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'update', entity: 'sprocket', entityId: id, before, after })
    return after!
  })
}

export async function deleteSprocket(member: Member, id: number) {
  return useDb().transaction(async (tx) => {
    const [before] = await tx.delete(sprockets).where(and(eq(sprockets.id, id), eq(sprockets.farmId, member.farmId))).returning()
    if (!before) notFound('Sprocket')
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'delete', entity: 'sprocket', entityId: id, before })
    return { deleted: id }
  })
}

function pickSection(p: PlanterDetail, sectionId?: number) {
  const section = sectionId ? p.sections.find((s) => s.id === sectionId) : p.sections[0]
  if (!section) notFound('Drive section')
  return section
}

// Raw driver × driven pairings the search walks; past this a planter's sizes lists are a typing slip
// or a denial of service, not a drive train (the 3 stage × 15 size case is about 16.8 million).
const MAX_SEARCHED_PAIRINGS = 20_000_000

function pairings(stages: PlanterDetail['sections'][number]['stages']) {
  return stages.reduce((n, s) => n * new Set([s.driverTeeth, ...s.driverOptions]).size * new Set([s.drivenTeeth, ...s.drivenOptions]).size, 1)
}

function assertSearchable(stageGroups: PlanterDetail['sections'][number]['stages'][]) {
  if (stageGroups.some((g) => pairings(g) > MAX_SEARCHED_PAIRINGS)) {
    badRequest('This drive train has too many sprocket combinations to search. Trim the sizes on hand of its stages to the ones on the shelf.', { stages: 'Too many sprocket combinations' })
  }
}

function installedPlateOf(p: PlanterDetail, rows: number[]) {
  return p.rowUnits.find((u) => rows.includes(u.position) && u.planting)?.seedPlateId ?? null
}

export async function solvePlanter(member: Member, planterId: number, body: z.infer<typeof solveBody>) {
  const p = await getPlanter(member.farmId, planterId)
  const section = pickSection(p, body.sectionId)
  // The solver searches the two halves of the stage list separately.
  const half = Math.floor(section.stages.length / 2)
  assertSearchable([section.stages.slice(0, half), section.stages.slice(half)])
  const installedPlateId = installedPlateOf(p, section.rows)
  const plates = (await listPlates(member.farmId))
    .filter((pl) => (pl.quantityOnHand > 0 || pl.id === installedPlateId) && (!body.crop || pl.crops.includes(body.crop)))
  if (!plates.length) throw createError({ statusCode: 409, message: body.crop ? `No ${body.crop} plates on hand` : 'No seed plates on hand' })
  const stages = section.stages.map((s) => ({ position: s.position, driverTeeth: s.driverTeeth, drivenTeeth: s.drivenTeeth, driverOptions: s.driverOptions, drivenOptions: s.drivenOptions }))
  if (solverWork({ stages, plates }).work > SOLVER_MAX_WORK) {
    badRequest('This drive has too many sprocket sizes on hand to search every combination; list fewer sizes per position.', { stages: 'Too many combinations to search' })
  }
  const choices = solveDrive({
    targetSeedsPerAcre: body.targetSeedsPerAcre,
    targetSpacingIn: body.targetSpacingIn,
    rowSpacingIn: body.rowSpacingIn ?? p.rowSpacingIn,
    wheelCircumferenceIn: p.wheelCircumferenceIn,
    slipPercent: p.slipPercent,
    meterRatio: p.meterRatio,
    stages,
    plates: plates.map((pl) => ({ id: pl.id, code: pl.code, cellsPerPlate: pl.cellsPerPlate })),
    installedPlateId,
    limit: body.limit,
  })
  return { planterId, sectionId: section.id, rowSpacingIn: body.rowSpacingIn ?? p.rowSpacingIn, choices }
}

export async function planterRateChart(member: Member, planterId: number, query: { plateId?: number, cells?: number, sectionId?: number, rowSpacings: number[] }) {
  const p = await getPlanter(member.farmId, planterId)
  const section = pickSection(p, query.sectionId)
  assertSearchable([section.stages])
  let cells = query.cells
  let plateCode: string | null = null
  const plateId = query.plateId ?? (cells ? null : installedPlateOf(p, section.rows))
  if (plateId) {
    const [plate] = await useDb().select().from(seedPlates).where(and(eq(seedPlates.id, plateId), eq(seedPlates.farmId, member.farmId)))
    if (!plate) notFound('Seed plate')
    cells = plate.cellsPerPlate
    plateCode = plate.code
  }
  if (!cells) badRequest('Choose a seed plate or give the cells per plate', { plateId: 'Choose a seed plate' })
  const rowSpacingsIn = [p.rowSpacingIn, ...query.rowSpacings.filter((r) => r !== p.rowSpacingIn)]
  const chart = rateChart({
    wheelCircumferenceIn: p.wheelCircumferenceIn, slipPercent: p.slipPercent, meterRatio: p.meterRatio, cellsPerPlate: cells,
    stages: section.stages.map((s) => ({ position: s.position, driverTeeth: s.driverTeeth, drivenTeeth: s.drivenTeeth, driverOptions: s.driverOptions, drivenOptions: s.drivenOptions })),
    rowSpacingsIn,
  })
  return { planter: { id: p.id, name: p.name }, sectionId: section.id, plateCode, cellsPerPlate: cells, rowSpacingsIn, ...chart }
}
