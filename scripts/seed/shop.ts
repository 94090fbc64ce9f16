import { and, eq } from 'drizzle-orm'
import * as schema from '../../server/db/schema'
import { DEFAULT_CHECKLIST, DEFAULT_CHECKLIST_NAME } from '../../shared/utils/checklist'
import type { SeedDb } from './index'
import { LAST_SEASON } from './plans'
import type { seedAccounts } from './accounts'

type Accounts = Awaited<ReturnType<typeof seedAccounts>>

const daysAgo = (n: number) => new Date(Date.now() - n * 86_400_000)
const isoDay = (d: Date) => d.toISOString().slice(0, 10)

// The shop's winter at Cottonwood Flats Farm: its checklists, one finished inspection of North 12
// with two things to fix, and a short maintenance log for both planters (all invented).
export async function seedShop(db: SeedDb, a: Accounts) {
  const farmId = a.farm.id
  const planter = async (name: string) => (await db.select().from(schema.planters).where(and(eq(schema.planters.farmId, farmId), eq(schema.planters.name, name))))[0]!
  const north = await planter('North 12')
  const creek = await planter('Creek 15')

  const [main] = await db.insert(schema.checklistTemplates).values({ farmId, name: DEFAULT_CHECKLIST_NAME, items: DEFAULT_CHECKLIST }).returning()
  await db.insert(schema.checklistTemplates).values({
    farmId, name: 'Mid-season quick look', items: [
      { area: 'Drive', label: 'Chains oiled and tight', hint: null },
      { area: 'Meters', label: 'Plates clean, no treatment build-up', hint: null },
      { area: 'Row units', label: 'Scrapers and press wheels clear of mud', hint: null },
    ],
  })

  const [ins] = await db.insert(schema.inspections).values({
    farmId, planterId: north.id, templateId: main!.id, templateName: main!.name, status: 'completed', inspectedBy: a.foreman.id,
    completedAt: daysAgo(6), createdAt: daysAgo(6), notes: 'Done in the machine shed after the wing cylinders were resealed.',
  }).returning()
  const results: Record<number, { result: 'ok' | 'needs-fixing' | 'replaced', notes?: string }> = {
    0: { result: 'needs-fixing', notes: 'Main drive chain about 2 % long; order a new length.' },
    6: { result: 'replaced', notes: 'Rows 3 and 10 opener discs under size; fitted new discs from the shelf.' },
    8: { result: 'needs-fixing', notes: 'Row 7 press wheel bearing rough.' },
  }
  const items = await db.insert(schema.inspectionItems).values(DEFAULT_CHECKLIST.map((it, i) => ({
    inspectionId: ins!.id, position: i + 1, area: it.area, label: it.label, hint: it.hint,
    result: results[i]?.result ?? 'ok' as const, notes: results[i]?.notes ?? null,
  }))).returning()
  await db.insert(schema.workItems).values([
    { farmId, planterId: north.id, inspectionItemId: items[0]!.id, title: `${items[0]!.area}: ${items[0]!.label}`, notes: results[0]!.notes, status: 'in-progress', assignedTo: a.foreman.id, createdBy: a.foreman.id },
    { farmId, planterId: north.id, inspectionItemId: items[8]!.id, title: `${items[8]!.area}: ${items[8]!.label}`, notes: results[8]!.notes, status: 'open', createdBy: a.foreman.id },
  ])

  // Last season's planting by North 12 (besides Schoolhouse 80, plans.ts), so the log has acres to
  // count since each service.
  const field = async (name: string) => (await db.select().from(schema.fields).where(and(eq(schema.fields.farmId, farmId), eq(schema.fields.name, name))))[0]
  const planted = [[await field('Home Quarter'), '05-08'], [await field('Big Pivot'), '05-12']] as const
  for (const [f, day] of planted) {
    if (!f) continue
    await db.insert(schema.cropPlans).values({ farmId, season: LAST_SEASON, fieldId: f.id, crop: 'corn', targetStand: 32_000, rowSpacingIn: 30, planterId: north.id, status: 'planted', plantedOn: `${LAST_SEASON}-${day}`, createdBy: a.owner.id, createdAt: new Date(`${LAST_SEASON}-03-01T15:00:00Z`) })
  }

  const inDays = (n: number) => isoDay(new Date(Date.now() + n * 86_400_000))
  await db.insert(schema.serviceEvents).values([
    { farmId, planterId: north.id, servicedOn: `${LAST_SEASON}-04-15`, task: 'Drive chains cleaned and oiled', intervalAcres: 250, notes: 'Soaked in chain oil overnight.', performedBy: a.foreman.id },
    { farmId, planterId: north.id, servicedOn: isoDay(daysAgo(150)), task: 'Wheel bearings repacked', nextDueOn: inDays(10), performedBy: a.foreman.id },
    { farmId, planterId: north.id, servicedOn: isoDay(daysAgo(30)), task: 'Wing fold cylinders resealed', notes: 'Both wings; no weeping after a week.', performedBy: a.foreman.id },
    { farmId, planterId: creek.id, servicedOn: isoDay(daysAgo(60)), task: 'Drive chains cleaned and oiled', intervalAcres: 300, nextDueOn: inDays(120), performedBy: a.operator.id },
  ])
}
