import { and, asc, eq, inArray } from 'drizzle-orm'
import * as schema from '../../server/db/schema'
import { seedingRateForStand } from '../../shared/utils/meter'
import { parseSpacingCsv, spacingHistogram, spacingQuality, standCountSummary, cornYieldLossFromSpacingSd } from '../../shared/utils/field-checks'
import { seedDropSummary } from '../../shared/utils/seed-drop'
import { solveDrive } from '../../shared/utils/solver'
import type { SeedDropResults, SpacingResults, StandCountResults } from '../../shared/types/checks'
import type { SeedDb } from './index'
import { LAST_SEASON } from './plans'
import type { seedAccounts } from './accounts'

type Accounts = Awaited<ReturnType<typeof seedAccounts>>

// Invented checks on the corn setup in Schoolhouse 80: a dig behind the planter, a stand count and
// a tape run of spacings, one of them reviewed by the agronomist.
export async function seedChecks(db: SeedDb, a: Accounts) {
  const farmId = a.farm.id
  const [setup] = await db.select().from(schema.setups).where(and(eq(schema.setups.farmId, farmId), eq(schema.setups.crop, 'corn'))).orderBy(asc(schema.setups.id)).limit(1)
  if (!setup) return
  // Last season's checks were made on revision 2, the one Schoolhouse 80 was planted with.
  const [rev] = await db.select().from(schema.setupRevisions).where(and(eq(schema.setupRevisions.setupId, setup.id), eq(schema.setupRevisions.revision, Math.min(2, setup.latestRevision))))
  const [planter] = await db.select().from(schema.planters).where(eq(schema.planters.id, setup.planterId))
  const [field] = await db.select().from(schema.fields).where(and(eq(schema.fields.farmId, farmId), eq(schema.fields.name, 'Schoolhouse 80')))
  const { config, results: computed } = rev!
  const section = config.sections[0]!
  const stages = await db.select().from(schema.driveStages).where(eq(schema.driveStages.sectionId, section.sectionId!)).orderBy(asc(schema.driveStages.position))
  const plates = await db.select().from(schema.seedPlates).where(and(eq(schema.seedPlates.farmId, farmId), inArray(schema.seedPlates.code, ['CF-C30', 'CF-C24', 'CF-C16'])))
  const lengthFt = 17.424
  // Last season's plan on this field, when the plans were seeded: its targets apply, as on the server.
  const [plan] = field ? await db.select({ plan: schema.cropPlans, germinationPercent: schema.seedLots.germinationPercent }).from(schema.cropPlans)
    .leftJoin(schema.seedLots, eq(schema.seedLots.id, schema.cropPlans.seedLotId))
    .where(and(eq(schema.cropPlans.farmId, farmId), eq(schema.cropPlans.fieldId, field.id), eq(schema.cropPlans.season, LAST_SEASON))).limit(1) : []
  const target = plan ? seedingRateForStand({ targetStand: plan.plan.targetStand, germinationPercent: plan.germinationPercent ?? 100, survivalPercent: plan.plan.survivalPercent }).seedsPerAcre : config.targetSeedsPerAcre
  const targetStand = plan?.plan.targetStand ?? 32_000
  const year = LAST_SEASON
  const link = { farmId, setupId: setup.id, setupRevision: rev!.revision, fieldId: field?.id ?? null, planId: plan?.plan.id ?? null, authorId: a.operator.id }

  const dig = { rows: [{ row: 1, seedsCounted: 33 }, { row: 6, seedsCounted: 32 }, { row: 12, seedsCounted: 34 }], lengthFt }
  const s = seedDropSummary({ ...dig, rowSpacingIn: config.rowSpacingIn, wheelCircumferenceIn: config.wheelCircumferenceIn, setupSeedsPerAcre: computed.seedsPerAcre, setupSlipPercent: config.slipPercent, targetSeedsPerAcre: target, planterSlipPercent: planter!.slipPercent })
  const choices = solveDrive({
    targetSeedsPerAcre: s.solverTargetSeedsPerAcre, rowSpacingIn: config.rowSpacingIn, wheelCircumferenceIn: planter!.wheelCircumferenceIn, slipPercent: planter!.slipPercent, meterRatio: planter!.meterRatio,
    stages: stages.map((st) => ({ position: st.position, driverTeeth: st.driverTeeth, drivenTeeth: st.drivenTeeth, driverOptions: st.driverOptions, drivenOptions: st.drivenOptions })),
    plates: plates.map((p) => ({ id: p.id, code: p.code, cellsPerPlate: p.cellsPerPlate })), installedPlateId: section.seedPlateId, limit: 3,
  })
  const { solverTargetSeedsPerAcre, ...summary } = s
  const seedDrop: SeedDropResults = { ...summary, rowSpacingIn: config.rowSpacingIn, setupSeedsPerAcre: computed.seedsPerAcre, targetSeedsPerAcre: target, targetFrom: plan ? 'plan' : 'setup', setupSlipPercent: config.slipPercent, fix: { solverTargetSeedsPerAcre, choices, message: null } }

  const counts = [31, 33, 30, 32, 29, 32]
  const stand = standCountSummary({ counts, lengthFt, rowSpacingIn: config.rowSpacingIn })
  const standResults: StandCountResults = {
    ...stand, lengthFt, rowSpacingIn: config.rowSpacingIn, targetStand, targetFrom: plan ? 'plan' : 'entered', errorVsTargetPercent: (stand.meanPerAcre / targetStand - 1) * 100,
    seedsDroppedPerAcre: s.seedsPerAcre, seedsDroppedFrom: 'the seed-drop check on this revision', survivalPercent: stand.meanPerAcre / s.seedsPerAcre * 100,
  }

  // A tape run along row 6: mostly near the theoretical spacing, two doubles and a skip.
  const tape = '6.1\n5.8\n6.4\n6.0\n2.9\n3.3\n6.2\n12.4\n5.9\n6.3\n6.6\n5.7\n6.1\n6.0\n5.5\n6.8\n6.2\n2.7\n6.0\n6.1\n'
  const spacingsIn = parseSpacingCsv(tape).values
  const theoreticalIn = computed.seedSpacingIn
  const q = spacingQuality({ spacingsIn, theoreticalIn })
  const spacing: SpacingResults = { ...q, theoreticalIn, histogram: spacingHistogram({ spacingsIn, theoreticalIn }), cornYieldLossBuPerAcre: cornYieldLossFromSpacingSd({ spacingSdIn: q.sdIn }).buPerAcre }

  await db.insert(schema.fieldChecks).values([
    { ...link, kind: 'seed-drop', rows: [1, 6, 12], checkedOn: `${year}-04-27`, createdAt: new Date(`${year}-04-27T20:00:00Z`), inputs: { kind: 'seed-drop', ...dig }, results: seedDrop, note: 'Dug behind the planter on the first pass.',
      reviewStatus: 'correction-needed', reviewComment: 'Light against the plan. Check the drive tire pressure, then take the solver\'s first choice.', reviewedBy: a.agronomist.id, reviewedAt: new Date(`${year}-04-27T23:00:00Z`) },
    { ...link, kind: 'stand-count', rows: [1, 6, 12], checkedOn: `${year}-05-18`, createdAt: new Date(`${year}-05-18T20:00:00Z`), inputs: { kind: 'stand-count', counts, lengthFt }, results: standResults, note: 'Six counts across the field after emergence.' },
    { ...link, kind: 'spacing', rows: [6], checkedOn: `${year}-05-18`, createdAt: new Date(`${year}-05-18T20:30:00Z`), inputs: { kind: 'spacing', row: 6, spacingsIn, theoreticalIn }, results: spacing },
  ])
}
