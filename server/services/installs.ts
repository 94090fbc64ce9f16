import { and, eq, sql } from 'drizzle-orm'
import type { SetupConfig } from '#shared/types/setup'
import type { InstalledState, PickLine } from '#shared/utils/pick-list'
import type { Member } from '../utils/membership'
import type { Db, Tx } from '../utils/db'
import { getPlanter, type PlanterDetail } from './equipment'
import { getRevision } from './setups'
import { setupInstalled } from './plans'

const { setups, setupRevisions, planters, driveSections, driveStages, rowUnits, seedPlates, sprockets } = schema

function installedState(p: PlanterDetail): InstalledState {
  return {
    sections: p.sections.map((s) => ({ sectionId: s.id, name: s.name, rows: s.rows, stages: s.stages.map((st) => ({ position: st.position, driverTeeth: st.driverTeeth, drivenTeeth: st.drivenTeeth, chainPitch: st.chainPitch })) })),
    rowUnits: p.rowUnits.map((u) => ({
      position: u.position, opener: u.opener, gaugeWheels: u.gaugeWheels, depthIn: u.depthIn, depthBand: u.depthBand, downPressureLb: u.downPressureLb,
      pressWheel: u.pressWheel, pressWheelWidthIn: u.pressWheelWidthIn, covering: u.covering, furrower: u.furrower, seedPlateId: u.seedPlateId,
      granular: u.granular, granularBandWidthIn: u.granularBandWidthIn, granularDialSetting: u.granularDialSetting, fertilizerSetting: u.fertilizerSetting, planting: u.planting,
    })),
  }
}

async function stock(db: Db | Tx, farmId: number) {
  const plates = await db.select({ id: seedPlates.id, code: seedPlates.code, quantityOnHand: seedPlates.quantityOnHand }).from(seedPlates).where(eq(seedPlates.farmId, farmId))
  const gears = await db.select({ id: sprockets.id, teeth: sprockets.teeth, chainPitch: sprockets.chainPitch, quantityOnHand: sprockets.quantityOnHand }).from(sprockets).where(eq(sprockets.farmId, farmId))
  return { plates, gears }
}

// The parts that move between the shelf and the planter to go from what it carries to this config.
export async function planterPickList(farmId: number, planterId: number, config: SetupConfig, tx?: Tx) {
  const db = tx ?? useDb()
  const planter = await getPlanter(farmId, planterId, tx)
  const { plates, gears } = await stock(db, farmId)
  return { planterConfigVersion: planter.configVersion, ...buildPickList(installedState(planter), config, plates, gears) }
}

export async function setupPickList(farmId: number, setupId: number, revision?: number) {
  const { setup, rev } = await getRevision(farmId, setupId, revision)
  return { setupId, revision: rev.revision, installedRevision: setup.installedRevision, ...(await planterPickList(farmId, setup.planterId, rev.config)) }
}

function conflict(message: string, data: Record<string, unknown> = {}): never {
  throw createError({ statusCode: 409, message, data })
}

// Puts a revision on the planter: row units, stages and section rows take the revision's values,
// shelf counts move by the pick list, the planter's version goes up. Any conflict undoes it all.
export async function installSetup(member: Member, setupId: number, body: { revision: number, planterConfigVersion: number }) {
  return useDb().transaction(async (tx) => {
    const [setup] = await tx.select().from(setups).where(and(eq(setups.id, setupId), eq(setups.farmId, member.farmId))).for('update')
    if (!setup) notFound('Setup')
    const [rev] = await tx.select().from(setupRevisions).where(and(eq(setupRevisions.setupId, setupId), eq(setupRevisions.revision, body.revision)))
    if (!rev) badRequest(`Revision ${body.revision} does not exist`, { revision: `This setup has revisions 1 to ${setup.latestRevision}` })
    const [locked] = await tx.select().from(planters).where(eq(planters.id, setup.planterId)).for('update')
    if (!locked) notFound('Planter')
    if (locked.configVersion !== body.planterConfigVersion) {
      conflict(`Someone changed ${locked.name} after you opened the pick list (version ${body.planterConfigVersion}, now ${locked.configVersion}). Nothing was changed; reload the pick list and check it again.`, { planterConfigVersion: locked.configVersion })
    }
    const config = rev.config
    const pick = await planterPickList(member.farmId, locked.id, config, tx)
    if (pick.blockers.length) conflict(`This revision does not fit the planter as it stands: ${pick.blockers.join('; ')}. Nothing was changed.`)

    // Shelf counts move with guarded updates so a count never goes below zero, even against a
    // concurrent install that passed its own checks.
    const moveStock = async (line: PickLine) => {
      const delta = line.putBack - line.pull
      if (delta === 0) return
      const table = line.kind === 'plate' ? seedPlates : sprockets
      if (line.inventoryId == null) {
        if (delta < 0) conflict(`${line.kind === 'plate' ? 'Plate' : 'Sprocket'} ${line.label} is not in the inventory; ${line.pull} needed. Nothing was changed.`)
        if (line.kind === 'sprocket') {
          const [teeth, pitch] = line.key.split(':').slice(1) as [string, string]
          await tx.insert(sprockets).values({ farmId: member.farmId, teeth: Number(teeth), chainPitch: pitch, quantityOnHand: delta })
        }
        return
      }
      const done = await tx.update(table).set({ quantityOnHand: sql`${table.quantityOnHand} + ${delta}` })
        .where(and(eq(table.id, line.inventoryId), eq(table.farmId, member.farmId), sql`${table.quantityOnHand} + ${delta} >= 0`)).returning({ q: table.quantityOnHand })
      if (!done.length) {
        const [now] = await tx.select({ q: table.quantityOnHand }).from(table).where(eq(table.id, line.inventoryId))
        conflict(`Not enough of ${line.kind === 'plate' ? 'plate' : 'sprocket'} ${line.label} on the shelf: ${line.pull} to pull, ${line.putBack} to put back, ${now?.q ?? 0} there. Nothing was changed.`, { short: line.key })
      }
    }
    for (const line of [...pick.plates, ...pick.sprockets]) await moveStock(line)

    const planter = await getPlanter(member.farmId, locked.id, tx)
    for (const ts of config.sections) {
      const now = planter.sections.find((s) => s.id === ts.sectionId)!
      await tx.update(driveSections).set({ rows: ts.rows }).where(eq(driveSections.id, now.id))
      for (const st of ts.stages) {
        const existing = now.stages.find((x) => x.position === st.position)
        if (existing) await tx.update(driveStages).set({ driverTeeth: st.driverTeeth, drivenTeeth: st.drivenTeeth }).where(eq(driveStages.id, existing.id))
        else await tx.insert(driveStages).values({ sectionId: now.id, position: st.position, chainPitch: now.stages[0]?.chainPitch ?? '#40', driverTeeth: st.driverTeeth, drivenTeeth: st.drivenTeeth, driverOptions: [], drivenOptions: [] })
      }
      const extra = now.stages.filter((x) => !ts.stages.some((st) => st.position === x.position))
      for (const x of extra) await tx.delete(driveStages).where(eq(driveStages.id, x.id))
    }
    for (const u of config.rowUnits) {
      const section = config.sections.find((s) => s.rows.includes(u.position))
      const { position, ...values } = u
      await tx.update(rowUnits).set({ ...values, seedPlateId: section?.seedPlateId ?? u.seedPlateId })
        .where(and(eq(rowUnits.planterId, locked.id), eq(rowUnits.position, position)))
    }
    const [after] = await tx.update(planters).set({ configVersion: locked.configVersion + 1 }).where(eq(planters.id, locked.id)).returning({ configVersion: planters.configVersion })
    // The planter carries one setup at a time.
    await tx.update(setups).set({ installedRevision: null, installedAt: null }).where(and(eq(setups.planterId, locked.id), sql`${setups.id} <> ${setupId}`))
    const installedAt = new Date()
    await tx.update(setups).set({ installedRevision: body.revision, installedAt }).where(eq(setups.id, setupId))
    const plansSetUp = await setupInstalled(tx, member, setupId, body.revision)
    await writeAudit(tx, {
      farmId: member.farmId, userId: member.user.id, action: 'install', entity: 'setup', entityId: setupId,
      before: { installedRevision: setup.installedRevision, planterConfigVersion: locked.configVersion },
      after: { installedRevision: body.revision, planterConfigVersion: after!.configVersion, plates: pick.plates.map((l) => [l.label, l.pull, l.putBack]), sprockets: pick.sprockets.map((l) => [l.label, l.pull, l.putBack]) },
    })
    return { setupId, installedRevision: body.revision, installedAt, planterConfigVersion: after!.configVersion, plansSetUp, pulled: [...pick.plates, ...pick.sprockets].map((l) => ({ label: l.label, pull: l.pull, putBack: l.putBack, after: l.after })) }
  })
}
