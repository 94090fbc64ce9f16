import Decimal from 'decimal.js'
import { seedingRateForStand } from './meter'
import { computeCapacity, daysToPlant, fillPlan, hopperCoverage, seedNeeds } from './planning'

export interface PlanLot {
  id: number
  lotNumber: string
  variety: string
  crop: string
  seedsPerLb: number
  germinationPercent: number
  unitKind: 'seeds' | 'lb'
  unitSize: number
  unitsOnHand: number
}

export interface PlanPlanter { id: number, name: string, rowCount: number, rowSpacingIn: number, seedHopperLb: number | null }

export interface SeasonPlan {
  id: number
  fieldName: string
  acres: number
  crop: string
  status: string
  targetStand: number
  survivalPercent: number
  marginPercent: number
  speedMph: number
  rowSpacingIn: number
  windowStart: string | null
  sortOrder: number
  lot: PlanLot | null
  planter: PlanPlanter | null
}

export interface PlanSeed {
  germinationPercent: number | null
  seedsPerAcre: number
  lbPerAcre: number | null
  seeds: number
  lb: number | null
  units: number | null
}

// Seeding rate = target stand ÷ (germination × survival); seed = rate × acres × (1 + margin); units
// by count or weight (see seedNeeds). Without a lot, germination is taken as 100 % and no units are counted.
export function planSeed(plan: Pick<SeasonPlan, 'targetStand' | 'survivalPercent' | 'marginPercent' | 'acres' | 'lot'>): PlanSeed {
  const lot = plan.lot
  const { seedsPerAcre } = seedingRateForStand({ targetStand: plan.targetStand, germinationPercent: lot?.germinationPercent ?? 100, survivalPercent: plan.survivalPercent })
  const needs = seedNeeds({
    seedsPerAcre,
    acres: plan.acres,
    marginPercent: plan.marginPercent,
    unitSeeds: lot?.unitKind === 'seeds' ? lot.unitSize : undefined,
    unitLb: lot?.unitKind === 'lb' ? lot.unitSize : undefined,
    seedsPerLb: lot?.seedsPerLb,
  })
  return {
    germinationPercent: lot?.germinationPercent ?? null,
    seedsPerAcre,
    lbPerAcre: lot ? new Decimal(seedsPerAcre).div(lot.seedsPerLb).toNumber() : null,
    seeds: needs.seeds,
    lb: needs.lb ?? null,
    units: needs.units ?? null,
  }
}

// Rows a planter plants at a plan's spacing: its toolbar width is fixed (rows × its own spacing), so
// split rows at half the spacing plant twice the rows, lifted units half; whole rows only.
export function rowsAtPlanSpacing(planter: Pick<PlanPlanter, 'rowCount' | 'rowSpacingIn'>, planRowSpacingIn: number): number {
  if (planRowSpacingIn === planter.rowSpacingIn) return planter.rowCount
  return Math.max(1, new Decimal(planter.rowCount).mul(planter.rowSpacingIn).div(planRowSpacingIn).floor().toNumber())
}

export interface PlanHopper { rowAcresPerFill: number, planterAcresPerFill: number, fills: number, refillStops: number }

// Acres per hopper fill from the row hopper's lb and seeds per lb (see hopperCoverage); with every row
// fed alike the planter covers rows × that, and a field needs ⌈acres ÷ planter acres per fill⌉ fills.
export function planHopper(plan: Pick<SeasonPlan, 'acres' | 'rowSpacingIn' | 'lot' | 'planter'>, seedsPerAcre: number): PlanHopper | null {
  const hopperLb = plan.planter?.seedHopperLb
  if (!hopperLb || !plan.lot) return null
  const h = hopperCoverage({ hopperLb, seedsPerLb: plan.lot.seedsPerLb, seedsPerAcre, rowSpacingIn: plan.rowSpacingIn, rows: rowsAtPlanSpacing(plan.planter!, plan.rowSpacingIn) })
  const f = fillPlan({ capacity: h.planterAcresPerFill!, ratePerAcre: 1, fieldAcres: plan.acres })
  return { rowAcresPerFill: h.rowAcresPerFill, planterAcresPerFill: h.planterAcresPerFill!, fills: f.fills, refillStops: f.refillStops }
}

export interface PlanCapacity { widthFt: number, acresPerHour: number, hours: number, days: number }

// Effective field capacity from the rows the planter plants at the plan's spacing and the plan's speed
// (see computeCapacity).
export function planCapacity(plan: Pick<SeasonPlan, 'acres' | 'rowSpacingIn' | 'speedMph' | 'planter'>, opts: { hoursPerDay: number, efficiencyPercent: number }): PlanCapacity | null {
  if (!plan.planter) return null
  const c = computeCapacity({ rows: rowsAtPlanSpacing(plan.planter, plan.rowSpacingIn), rowSpacingIn: plan.rowSpacingIn, speedMph: plan.speedMph, efficiencyPercent: opts.efficiencyPercent })
  const d = daysToPlant({ acres: plan.acres, acresPerHour: c.acresPerHour, hoursPerDay: opts.hoursPerDay })
  return { ...c, ...d }
}

// Monday of the ISO week a date falls in, as YYYY-MM-DD.
export function weekStartOf(date: string): string {
  const d = new Date(`${date}T00:00:00Z`)
  const back = (d.getUTCDay() + 6) % 7
  d.setUTCDate(d.getUTCDate() - back)
  return d.toISOString().slice(0, 10)
}

export interface SeasonSummary {
  totals: { plans: number, acres: number, seedsStillNeeded: number }
  crops: { crop: string, plans: number, acres: number, seeds: number, lb: number | null }[]
  lots: { lotId: number, lotNumber: string, variety: string, crop: string, unitKind: 'seeds' | 'lb', unitSize: number, seeds: number, lb: number, unitsNeeded: number, unitsOnHand: number, shortfall: number }[]
  withoutLot: { planId: number, fieldName: string, crop: string, seeds: number }[]
  planters: {
    planterId: number | null
    name: string
    widthFt: number | null
    acres: number
    hours: number | null
    days: number | null
    fields: { planId: number, fieldName: string, crop: string, status: string, acres: number, windowStart: string | null, acresPerHour: number | null, hours: number | null, days: number | null, acresPerFill: number | null, refillStops: number | null }[]
  }[]
  weeks: { weekStart: string, acres: number }[]
  unscheduledAcres: number
}

// The season in numbers. Seed still needed leaves out plans already planted; a lot's units needed
// are its plans' seed (or lb) added up and then rounded up to whole units once.
export function summariseSeason(plans: SeasonPlan[], opts: { hoursPerDay: number, efficiencyPercent: number }): SeasonSummary {
  const crops = new Map<string, { crop: string, plans: number, acres: Decimal, seeds: Decimal, lb: Decimal | null }>()
  const lots = new Map<number, { lot: PlanLot, seeds: Decimal, lb: Decimal }>()
  const withoutLot: SeasonSummary['withoutLot'] = []
  const boards = new Map<number | null, { planter: PlanPlanter | null, rows: SeasonSummary['planters'][number]['fields'] }>()
  const weeks = new Map<string, Decimal>()
  let unscheduled = new Decimal(0)
  let acres = new Decimal(0)
  let stillNeeded = new Decimal(0)

  const ordered = [...plans].sort((a, b) => a.sortOrder - b.sortOrder || (a.windowStart ?? '9999').localeCompare(b.windowStart ?? '9999') || a.id - b.id)
  for (const p of ordered) {
    const seed = planSeed(p)
    acres = acres.plus(p.acres)
    const c = crops.get(p.crop) ?? { crop: p.crop, plans: 0, acres: new Decimal(0), seeds: new Decimal(0), lb: new Decimal(0) }
    c.plans += 1
    c.acres = c.acres.plus(p.acres)
    if (p.status !== 'planted') {
      stillNeeded = stillNeeded.plus(seed.seeds)
      c.seeds = c.seeds.plus(seed.seeds)
      c.lb = c.lb && seed.lb !== null ? c.lb.plus(seed.lb) : null
      if (p.lot) {
        const l = lots.get(p.lot.id) ?? { lot: p.lot, seeds: new Decimal(0), lb: new Decimal(0) }
        l.seeds = l.seeds.plus(seed.seeds)
        l.lb = l.lb.plus(seed.lb ?? 0)
        lots.set(p.lot.id, l)
      } else {
        withoutLot.push({ planId: p.id, fieldName: p.fieldName, crop: p.crop, seeds: seed.seeds })
      }
    }
    crops.set(p.crop, c)

    const cap = planCapacity(p, opts)
    const hopper = planHopper(p, seed.seedsPerAcre)
    const key = p.planter?.id ?? null
    const board = boards.get(key) ?? { planter: p.planter, rows: [] }
    board.rows.push({
      planId: p.id, fieldName: p.fieldName, crop: p.crop, status: p.status, acres: p.acres, windowStart: p.windowStart,
      acresPerHour: cap?.acresPerHour ?? null, hours: cap?.hours ?? null, days: cap?.days ?? null,
      acresPerFill: hopper?.planterAcresPerFill ?? null, refillStops: hopper?.refillStops ?? null,
    })
    boards.set(key, board)

    if (p.windowStart) {
      const w = weekStartOf(p.windowStart)
      weeks.set(w, (weeks.get(w) ?? new Decimal(0)).plus(p.acres))
    } else {
      unscheduled = unscheduled.plus(p.acres)
    }
  }

  return {
    totals: { plans: plans.length, acres: acres.toNumber(), seedsStillNeeded: stillNeeded.toNumber() },
    crops: [...crops.values()].sort((a, b) => a.crop.localeCompare(b.crop)).map((c) => ({ crop: c.crop, plans: c.plans, acres: c.acres.toNumber(), seeds: c.seeds.toNumber(), lb: c.lb?.toNumber() ?? null })),
    lots: [...lots.values()].sort((a, b) => a.lot.crop.localeCompare(b.lot.crop) || a.lot.lotNumber.localeCompare(b.lot.lotNumber)).map(({ lot, seeds, lb }) => {
      const unitsNeeded = (lot.unitKind === 'seeds' ? seeds.div(lot.unitSize) : lb.div(lot.unitSize)).ceil().toNumber()
      return {
        lotId: lot.id, lotNumber: lot.lotNumber, variety: lot.variety, crop: lot.crop, unitKind: lot.unitKind, unitSize: lot.unitSize,
        seeds: seeds.toNumber(), lb: lb.toNumber(), unitsNeeded, unitsOnHand: lot.unitsOnHand, shortfall: Math.max(0, new Decimal(unitsNeeded).minus(lot.unitsOnHand).ceil().toNumber()),
      }
    }),
    withoutLot,
    planters: [...boards.values()].sort((a, b) => (a.planter?.name ?? '\uffff').localeCompare(b.planter?.name ?? '\uffff')).map((b) => {
      const hours = b.planter ? b.rows.reduce((s, r) => s.plus(r.hours ?? 0), new Decimal(0)) : null
      return {
        planterId: b.planter?.id ?? null,
        name: b.planter?.name ?? 'No planter yet',
        widthFt: b.planter ? new Decimal(b.planter.rowCount).mul(b.planter.rowSpacingIn).div(12).toNumber() : null,
        acres: b.rows.reduce((s, r) => s.plus(r.acres), new Decimal(0)).toNumber(),
        hours: hours?.toNumber() ?? null,
        days: hours ? hours.div(opts.hoursPerDay).toNumber() : null,
        fields: b.rows,
      }
    }),
    weeks: [...weeks.entries()].sort(([a], [b]) => a.localeCompare(b)).map(([weekStart, a]) => ({ weekStart, acres: a.toNumber() })),
    unscheduledAcres: unscheduled.toNumber(),
  }
}

// The season being planned: from August on, next spring's.
export function defaultSeason(now: Date = new Date()): number {
  return now.getUTCMonth() >= 7 ? now.getUTCFullYear() + 1 : now.getUTCFullYear()
}
