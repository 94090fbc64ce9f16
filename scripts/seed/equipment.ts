import { eq } from 'drizzle-orm'
import * as schema from '../../server/db/schema'
import { computeSetupResults } from '../../shared/utils/setup-results'
import type { SetupConfig, SetupRowUnit } from '../../shared/types/setup'
import { defaultSeason } from '../../shared/utils/season'
import type { SeedDb } from './index'
import type { seedAccounts } from './accounts'

type Accounts = Awaited<ReturnType<typeof seedAccounts>>

// Invented inventory and two planters of different frames for Cottonwood Flats Farm.
export async function seedEquipment(db: SeedDb, a: Accounts) {
  const farmId = a.farm.id
  const plates = await db.insert(schema.seedPlates).values([
    { farmId, code: 'CF-C30', crops: ['corn'], cellsPerPlate: 30, cellDescription: 'round-flat kernels, medium', seedsPerLbMin: 1_300, seedsPerLbMax: 1_700, quantityOnHand: 14, wearNotes: 'Two with worn cell edges, kept for spares' },
    { farmId, code: 'CF-C24', crops: ['corn'], cellsPerPlate: 24, cellDescription: 'large flats and rounds', seedsPerLbMin: 1_100, seedsPerLbMax: 1_400, quantityOnHand: 12 },
    { farmId, code: 'CF-C16', crops: ['corn', 'sunflower'], cellsPerPlate: 16, cellDescription: 'low-rate and large seed', seedsPerLbMin: 700, seedsPerLbMax: 1_200, quantityOnHand: 4 },
    { farmId, code: 'CF-S48', crops: ['soybeans'], cellsPerPlate: 48, cellDescription: 'soybean, medium', seedsPerLbMin: 2_400, seedsPerLbMax: 3_200, quantityOnHand: 16 },
    { farmId, code: 'CF-S60', crops: ['soybeans', 'dry beans'], cellsPerPlate: 60, cellDescription: 'soybean, small', seedsPerLbMin: 2_900, seedsPerLbMax: 3_800, quantityOnHand: 9 },
    { farmId, code: 'CF-G36', crops: ['sorghum'], cellsPerPlate: 36, cellDescription: 'grain sorghum', seedsPerLbMin: 12_000, seedsPerLbMax: 18_000, quantityOnHand: 6 },
  ]).returning()
  const plate = (code: string) => plates.find((p) => p.code === code)!
  await db.insert(schema.sprockets).values([15, 16, 17, 18, 19, 20, 21, 22, 23, 24, 25, 26, 27, 28].map((teeth) => ({ farmId, teeth, chainPitch: '#40', quantityOnHand: teeth % 3 === 0 ? 1 : 2 })))

  const [north] = await db.insert(schema.planters).values({
    farmId, name: 'North 12', frameKind: 'folding', rowCount: 12, rowSpacingIn: 30, transportWidthFt: 15.5,
    tireDescription: '7.60-15 drive tire at 32 psi', wheelCircumferenceIn: 86.4, circumferenceRevolutions: 10, circumferenceDistanceFt: 72,
    slipPercent: 3, meterRatio: 1, seedHopperLb: 95, granularHopperLb: 35, notes: 'Main corn planter. Wing fold cylinders resealed last winter.',
  }).returning()
  const [northDrive] = await db.insert(schema.driveSections).values({ planterId: north!.id, name: 'Main drive', rows: Array.from({ length: 12 }, (_, i) => i + 1) }).returning()
  await db.insert(schema.driveStages).values([
    { sectionId: northDrive!.id, position: 1, chainPitch: '#40', driverTeeth: 17, drivenTeeth: 23, driverOptions: [15, 17, 19, 21, 23, 25, 27], drivenOptions: [15, 17, 19, 21, 23, 25] },
    { sectionId: northDrive!.id, position: 2, chainPitch: '#40', driverTeeth: 17, drivenTeeth: 26, driverOptions: [17, 19, 22], drivenOptions: [20, 24, 26, 28] },
  ])
  await db.insert(schema.rowUnits).values(Array.from({ length: 12 }, (_, i) => ({
    planterId: north!.id, position: i + 1, opener: 'double-disc' as const, gaugeWheels: '4.5 × 16 in rubber', depthIn: 1.75, downPressureLb: i === 5 || i === 6 ? 250 : 150,
    pressWheel: 'open-center' as const, pressWheelWidthIn: 2, covering: 'disc' as const, furrower: false, seedPlateId: plate('CF-C30').id,
    granular: i % 2 === 0 ? 'insecticide' as const : 'none' as const, granularBandWidthIn: i % 2 === 0 ? 7 : null, granularDialSetting: i % 2 === 0 ? 18 : null, fertilizerSetting: '2x2 at 6 gal/acre',
  })))

  const [creek] = await db.insert(schema.planters).values({
    farmId, name: 'Creek 15', frameKind: 'toolbar', rowCount: 15, rowSpacingIn: 15, transportWidthFt: 20,
    tireDescription: '6.70-15 drive tire at 28 psi', wheelCircumferenceIn: 83.2, slipPercent: 4, meterRatio: 1, seedHopperLb: 60,
    notes: 'Eight 30 in units with seven split-row units between them for narrow-row beans.',
  }).returning()
  const odd = Array.from({ length: 8 }, (_, i) => i * 2 + 1)
  const even = Array.from({ length: 7 }, (_, i) => i * 2 + 2)
  const [creekMain] = await db.insert(schema.driveSections).values({ planterId: creek!.id, name: 'Main bar', rows: odd, sortOrder: 0 }).returning()
  const [creekSplit] = await db.insert(schema.driveSections).values({ planterId: creek!.id, name: 'Split bar', rows: even, sortOrder: 1 }).returning()
  await db.insert(schema.driveStages).values([
    { sectionId: creekMain!.id, position: 1, chainPitch: '#40', driverTeeth: 15, drivenTeeth: 25, driverOptions: [15, 17, 19, 23, 25], drivenOptions: [15, 19, 23, 25] },
    { sectionId: creekSplit!.id, position: 1, chainPitch: '#40', driverTeeth: 15, drivenTeeth: 25, driverOptions: [15, 17, 19, 23], drivenOptions: [17, 19, 23, 25] },
  ])
  await db.insert(schema.rowUnits).values(Array.from({ length: 15 }, (_, i) => ({
    planterId: creek!.id, position: i + 1, opener: (i % 2 === 0 ? 'double-disc' : 'runner') as 'double-disc' | 'runner', gaugeWheels: i % 2 === 0 ? '4 × 13 in rubber' : 'single wheel', depthIn: 1.25,
    downPressureLb: null, pressWheel: (i % 2 === 0 ? 'center-rib' : 'semi-pneumatic') as 'center-rib' | 'semi-pneumatic', pressWheelWidthIn: 3, covering: 'knife' as const, furrower: i % 2 === 1,
    seedPlateId: plate('CF-S48').id, granular: 'none' as const,
  })))

  const planterRows = async (planterId: number): Promise<SetupRowUnit[]> => (await db.select().from(schema.rowUnits).where(eq(schema.rowUnits.planterId, planterId)))
    .sort((x, y) => x.position - y.position)
    .map(({ id: _id, planterId: _p, createdAt: _c, updatedAt: _u, ...u }) => u)
  const northConfig: SetupConfig = {
    crop: 'corn', targetSeedsPerAcre: 34_000, rowSpacingIn: 30, speedMph: 5, wheelCircumferenceIn: 86.4, slipPercent: 3, meterRatio: 1,
    sections: [{ sectionId: northDrive!.id, name: 'Main drive', rows: northDrive!.rows, seedPlateId: plate('CF-C30').id, plateCode: 'CF-C30', cellsPerPlate: 30, stages: [{ position: 1, driverTeeth: 19, drivenTeeth: 23 }, { position: 2, driverTeeth: 17, drivenTeeth: 28 }] }],
    rowUnits: await planterRows(north!.id),
  }
  const northV2: SetupConfig = { ...northConfig, sections: [{ ...northConfig.sections[0]!, stages: [{ position: 1, driverTeeth: 17, drivenTeeth: 23 }, { position: 2, driverTeeth: 17, drivenTeeth: 26 }] }] }
  const northV3: SetupConfig = { ...northV2, rowUnits: northV2.rowUnits.map((u) => ({ ...u, depthIn: 2 })) }
  const creekRows = await planterRows(creek!.id)
  const creekConfig: SetupConfig = {
    crop: 'soybeans', targetSeedsPerAcre: 140_000, rowSpacingIn: 15, speedMph: 4.5, wheelCircumferenceIn: 83.2, slipPercent: 4, meterRatio: 1,
    sections: [
      { sectionId: creekMain!.id, name: 'Main bar', rows: odd, seedPlateId: plate('CF-S48').id, plateCode: 'CF-S48', cellsPerPlate: 48, stages: [{ position: 1, driverTeeth: 15, drivenTeeth: 25 }] },
      { sectionId: creekSplit!.id, name: 'Split bar', rows: even, seedPlateId: plate('CF-S48').id, plateCode: 'CF-S48', cellsPerPlate: 48, stages: [{ position: 1, driverTeeth: 15, drivenTeeth: 25 }] },
    ],
    rowUnits: creekRows,
  }
  // Revisions saved on the given dates, else one a day up to yesterday.
  const saved = async (planterId: number, name: string, by: number, revisions: { config: SetupConfig, note: string, by?: number, savedAt?: Date }[]) => {
    const savedAt = revisions.map((r, i) => r.savedAt ?? new Date(Date.now() - (revisions.length - i) * 86_400_000))
    const [setup] = await db.insert(schema.setups).values({ farmId, planterId, name, crop: revisions[0]!.config.crop, latestRevision: revisions.length, createdBy: by, createdAt: savedAt[0], updatedAt: savedAt[savedAt.length - 1] }).returning()
    await db.insert(schema.setupRevisions).values(revisions.map((r, i) => ({
      setupId: setup!.id, revision: i + 1, config: r.config, results: computeSetupResults(r.config), note: r.note, savedBy: r.by ?? by, savedAt: savedAt[i],
    })))
    return setup!
  }
  // The corn setup planted last spring (revisions 1 and 2), readied in the shop for the coming one (3).
  const lastSpring = (month: number, dayOfMonth: number) => new Date(Date.UTC(defaultSeason() - 1, month - 1, dayOfMonth, 15))
  const cornSetup = await saved(north!.id, 'North 12 · corn 34k · river bottoms', a.operator.id, [
    { config: northConfig, note: 'As the planter came out of the shop.', savedAt: lastSpring(4, 20) },
    { config: northV2, note: 'Dropped to 17/23 and 17/26 after the seed-drop check ran about 4 % high.', savedAt: lastSpring(4, 24) },
    { config: northV3, note: 'Deeper into moisture for the sandy knobs.', by: a.foreman.id },
  ])
  const beanSetup = await saved(creek!.id, 'Creek 15 · soybeans 140k · 15 in', a.operator.id, [{ config: creekConfig, note: 'Narrow-row beans, both bars on the 48-cell plate.' }])
  await db.insert(schema.setupComments).values([
    { setupId: cornSetup.id, revision: 2, userId: a.agronomist.id, body: 'Revision 2 lands within 1 % of target. Keep the 2 in depth on the sandy knobs only if moisture is short.', createdAt: lastSpring(4, 24) },
    { setupId: cornSetup.id, revision: 3, userId: a.operator.id, body: 'Moisture is short on the knobs; going with 2 in everywhere on this field.' },
  ])
  return { planters: [north!, creek!], setups: [cornSetup, beanSetup], plates }
}
