import { describe, expect, it } from 'vitest'
import { planBody, planPatch, transitionBody, seasonSummaryQuery } from '../../shared/schemas/plans'
import { capacityBody } from '../../shared/schemas/calc'

describe('plan schemas', () => {
  it('fills defaults on create and leaves absent fields alone on a patch', () => {
    const created = planBody.parse({ season: 2027, fieldId: 1, crop: 'corn', targetStand: 32_000, rowSpacingIn: 30 })
    expect(created).toMatchObject({ survivalPercent: 95, speedMph: 5, marginPercent: 5, sortOrder: 0 })
    expect(planPatch.parse({ targetStand: 31_000 })).toEqual({ targetStand: 31_000 })
  })

  it('refuses a window that ends before it starts, a date that does not exist and an unknown status', () => {
    const r = planPatch.safeParse({ windowStart: '2027-05-10', windowEnd: '2027-05-01' })
    expect(r.success).toBe(false)
    expect(r.error!.issues[0]!.path).toEqual(['windowEnd'])
    expect(planPatch.safeParse({ windowStart: '2027-02-30' }).success).toBe(false)
    expect(transitionBody.safeParse({ to: 'done' }).success).toBe(false)
    expect(transitionBody.parse({ to: 'planted', plantedOn: '2027-04-28', plantedAcres: 80 })).toEqual({ to: 'planted', plantedOn: '2027-04-28', plantedAcres: 80 })
  })

  it('season summary defaults to 10 h a day and 65 % field efficiency (ASABE D497 planter range 50–75 %, from memory)', () => {
    expect(seasonSummaryQuery.parse({})).toEqual({ hoursPerDay: 10, efficiencyPercent: 65 })
    expect(seasonSummaryQuery.safeParse({ hoursPerDay: '25' }).success).toBe(false)
  })

  it('capacity body: whole rows from 1 to 96 and an efficiency above 0 up to 100 %', () => {
    expect(capacityBody.safeParse({ rows: 16, rowSpacingIn: 30, speedMph: 6, efficiencyPercent: 70 }).success).toBe(true)
    expect(capacityBody.safeParse({ rows: 16.5, rowSpacingIn: 30, speedMph: 6, efficiencyPercent: 70 }).success).toBe(false)
    expect(capacityBody.safeParse({ rows: 16, rowSpacingIn: 30, speedMph: 6, efficiencyPercent: 0 }).success).toBe(false)
  })
})
