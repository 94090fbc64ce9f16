import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { planCapacity, planSeed, planHopper, rowsAtPlanSpacing, summariseSeason, weekStartOf, type PlanLot, type SeasonPlan } from '../../shared/utils/season'
import { planActions, PLAN_NEXT, PLAN_STATUS_ROLES } from '../../shared/utils/plan-workflow'

// An invented season, computed by hand below each figure.
const corn: PlanLot = { id: 1, lotNumber: 'C-1', variety: 'Prairie Gold 104', crop: 'corn', seedsPerLb: 1600, germinationPercent: 95, unitKind: 'seeds', unitSize: 80_000, unitsOnHand: 50 }
const soy: PlanLot = { id: 2, lotNumber: 'S-1', variety: 'Creekbend 31', crop: 'soybeans', seedsPerLb: 2800, germinationPercent: 90, unitKind: 'lb', unitSize: 50, unitsOnHand: 100 }
const planter = { id: 7, name: 'Sixteen', rowCount: 16, rowSpacingIn: 30, seedHopperLb: 50 }
const base = { survivalPercent: 100, speedMph: 6, rowSpacingIn: 30, sortOrder: 0, planter }
const plans: SeasonPlan[] = [
  { ...base, id: 1, fieldName: 'North', acres: 100, crop: 'corn', status: 'approved', targetStand: 30_400, marginPercent: 3, windowStart: '2027-04-21', lot: corn },
  { ...base, id: 2, fieldName: 'Creek', acres: 45, crop: 'corn', status: 'draft', targetStand: 30_400, marginPercent: 3, windowStart: '2027-04-26', lot: corn },
  { ...base, id: 3, fieldName: 'Hill', acres: 80, crop: 'soybeans', status: 'submitted', targetStand: 126_000, marginPercent: 0, windowStart: '2027-05-09', lot: soy },
  { ...base, id: 4, fieldName: 'Early', acres: 40, crop: 'corn', status: 'planted', targetStand: 30_400, marginPercent: 3, windowStart: null, lot: corn },
]

describe('plan seed', () => {
  it('seeding rate = target ÷ (germination × survival): 30,400 at 95 % and 100 % → 32,000 seeds/acre (Ohio State University, Thomison; figures computed)', () => {
    const s = planSeed(plans[0]!)
    expect(s.seedsPerAcre).toBeCloseTo(32_000, 9)
    // 32,000 × 100 ac × 1.03 = 3,296,000 seeds; ÷ 80,000 = 41.2 → 42 units; ÷ 1,600 seeds/lb = 2,060 lb.
    expect(s.seeds).toBeCloseTo(3_296_000, 6)
    expect(s.units).toBe(42)
    expect(s.lb).toBeCloseTo(2060, 9)
    expect(s.lbPerAcre).toBeCloseTo(20, 9)
  })

  it('150,000 seeds/acre at 2,750 seeds/lb → 54.5 lb/acre (Iowa State University, Agron 212)', () => {
    const lot = { ...soy, seedsPerLb: 2750, germinationPercent: 100 }
    expect(planSeed({ targetStand: 150_000, survivalPercent: 100, marginPercent: 0, acres: 1, lot }).lbPerAcre).toBeCloseTo(54.5, 1)
  })

  it('140,000 soybean seeds weigh 50 lb at 2,800 seeds/lb (University of Missouri IPM, Wiebold 2008): 140,000/acre on one acre is one 50 lb unit', () => {
    const s = planSeed({ targetStand: 126_000, survivalPercent: 100, marginPercent: 0, acres: 1, lot: soy })
    expect(s.lb).toBeCloseTo(50, 9)
    expect(s.units).toBe(1)
  })

  it('without a lot takes germination as 100 % and counts no units', () => {
    expect(planSeed({ targetStand: 30_000, survivalPercent: 100, marginPercent: 0, acres: 10, lot: null })).toEqual({ germinationPercent: null, seedsPerAcre: 30_000, lbPerAcre: null, seeds: 300_000, lb: null, units: null })
  })

  it('hopper: 50 lb × 1,600 seeds/lb ÷ 32,000 seeds/acre = 2.5 row-acres per fill, 16 rows → 40 acres; 100 acres → 3 fills, 2 refill stops (computed)', () => {
    expect(planHopper(plans[0]!, 32_000)).toEqual({ rowAcresPerFill: 2.5, planterAcresPerFill: 40, fills: 3, refillStops: 2 })
    expect(planHopper({ ...plans[0]!, planter: { ...planter, seedHopperLb: null } }, 32_000)).toBeNull()
  })
})

describe('season summary', () => {
  const s = summariseSeason(plans, { hoursPerDay: 10, efficiencyPercent: 70 })

  it('adds a lot’s seed over its plans and rounds up once: 3,296,000 + 1,483,200 = 4,779,200 seeds → 59.74 → 60 units, 10 short of 50 (computed)', () => {
    const c = s.lots.find((l) => l.lotNumber === 'C-1')!
    expect(c.seeds).toBeCloseTo(4_779_200, 6)
    expect(c.unitsNeeded).toBe(60)
    expect(c.shortfall).toBe(10)
    // 140,000 × 80 ac = 11,200,000 seeds ÷ 2,800 = 4,000 lb ÷ 50 lb = 80 units; 100 on hand.
    const b = s.lots.find((l) => l.lotNumber === 'S-1')!
    expect(b).toMatchObject({ unitsNeeded: 80, unitsOnHand: 100, shortfall: 0 })
    expect(b.lb).toBeCloseTo(4000, 9)
  })

  it('totals per crop: acres of every plan, seed still needed without the planted field', () => {
    expect(s.crops.map((c) => [c.crop, c.plans, c.acres])).toEqual([['corn', 3, 185], ['soybeans', 1, 80]])
    expect(s.crops[0]!.seeds).toBeCloseTo(4_779_200, 6)
    expect(s.crops[1]!.seeds).toBeCloseTo(11_200_000, 6)
    expect(s.totals).toMatchObject({ plans: 4, acres: 265 })
  })

  it('planter board: 40 ft at 6 mph and 70 % → 20.4 acres/h (Iowa State University Extension, Ag Decision Maker A3-24 / PM 696); 265 acres → 13.01 h, 1.3 days at 10 h', () => {
    const board = s.planters[0]!
    expect(board.widthFt).toBe(40)
    expect(board.fields.map((f) => f.fieldName)).toEqual(['North', 'Creek', 'Hill', 'Early'])
    expect(board.fields[0]!.acresPerHour).toBeCloseTo(20.4, 1)
    expect(board.fields[0]!.refillStops).toBe(2)
    expect(board.hours).toBeCloseTo(265 / (6 * 40 * 0.7 / 8.25), 9)
    expect(board.days).toBeCloseTo(265 / (6 * 40 * 0.7 / 8.25) / 10, 9)
  })

  it('a plan at another row spacing than its planter keeps the toolbar width: 16 rows at 30 in split to 32 at 15 in, still 40 ft and 20.4 acres/h (PM 696 as above; rows computed)', () => {
    expect(rowsAtPlanSpacing(planter, 15)).toBe(32)
    expect(rowsAtPlanSpacing(planter, 30)).toBe(16)
    // 480 in ÷ 22 in = 21.8 → 21 whole rows, 38.5 ft.
    expect(rowsAtPlanSpacing(planter, 22)).toBe(21)
    const split = { ...plans[2]!, rowSpacingIn: 15 }
    expect(planCapacity(split, { hoursPerDay: 10, efficiencyPercent: 70 })!.widthFt).toBe(40)
    expect(planCapacity(split, { hoursPerDay: 10, efficiencyPercent: 70 })!.acresPerHour).toBeCloseTo(6 * 40 * 0.7 / 8.25, 9)
    // Hopper: 50 lb × 2,800 seeds/lb ÷ 126,000 = 1.111 row-acres per fill, over 32 rows → 35.56 acres (computed).
    expect(planHopper(split, 126_000)!.planterAcresPerFill).toBeCloseTo(50 * 2800 / 126_000 * 32, 9)
  })

  it('acres per week start on the Monday; a plan without a window is unscheduled', () => {
    expect(s.weeks).toEqual([{ weekStart: '2027-04-19', acres: 100 }, { weekStart: '2027-04-26', acres: 45 }, { weekStart: '2027-05-03', acres: 80 }])
    expect(s.unscheduledAcres).toBe(40)
  })

  it('week starts: any day of a week maps to its Monday (property)', () => {
    fc.assert(fc.property(fc.date({ min: new Date('2000-01-01'), max: new Date('2100-12-31'), noInvalidDate: true }), (d) => {
      const w = weekStartOf(d.toISOString().slice(0, 10))
      const wd = new Date(`${w}T00:00:00Z`)
      expect(wd.getUTCDay()).toBe(1)
      const diff = (Date.UTC(d.getUTCFullYear(), d.getUTCMonth(), d.getUTCDate()) - wd.getTime()) / 86_400_000
      expect(diff).toBeGreaterThanOrEqual(0)
      expect(diff).toBeLessThan(7)
    }))
  })
})

describe('plan workflow', () => {
  it('only the agronomist or owner reviews; the crew proposes, sets up and plants', () => {
    expect(planActions('submitted', 'operator')).toEqual([])
    expect(planActions('submitted', 'agronomist')).toEqual(['approved', 'changes-requested'])
    expect(planActions('draft', 'operator')).toEqual(['submitted'])
    expect(planActions('approved', 'foreman')).toEqual(['set-up'])
    expect(planActions('planted', 'owner')).toEqual([])
    expect(PLAN_STATUS_ROLES.approved).not.toContain('operator')
    expect(Object.values(PLAN_NEXT).flat()).not.toContain('draft')
  })
})
