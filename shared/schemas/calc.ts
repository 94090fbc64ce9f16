import { z } from 'zod'

// Limits shared by calculators, the equipment forms and the server.
export const teeth = (label: string) => z.number({ error: `${label} must be a number` }).int(`${label} must be a whole number from 1 to 200`).min(1, `${label} must be a whole number from 1 to 200`).max(200, `${label} must be a whole number from 1 to 200`)
export const positive = (label: string, max: number) => z.number({ error: `${label} must be a number` }).gt(0, `${label} must be more than 0`).max(max, `${label} must be at most ${max}`)
export const rowSpacingIn = positive('Row spacing', 120)
export const slipPercent = z.number({ error: 'Slip must be a number' }).min(0, 'Slip must be from 0 to 50 %').max(50, 'Slip must be from 0 to 50 %')
export const cellsPerPlate = z.number({ error: 'Cells must be a number' }).int('Cells must be a whole number from 1 to 500').min(1, 'Cells must be a whole number from 1 to 500').max(500, 'Cells must be a whole number from 1 to 500')
export const wheelCircumferenceIn = positive('Rolling circumference', 1000)
export const meterRatio = positive('Meter ratio', 20)
export const speedMph = positive('Speed', 30)
export const stage = z.strictObject({ driverTeeth: teeth('Driver teeth'), drivenTeeth: teeth('Driven teeth') })
export const stages = z.array(stage, { error: 'Stages must be a list' }).min(1, 'Give at least one drive stage').max(6, 'A drive has at most 6 stages')

export const meterBody = z.strictObject({
  wheelCircumferenceIn,
  slipPercent,
  stages,
  meterRatio,
  cellsPerPlate,
  rowSpacingIn,
  speedMph: speedMph.optional(),
  plateRpmLimit: positive('Plate speed limit', 500).optional(),
})

export const rowLengthBody = z.strictObject({
  rowSpacingIn,
  fractionOfAcre: z.number({ error: 'Fraction must be a number' }).gt(0, 'Fraction must be more than 0').max(1, 'Fraction must be at most 1').optional(),
})

export const seedingRateBody = z.strictObject({
  targetStand: positive('Target stand', 10_000_000),
  germinationPercent: positive('Germination', 100),
  survivalPercent: positive('Survival', 100),
})

export type MeterBody = z.infer<typeof meterBody>
