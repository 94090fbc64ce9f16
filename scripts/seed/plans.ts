import { inArray } from 'drizzle-orm'
import * as schema from '../../server/db/schema'
import type { SeedDb } from './index'
import type { seedAccounts } from './accounts'
import type { seedEquipment } from './equipment'

type Accounts = Awaited<ReturnType<typeof seedAccounts>>
type Equipment = Awaited<ReturnType<typeof seedEquipment>>
type Status = (typeof schema.planStatusEnum.enumValues)[number]

export const DEMO_SEASON = 2027

// The invented 2027 season at Cottonwood Flats: one plan per demo field, walked through every
// review status with the events and e-mail-worthy comments a real season would leave behind.
export async function seedPlans(db: SeedDb, a: Accounts, eq: Equipment, made: { fields: Record<string, number>, lots: Record<string, number> }) {
  const farmId = a.farm.id
  const fieldRows = await db.select().from(schema.fields).where(inArray(schema.fields.id, Object.values(made.fields)))
  const lotRows = await db.select().from(schema.seedLots).where(inArray(schema.seedLots.id, Object.values(made.lots)))
  const [north, creek] = eq.planters
  const [cornSetup, beanSetup] = eq.setups
  const byCrop = (crop: string) => lotRows.filter((l) => l.crop === crop)
  const corn = byCrop('corn')
  const beans = byCrop('soybeans')
  const walk: Status[] = ['planted', 'set-up', 'approved', 'submitted', 'changes-requested', 'draft', 'approved', 'submitted', 'draft']
  const day = (n: number) => new Date(Date.UTC(2027, 3, 12 + n)).toISOString().slice(0, 10)
  const ago = (days: number) => new Date(Date.now() - days * 86_400_000)

  const fieldsInOrder = [...fieldRows].sort((x, y) => x.name.localeCompare(y.name))
  for (const [i, field] of fieldsInOrder.entries()) {
    const isCorn = i % 3 !== 2 && corn.length > 0
    const lots = isCorn ? corn : beans.length ? beans : corn
    if (!lots.length) break
    const lot = lots[i % lots.length]!
    const crop = lot.crop
    const onNorth = crop === 'corn'
    const setup = onNorth ? cornSetup! : beanSetup!
    const status = walk[i % walk.length]!
    const order = i + 1
    const [plan] = await db.insert(schema.cropPlans).values({
      farmId, season: DEMO_SEASON, fieldId: field.id, crop, seedLotId: lot.id,
      targetStand: onNorth ? 32_000 + (i % 3) * 1_000 : 125_000, survivalPercent: onNorth ? 95 : 90,
      rowSpacingIn: onNorth ? 30 : 15, windowStart: day(i * 3), windowEnd: day(i * 3 + 10),
      planterId: onNorth ? north!.id : creek!.id, speedMph: onNorth ? 5 : 4.5, marginPercent: 5, sortOrder: order,
      notes: i === 0 ? 'First in: the sand warms earliest.' : null, status, createdBy: a.agronomist.id,
      ...(status === 'draft' ? {} : { setupId: setup.id, proposedBy: a.operator.id }),
      ...(['approved', 'set-up', 'planted'].includes(status) ? { approvedRevision: setup.latestRevision, approvedBy: a.agronomist.id, approvedAt: ago(20) } : {}),
      ...(status === 'planted' ? { plantedOn: day(i * 3 + 1), plantedAcres: field.acres } : {}),
    }).returning()
    const events: (typeof schema.planEvents.$inferInsert)[] = [{ planId: plan!.id, fromStatus: null, toStatus: 'draft', comment: 'Plan created', userId: a.agronomist.id, createdAt: ago(40) }]
    if (status !== 'draft') events.push({ planId: plan!.id, fromStatus: 'draft', toStatus: 'submitted', setupRevision: setup.latestRevision, comment: 'Proposing the shop setup; the seed-drop check was close.', userId: a.operator.id, createdAt: ago(30) })
    if (status === 'changes-requested') events.push({ planId: plan!.id, fromStatus: 'submitted', toStatus: 'changes-requested', comment: 'This field runs heavy; go up a driven tooth and drop the down pressure a notch.', userId: a.agronomist.id, createdAt: ago(25) })
    if (['approved', 'set-up', 'planted'].includes(status)) events.push({ planId: plan!.id, fromStatus: 'submitted', toStatus: 'approved', setupRevision: setup.latestRevision, comment: 'Looks right for this ground.', userId: a.agronomist.id, createdAt: ago(20) })
    if (['set-up', 'planted'].includes(status)) events.push({ planId: plan!.id, fromStatus: 'approved', toStatus: 'set-up', setupRevision: setup.latestRevision, comment: 'Sprockets changed and chains guarded.', userId: a.foreman.id, createdAt: ago(10) })
    if (status === 'planted') events.push({ planId: plan!.id, fromStatus: 'set-up', toStatus: 'planted', setupRevision: setup.latestRevision, comment: null, userId: a.operator.id, createdAt: ago(5) })
    await db.insert(schema.planEvents).values(events)
    if (i < 2) {
      await db.insert(schema.planComments).values([
        { planId: plan!.id, userId: a.agronomist.id, body: 'The low end holds water; plant it last in the day.', createdAt: ago(35) },
        { planId: plan!.id, userId: a.operator.id, body: 'Noted. I will slow to 4.5 mph through there.', createdAt: ago(34) },
        { planId: plan!.id, userId: a.foreman.id, body: 'Spare chain for the second stage is on the truck.', createdAt: ago(33) },
      ])
    }
  }
}
