import { and, eq } from 'drizzle-orm'
import * as schema from '../../server/db/schema'
import { fitCatchTest } from '../../shared/utils/application'
import { computeSetupResults } from '../../shared/utils/setup-results'
import type { SeedDb } from './index'
import { LAST_SEASON } from './plans'
import type { seedAccounts } from './accounts'

type Accounts = Awaited<ReturnType<typeof seedAccounts>>

// Invented products with plainly fictional registration numbers (company 00000 does not exist).
const ROWGUARD = { productName: 'Rowguard 15G', epaRegNumber: '00000-15' }
const FURROWSHIELD = { productName: 'Furrowshield 20G', epaRegNumber: '00000-27' }

// A catch test on the corn setup and a season of application records for Cottonwood Flats Farm.
export async function seedApplications(db: SeedDb, a: Accounts) {
  const farmId = a.farm.id
  const [corn] = await db.select().from(schema.setups).where(and(eq(schema.setups.farmId, farmId), eq(schema.setups.name, 'North 12 · corn 34k · river bottoms')))
  let runId: number | null = null
  if (corn) {
    const [source] = await db.select().from(schema.setupRevisions).where(and(eq(schema.setupRevisions.setupId, corn.id), eq(schema.setupRevisions.revision, corn.latestRevision)))
    // A setup of its own for the banded insecticide, so the granular dial has a history apart from the seed rate's.
    const bandSavedAt = new Date(Date.UTC(LAST_SEASON, 3, 23, 15))
    const [band] = await db.insert(schema.setups).values({ farmId, planterId: corn.planterId, name: 'North 12 · rootworm band · Schoolhouse 80', crop: 'corn', latestRevision: 1, createdBy: a.operator.id, createdAt: bandSavedAt, updatedAt: bandSavedAt }).returning()
    const [rev] = await db.insert(schema.setupRevisions).values({
      setupId: band!.id, revision: 1, config: source!.config, results: computeSetupResults(source!.config), savedBy: a.operator.id,
      note: 'The corn setup with Rowguard 15G in a 7 in band on the odd rows.', savedAt: bandSavedAt,
    }).returning()
    // 250 ft course at 30 in: each ounce is 4.356 lb per field acre (computed).
    const points = [{ setting: 14, weightOz: 1.55 }, { setting: 18, weightOz: 2.0 }, { setting: 22, weightOz: 2.45 }]
    const fit = fitCatchTest({ points, courseFt: 250, rowSpacingIn: 30, targetLbPerAcre: 8.7, currentSetting: 18 })
    const [run] = await db.insert(schema.calibrationRuns).values({
      farmId, setupId: band!.id, setupRevisionId: rev!.id, revision: 1, productName: ROWGUARD.productName, rows: [1, 7], courseFt: 250, rowSpacingIn: 30,
      targetLbPerAcre: 8.7, points, fit, r2: fit.r2, dialSetting: 18, note: 'Rows 1 and 7 caught in the yard; the dial stays at 18.', runBy: a.operator.id,
      createdAt: new Date(Date.UTC(LAST_SEASON, 3, 24, 15)),
    }).returning()
    runId = run!.id
  }
  const known = await db.select({ id: schema.fields.id, name: schema.fields.name }).from(schema.fields).where(eq(schema.fields.farmId, farmId))
  const fieldId = (name: string) => known.find((f) => f.name === name)?.id ?? null
  const base = { farmId, crop: 'corn', applicatorName: 'Luis Brandt', recordedBy: a.operator.id, rowSpacingIn: 30 }
  const at = (d: string) => new Date(`${d}T20:00:00Z`)
  const [first] = await db.insert(schema.applicationRecords).values({
    ...base, ...ROWGUARD, season: LAST_SEASON, appliedOn: `${LAST_SEASON}-04-27`, appliedTime: '08:15', fieldId: fieldId('Schoolhouse 80'), fieldName: 'Schoolhouse 80', location: 'North side of the schoolhouse road',
    restrictedUse: true, rate: 8.7, rateUnit: 'lb/acre', totalAmount: 690, totalUnit: 'lb', areaTreatedAcres: 80, bandWidthIn: 7, certificationNumber: 'PA-CF-0417',
    calibrationRunId: runId, weatherNotes: 'Sunny, 58 °F, wind SW 6 mph, soil moist', createdAt: at(`${LAST_SEASON}-04-27`),
  }).returning()
  await db.insert(schema.applicationRecords).values({
    ...base, ...ROWGUARD, season: LAST_SEASON, appliedOn: `${LAST_SEASON}-04-27`, appliedTime: '08:15', fieldId: fieldId('Schoolhouse 80'), fieldName: 'Schoolhouse 80', location: 'North side of the schoolhouse road',
    restrictedUse: true, rate: 8.7, rateUnit: 'lb/acre', totalAmount: 696, totalUnit: 'lb', areaTreatedAcres: 80, bandWidthIn: 7, certificationNumber: 'PA-CF-0417',
    calibrationRunId: runId, weatherNotes: 'Sunny, 58 °F, wind SW 6 mph, soil moist', correctsId: first!.id,
    correctionReason: 'Weighed the leftover in the boxes: 696 lb went on, not 690.', createdAt: at(`${LAST_SEASON}-04-29`),
  })
  await db.insert(schema.applicationRecords).values([
    {
      ...base, ...FURROWSHIELD, season: LAST_SEASON, appliedOn: `${LAST_SEASON}-05-04`, appliedTime: '13:40', fieldId: fieldId('Sand Knob'), fieldName: 'Sand Knob', restrictedUse: false,
      rate: 6.5, rateUnit: 'oz/1000 ft', totalAmount: 512, totalUnit: 'lb', areaTreatedAcres: 72.3, bandWidthIn: 7, weatherNotes: 'Overcast, 64 °F, wind N 9 mph', createdAt: at(`${LAST_SEASON}-05-04`),
    },
    {
      ...base, season: LAST_SEASON, appliedOn: `${LAST_SEASON}-05-06`, fieldId: fieldId('Creek Bottom North'), fieldName: 'Creek Bottom North', productName: 'Starter 10-34-0 (farm blend)', restrictedUse: false,
      rate: 6, rateUnit: 'gal/acre', totalAmount: 387, totalUnit: 'gal', areaTreatedAcres: 64.5, notes: '2x2 placement, checked flow with a 60 s catch on rows 3 and 10', createdAt: at(`${LAST_SEASON}-05-06`),
    },
    {
      ...base, ...ROWGUARD, season: LAST_SEASON - 1, appliedOn: `${LAST_SEASON - 1}-05-01`, appliedTime: '09:00', fieldId: fieldId('Schoolhouse 80'), fieldName: 'Schoolhouse 80', restrictedUse: true, rate: 8.7, rateUnit: 'lb/acre', totalAmount: 701,
      totalUnit: 'lb', areaTreatedAcres: 80, bandWidthIn: 7, certificationNumber: 'PA-CF-0417', weatherNotes: 'Clear, 61 °F, calm', createdAt: at(`${LAST_SEASON - 1}-05-02`),
    },
  ])
}
