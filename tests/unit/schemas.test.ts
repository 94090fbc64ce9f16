import { describe, expect, it } from 'vitest'
import {
  capacityBody, catchTestBody, granularBody, liquidBody, meterBody, replantBody, rowLengthBody, seedCheckBody, seedingRateBody, spacingQualityBody, standCountBody,
} from '../../shared/schemas/calc'
import { fieldErrors } from '../../shared/utils/validation'

const meter = { wheelCircumferenceIn: 86.4, slipPercent: 3, stages: [{ driverTeeth: 21, drivenTeeth: 19 }], meterRatio: 1, cellsPerPlate: 30, rowSpacingIn: 30, speedMph: 5 }

const errorsOf = (schema: { safeParse: (v: unknown) => { success: boolean, error?: unknown } }, value: unknown) => {
  const r = schema.safeParse(value)
  expect(r.success).toBe(false)
  return fieldErrors(r.error as Parameters<typeof fieldErrors>[0])
}

describe('meter request', () => {
  it('accepts a valid body', () => {
    expect(meterBody.parse(meter)).toEqual(meter)
  })

  it('rejects zero teeth with a plain message on the dotted path', () => {
    expect(errorsOf(meterBody, { ...meter, stages: [{ driverTeeth: 0, drivenTeeth: 19 }] })).toEqual({ 'stages.0.driverTeeth': 'Driver teeth must be a whole number from 1 to 200' })
  })

  it('rejects slip of 60 %, 7 stages, an unknown field and a number sent as a string', () => {
    expect(errorsOf(meterBody, { ...meter, slipPercent: 60 })).toEqual({ slipPercent: 'Slip must be from 0 to 50 %' })
    expect(errorsOf(meterBody, { ...meter, stages: Array.from({ length: 7 }, () => ({ driverTeeth: 20, drivenTeeth: 20 })) })).toEqual({ stages: 'A drive has at most 6 stages' })
    expect(errorsOf(meterBody, { ...meter, colour: 'red' })).toEqual({ colour: 'Unknown field' })
    expect(Object.keys(errorsOf(meterBody, { ...meter, rowSpacingIn: '30' }))).toEqual(['rowSpacingIn'])
  })

  it('rejects fractional cells, a meter ratio above 20 and a speed of 0', () => {
    expect(Object.keys(errorsOf(meterBody, { ...meter, cellsPerPlate: 30.5, meterRatio: 21, speedMph: 0 })).sort()).toEqual(['cellsPerPlate', 'meterRatio', 'speedMph'])
  })
})

describe('other calculator requests', () => {
  it('row length and seeding rate', () => {
    expect(rowLengthBody.safeParse({ rowSpacingIn: 30 }).success).toBe(true)
    expect(rowLengthBody.safeParse({ rowSpacingIn: 121 }).success).toBe(false)
    expect(seedingRateBody.safeParse({ targetStand: 32_000, germinationPercent: 95, survivalPercent: 0 }).success).toBe(false)
  })

  it('granular: exactly one rate, and a band no wider than the row', () => {
    expect(granularBody.safeParse({ rowSpacingIn: 30, lbPerAcre: 8 }).success).toBe(true)
    expect(errorsOf(granularBody, { rowSpacingIn: 30 })).toHaveProperty('lbPerAcre')
    expect(errorsOf(granularBody, { rowSpacingIn: 30, lbPerAcre: 8, ozPer1000Ft: 8 })).toHaveProperty('lbPerAcre')
    expect(errorsOf(granularBody, { rowSpacingIn: 30, bandRateLbPerAcre: 8 })).toEqual({ bandWidthIn: 'A band rate needs the band width' })
    expect(errorsOf(granularBody, { rowSpacingIn: 30, bandRateLbPerAcre: 8, bandWidthIn: 40 })).toEqual({ bandWidthIn: 'The band cannot be wider than the row spacing' })
  })

  it('catch test: two to 100 points at two or more settings, weights above 0', () => {
    const ok = { points: [{ setting: 10, weightOz: 5 }, { setting: 20, weightOz: 9 }], courseFt: 100, rowSpacingIn: 30, targetLbPerAcre: 10 }
    expect(catchTestBody.safeParse(ok).success).toBe(true)
    expect(errorsOf(catchTestBody, { ...ok, points: [ok.points[0], ok.points[0]] })).toEqual({ points: 'Catch at two or more different settings' })
    expect(errorsOf(catchTestBody, { ...ok, points: [ok.points[0]] })).toEqual({ points: 'Give at least two catches' })
    expect(errorsOf(catchTestBody, { ...ok, points: [ok.points[0], { setting: 20, weightOz: 0 }] })).toHaveProperty(['points.1.weightOz'])
  })

  it('liquid, capacity, seed check and stand counts', () => {
    expect(liquidBody.safeParse({ gpm: 0.3, mph: 5, widthIn: 20 }).success).toBe(true)
    expect(liquidBody.safeParse({ gpm: 0.3, mph: 31, widthIn: 20 }).success).toBe(false)
    expect(capacityBody.safeParse({ rows: 12, rowSpacingIn: 30, speedMph: 5, efficiencyPercent: 60 }).success).toBe(true)
    expect(errorsOf(capacityBody, { rows: 12.5, rowSpacingIn: 30, speedMph: 5, efficiencyPercent: 60 })).toEqual({ rows: 'Rows must be a whole number from 1 to 96' })
    expect(seedCheckBody.safeParse({ seedsCounted: 34, lengthFt: 17.4, rowSpacingIn: 30 }).success).toBe(true)
    expect(seedCheckBody.safeParse({ seedsCounted: -1, lengthFt: 17.4, rowSpacingIn: 30 }).success).toBe(false)
    expect(standCountBody.safeParse({ counts: [], lengthFt: 17.4, rowSpacingIn: 30 }).success).toBe(false)
  })

  it('spacing quality: 1 to 100,000 spacings, each above 0 and at most 1,000', () => {
    expect(spacingQualityBody.safeParse({ spacingsIn: Array.from({ length: 100_000 }, () => 6), theoreticalIn: 6 }).success).toBe(true)
    expect(spacingQualityBody.safeParse({ spacingsIn: Array.from({ length: 100_001 }, () => 6), theoreticalIn: 6 }).success).toBe(false)
    expect(errorsOf(spacingQualityBody, { spacingsIn: [6, 0, 1001], theoreticalIn: 6 })).toEqual({ 'spacingsIn.1': 'Each spacing must be more than 0', 'spacingsIn.2': 'Each spacing must be at most 1000' })
    expect(spacingQualityBody.safeParse({ spacingsIn: [], theoreticalIn: 6 }).success).toBe(false)
  })

  it('replant: dates that exist', () => {
    const ok = { currentStand: 16_000, currentPlantingDate: '2026-05-01', replantStand: 32_000, replantDate: '2026-05-29', expectedYieldBuPerAcre: 200, pricePerBu: 4.5, replantCostPerAcre: 60 }
    expect(replantBody.safeParse(ok).success).toBe(true)
    expect(errorsOf(replantBody, { ...ok, replantDate: '2026-02-30' })).toEqual({ replantDate: 'Give a date that exists, as YYYY-MM-DD' })
  })
})
