import { inArray } from 'drizzle-orm'
import * as schema from '../../server/db/schema'
import { defaultSeason } from '../../shared/utils/season'
import type { SeedDb } from './index'
import type { seedAccounts } from './accounts'
import type { seedEquipment } from './equipment'

type Accounts = Awaited<ReturnType<typeof seedAccounts>>
type Equipment = Awaited<ReturnType<typeof seedEquipment>>
type Status = (typeof schema.planStatusEnum.enumValues)[number]

// The season being planned when the demo is seeded (from August on, next spring's), and the one
// before it, already planted: so no seeded date lies in the future, whenever the demo starts.
export const DEMO_SEASON = defaultSeason()
export const LAST_SEASON = DEMO_SEASON - 1

// The invented coming season at Cottonwood Flats: corn on North 12, soybeans on Creek 15, and plans
// in every review status before planting, with the events and comments planning leaves behind.
const PLANS: { field: string, lot: string | null, stand: number, status: Status, order: number, start: number, withSetup?: boolean, notes?: string }[] = [
  { field: 'Home Quarter', lot: 'RL-2611-A', stand: 34_000, status: 'set-up', order: 1, start: 0, notes: 'First in: the tile lets it dry earliest.' },
  { field: 'Schoolhouse 80', lot: 'RL-2611-B', stand: 33_000, status: 'set-up', order: 2, start: 2 },
  { field: 'Big Pivot', lot: 'RL-2611-A', stand: 36_000, status: 'approved', order: 3, start: 4, notes: 'Irrigated: push the population.' },
  { field: 'Sand Knob', lot: 'SG-2601-D', stand: 28_000, status: 'changes-requested', order: 4, start: 6 },
  { field: 'Creek Bottom North', lot: 'PD-2604-C', stand: 32_000, status: 'submitted', order: 5, start: 10 },
  { field: 'Creek Bottom South', lot: 'PD-2604-C', stand: 32_000, status: 'draft', order: 6, start: 12 },
  { field: 'Windbreak West', lot: null, stand: 33_000, status: 'draft', order: 7, start: 14, notes: 'Lot not bought yet.' },
  { field: 'Willow Draw', lot: 'ML-28-0417', stand: 125_000, status: 'approved', order: 1, start: 14 },
  { field: 'Cemetery Hill', lot: 'BS-31-0522', stand: 130_000, status: 'submitted', order: 2, start: 17 },
  { field: 'Railroad Strip', lot: 'SP-24-0309', stand: 135_000, status: 'draft', order: 3, start: 19 },
  { field: 'East Forty', lot: 'ML-28-0417', stand: 125_000, status: 'draft', order: 4, start: 21 },
]

export async function seedPlans(db: SeedDb, a: Accounts, eq: Equipment, made: { fields: Record<string, number>, lots: Record<string, number> }) {
  const farmId = a.farm.id
  const fieldRows = await db.select().from(schema.fields).where(inArray(schema.fields.id, Object.values(made.fields)))
  const lotRows = await db.select().from(schema.seedLots).where(inArray(schema.seedLots.id, Object.values(made.lots)))
  const [north, creek] = eq.planters
  const [cornSetup, beanSetup] = eq.setups
  const day = (n: number) => new Date(Date.UTC(DEMO_SEASON, 3, 19 + n)).toISOString().slice(0, 10)
  // Events fall after the setups' last revision (saved a day before the seed runs).
  const ago = (hours: number) => new Date(Date.now() - hours * 3_600_000)

  for (const [i, p] of PLANS.entries()) {
    const field = fieldRows.find((f) => f.name === p.field)
    if (!field) continue
    const lot = p.lot ? lotRows.find((l) => l.lotNumber === p.lot) ?? null : null
    const crop = lot?.crop ?? 'corn'
    const onNorth = crop === 'corn'
    const setup = onNorth ? cornSetup! : beanSetup!
    const status = p.status
    const [plan] = await db.insert(schema.cropPlans).values({
      farmId, season: DEMO_SEASON, fieldId: field.id, crop, seedLotId: lot?.id ?? null,
      targetStand: p.stand, survivalPercent: onNorth ? 95 : 90,
      rowSpacingIn: onNorth ? 30 : 15, windowStart: day(p.start), windowEnd: day(p.start + 10),
      planterId: onNorth ? north!.id : creek!.id, speedMph: onNorth ? 5 : 4.5, marginPercent: 5, sortOrder: p.order,
      notes: p.notes ?? null, status, createdBy: a.agronomist.id,
      ...(status === 'draft' ? {} : { setupId: setup.id, proposedBy: a.operator.id }),
      ...(['approved', 'set-up', 'planted'].includes(status) ? { approvedRevision: setup.latestRevision, approvedBy: a.agronomist.id, approvedAt: ago(10) } : {}),
      ...(status === 'planted' ? { plantedOn: day(p.start + 1), plantedAcres: field.acres } : {}),
    }).returning()
    const events: (typeof schema.planEvents.$inferInsert)[] = [{ planId: plan!.id, fromStatus: null, toStatus: 'draft', comment: 'Plan created', userId: a.agronomist.id, createdAt: ago(20) }]
    if (status !== 'draft') events.push({ planId: plan!.id, fromStatus: 'draft', toStatus: 'submitted', setupRevision: setup.latestRevision, comment: 'Proposing the shop setup; the seed-drop check was close.', userId: a.operator.id, createdAt: ago(16) })
    if (status === 'changes-requested') events.push({ planId: plan!.id, fromStatus: 'submitted', toStatus: 'changes-requested', comment: 'The knob cannot carry 34,000; set the drive for 28,000 and check the depth in the sand.', userId: a.agronomist.id, createdAt: ago(12) })
    if (['approved', 'set-up', 'planted'].includes(status)) events.push({ planId: plan!.id, fromStatus: 'submitted', toStatus: 'approved', setupRevision: setup.latestRevision, comment: 'Looks right for this ground.', userId: a.agronomist.id, createdAt: ago(10) })
    if (['set-up', 'planted'].includes(status)) events.push({ planId: plan!.id, fromStatus: 'approved', toStatus: 'set-up', setupRevision: setup.latestRevision, comment: 'Sprockets changed and chain guards back on.', userId: a.foreman.id, createdAt: ago(6) })
    if (status === 'planted') events.push({ planId: plan!.id, fromStatus: 'set-up', toStatus: 'planted', setupRevision: setup.latestRevision, comment: null, userId: a.operator.id, createdAt: ago(2) })
    await db.insert(schema.planEvents).values(events)
    if (i < 2) {
      await db.insert(schema.planComments).values([
        { planId: plan!.id, userId: a.agronomist.id, body: 'The low end holds water; plant it last in the day.', createdAt: ago(18) },
        { planId: plan!.id, userId: a.operator.id, body: 'Noted. I will slow to 4.5 mph through there.', createdAt: ago(17) },
        { planId: plan!.id, userId: a.foreman.id, body: 'Spare chain for the second stage is on the truck.', createdAt: ago(15) },
      ])
    }
  }

  // Last season's corn in Schoolhouse 80, planted on the revision its seed-drop check led to; the
  // field checks (checks.ts) and the banded insecticide record (applications.ts) belong to it.
  const schoolhouse = fieldRows.find((f) => f.name === 'Schoolhouse 80')
  if (schoolhouse) {
    const last = (month: number, dayOfMonth: number, hour = 15) => new Date(Date.UTC(LAST_SEASON, month - 1, dayOfMonth, hour))
    const [plan] = await db.insert(schema.cropPlans).values({
      farmId, season: LAST_SEASON, fieldId: schoolhouse.id, crop: 'corn', targetStand: 33_000, survivalPercent: 95, rowSpacingIn: 30,
      windowStart: `${LAST_SEASON}-04-22`, windowEnd: `${LAST_SEASON}-05-02`, planterId: north!.id, speedMph: 5, marginPercent: 5, sortOrder: 1,
      status: 'planted', setupId: cornSetup!.id, proposedBy: a.operator.id, approvedRevision: 2, approvedBy: a.agronomist.id, approvedAt: last(4, 25),
      plantedOn: `${LAST_SEASON}-04-27`, plantedAcres: schoolhouse.acres, createdBy: a.agronomist.id, createdAt: last(3, 10),
    }).returning()
    await db.insert(schema.planEvents).values([
      { planId: plan!.id, fromStatus: null, toStatus: 'draft', comment: 'Plan created', userId: a.agronomist.id, createdAt: last(3, 10) },
      { planId: plan!.id, fromStatus: 'draft', toStatus: 'submitted', setupRevision: 1, comment: 'The shop setup as it came out.', userId: a.operator.id, createdAt: last(4, 21) },
      { planId: plan!.id, fromStatus: 'submitted', toStatus: 'approved', setupRevision: 2, comment: 'Revision 2 after the dig; go.', userId: a.agronomist.id, createdAt: last(4, 25) },
      { planId: plan!.id, fromStatus: 'approved', toStatus: 'set-up', setupRevision: 2, comment: 'Sprockets changed to 17/23 and 17/26.', userId: a.foreman.id, createdAt: last(4, 26) },
      { planId: plan!.id, fromStatus: 'set-up', toStatus: 'planted', setupRevision: 2, comment: null, userId: a.operator.id, createdAt: last(4, 27, 21) },
    ])
  }
}
