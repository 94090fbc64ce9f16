import { describe, expect, it } from 'vitest'
import { applicationRecordBody, calibrationBody, catchCourseBody, fillPlanBody } from '../../shared/schemas/applications'

const messages = (r: { success: boolean, error?: { issues: { path: PropertyKey[], message: string }[] } }) => Object.fromEntries((r.error?.issues ?? []).map((i) => [i.path.join('.'), i.message]))

const general = {
  appliedOn: '2026-05-02', fieldName: 'River Bottom 80', crop: 'corn', productName: 'Furrowshield 20G', restrictedUse: false,
  rate: 6.5, rateUnit: 'oz/1000 ft', areaTreatedAcres: 40, applicatorName: 'Luis Brandt',
}

describe('application record schema', () => {
  it('takes a general-use record without registration, total or certification', () => {
    expect(applicationRecordBody.safeParse(general).success).toBe(true)
  })

  it('asks a restricted-use record for what 7 CFR 110.3 lists: registration number, total amount and the certification number', () => {
    const r = applicationRecordBody.safeParse({ ...general, restrictedUse: true, epaRegNumber: '', certificationNumber: '  ' })
    expect(messages(r)).toEqual({
      epaRegNumber: 'A restricted-use record needs the EPA registration number',
      totalAmount: 'A restricted-use record needs the total amount applied',
      totalUnit: 'A restricted-use record needs the unit of the total amount',
      certificationNumber: 'A restricted-use record needs the applicator\'s certification number',
    })
    expect(applicationRecordBody.safeParse({ ...general, restrictedUse: true, epaRegNumber: '00000-15', totalAmount: 282, totalUnit: 'lb', certificationNumber: 'PA-CF-0417' }).success).toBe(true)
  })

  it('refuses a date that does not exist, a future date, a malformed registration number, a band wider than the row and unknown fields', () => {
    expect(messages(applicationRecordBody.safeParse({ ...general, appliedOn: '2026-02-30' })).appliedOn).toBe('Give a date that exists, as YYYY-MM-DD')
    expect(messages(applicationRecordBody.safeParse({ ...general, appliedOn: '2999-05-01' })).appliedOn).toBe('The application date cannot be in the future')
    expect(messages(applicationRecordBody.safeParse({ ...general, epaRegNumber: 'EPA 12' })).epaRegNumber).toMatch(/as on the label/)
    expect(messages(applicationRecordBody.safeParse({ ...general, bandWidthIn: 31, rowSpacingIn: 30 })).bandWidthIn).toBe('The band cannot be wider than the row spacing')
    expect(applicationRecordBody.safeParse({ ...general, id: 4 }).success).toBe(false)
  })
})

describe('catch test and helper schemas', () => {
  const run = { baseRevision: 1, rows: [1], targetLbPerAcre: 8.7, points: [{ setting: 14, weightOz: 1.5 }, { setting: 18, weightOz: 2 }] }

  it('needs the course as a length or as revolutions, one of them, and a dial setting to save', () => {
    expect(messages(calibrationBody.safeParse(run)).courseFt).toMatch(/one of them/)
    expect(messages(calibrationBody.safeParse({ ...run, courseFt: 250, revolutions: 10 })).courseFt).toMatch(/one of them/)
    expect(messages(calibrationBody.safeParse({ ...run, courseFt: 250, saveToSetup: true })).dialSetting).toBe('Choose the dial setting to save')
    expect(calibrationBody.safeParse({ ...run, revolutions: 10, saveToSetup: true, dialSetting: 17 }).success).toBe(true)
  })

  it('needs two different settings and weights above zero', () => {
    const r = calibrationBody.safeParse({ ...run, courseFt: 250, points: [{ setting: 14, weightOz: 0 }, { setting: 14, weightOz: 2 }] })
    expect(messages(r)).toMatchObject({ 'points.0.weightOz': 'Catch weight must be more than 0', points: 'Catch at two or more different settings' })
  })

  it('pairs revolutions with a rolling circumference, and fill plans with at least one field', () => {
    expect(messages(catchCourseBody.safeParse({ rowSpacingIn: 30, revolutions: 10 })).wheelCircumferenceIn).toMatch(/both/)
    expect(messages(fillPlanBody.safeParse({ containers: [{ name: 'Boxes', kind: 'granular hopper', capacity: 400, ratePerAcre: 8 }], fields: [] })).fields).toBe('Give at least one field')
  })
})
