import { z } from 'zod'
import { cellsPerPlate, meterRatio, positive, rowSpacingIn, slipPercent, teeth, wheelCircumferenceIn } from './calc'
import { shortText } from './common'

export const FRAME_KINDS = ['pull-type', 'mounted', 'folding', 'toolbar'] as const
export const OPENERS = ['runner', 'double-disc'] as const
export const PRESS_WHEELS = ['open-center', 'flat-tread', 'center-rib', 'dual-rib', 'semi-pneumatic'] as const
export const COVERINGS = ['none', 'knife', 'disc'] as const
export const GRANULAR = ['none', 'insecticide', 'herbicide', 'both'] as const
export const CROPS = ['corn', 'soybeans', 'sorghum', 'cotton', 'sunflower', 'dry beans', 'sugar beets', 'peanuts'] as const

const name = z.string({ error: 'Enter a name' }).trim().min(1, 'Enter a name').max(80, 'Use at most 80 characters')
const teethList = (label: string) => z.array(teeth(label), { error: `${label} must be a list` }).max(30, 'List at most 30 sizes')
const optionalText = (max = 200) => shortText(max).nullable().optional()
const rowPositions = z.array(z.number().int('Row numbers are whole numbers').min(1, 'Rows start at 1').max(96, 'At most 96 rows'), { error: 'Rows must be a list' }).max(96, 'At most 96 rows')

export const stageBody = z.strictObject({
  chainPitch: shortText(20).optional(),
  driverTeeth: teeth('Driver teeth'),
  drivenTeeth: teeth('Driven teeth'),
  driverOptions: teethList('Driver sizes on hand').default([]),
  drivenOptions: teethList('Driven sizes on hand').default([]),
})
// Spelled out: a partial of stageBody would keep its defaults and empty the sizes lists on every edit.
export const stagePatch = z.strictObject({
  chainPitch: shortText(20).optional(),
  driverTeeth: teeth('Driver teeth'),
  drivenTeeth: teeth('Driven teeth'),
  driverOptions: teethList('Driver sizes on hand'),
  drivenOptions: teethList('Driven sizes on hand'),
}).partial()

export const circumferenceRun = z.strictObject({
  revolutions: positive('Revolutions', 1000),
  distanceFt: positive('Distance', 10_000),
})

const planterFields = {
  name,
  frameKind: z.enum(FRAME_KINDS, { error: 'Choose a frame kind' }),
  rowCount: z.number({ error: 'Rows must be a number' }).int('Rows must be a whole number').min(1, 'At least 1 row').max(96, 'At most 96 rows'),
  rowSpacingIn,
  transportWidthFt: positive('Transport width', 200).nullable().optional(),
  tireDescription: optionalText(120),
  wheelCircumferenceIn: wheelCircumferenceIn.optional(),
  circumferenceRun: circumferenceRun.optional(),
  slipPercent: slipPercent.default(0),
  meterRatio: meterRatio.default(1),
  seedHopperLb: positive('Seed hopper', 10_000).nullable().optional(),
  granularHopperLb: positive('Granular hopper', 1_000).nullable().optional(),
  notes: optionalText(2000),
}

export const planterBody = z.strictObject({
  ...planterFields,
  stages: z.array(stageBody).min(1, 'Give at least one drive stage').max(6, 'A drive has at most 6 stages').optional(),
}).refine((p) => p.wheelCircumferenceIn !== undefined || p.circumferenceRun !== undefined, { message: 'Enter the rolling circumference or a measured run', path: ['wheelCircumferenceIn'] })

export const planterPatch = z.strictObject({
  ...planterFields,
  slipPercent: slipPercent.optional(),
  meterRatio: meterRatio.optional(),
  configVersion: z.number().int().positive().optional(),
}).partial()

export const sectionBody = z.strictObject({ name, rows: rowPositions.min(1, 'A section drives at least one row') })
export const sectionPatch = sectionBody.partial()

export const rowUnitPatch = z.strictObject({
  opener: z.enum(OPENERS),
  gaugeWheels: optionalText(80),
  depthIn: z.number({ error: 'Depth must be a number' }).min(0.25, 'Depth must be from 0.25 to 6 in').max(6, 'Depth must be from 0.25 to 6 in'),
  depthBand: optionalText(80),
  downPressureLb: z.number({ error: 'Down pressure must be a number' }).min(0, 'Down pressure cannot be negative').max(1000, 'At most 1,000 lb').nullable(),
  pressWheel: z.enum(PRESS_WHEELS),
  pressWheelWidthIn: positive('Press wheel width', 24).nullable(),
  covering: z.enum(COVERINGS),
  furrower: z.boolean(),
  seedPlateId: z.number().int().positive().nullable(),
  granular: z.enum(GRANULAR),
  granularBandWidthIn: positive('Band width', 60).nullable(),
  granularDialSetting: z.number({ error: 'Dial setting must be a number' }).min(0).max(1000).nullable(),
  fertilizerSetting: optionalText(80),
  planting: z.boolean(),
}).partial()

export const bulkRowUnitBody = z.strictObject({
  positions: rowPositions.min(1, 'Pick at least one row'),
  changes: rowUnitPatch,
})

// Patches use it without the default, which zod would otherwise apply and reset the count to 0.
const quantity = z.number({ error: 'Quantity must be a number' }).int('Quantity must be a whole number').min(0, 'Quantity cannot be negative').max(10_000, 'At most 10,000')

export const plateBody = z.strictObject({
  code: z.string({ error: 'Enter a plate code' }).trim().min(1, 'Enter a plate code').max(40),
  crops: z.array(z.enum(CROPS, { error: 'Choose a crop from the list' })).min(1, 'Pick at least one crop').max(8),
  cellsPerPlate,
  cellDescription: optionalText(120),
  seedsPerLbMin: z.number().int().min(1).max(100_000).nullable().optional(),
  seedsPerLbMax: z.number().int().min(1).max(100_000).nullable().optional(),
  quantityOnHand: quantity.default(0),
  wearNotes: optionalText(500),
})
export const platePatch = z.strictObject({ ...plateBody.shape, quantityOnHand: quantity }).partial()

export const sprocketBody = z.strictObject({
  teeth: teeth('Teeth'),
  chainPitch: shortText(20).min(1).default('#40'),
  quantityOnHand: quantity.default(0),
})
export const sprocketPatch = z.strictObject({ quantityOnHand: quantity, chainPitch: shortText(20).min(1) }).partial()

export const solveBody = z.strictObject({
  targetSeedsPerAcre: positive('Target population', 2_000_000).optional(),
  targetSpacingIn: positive('Target spacing', 200).optional(),
  rowSpacingIn: rowSpacingIn.optional(),
  sectionId: z.number().int().positive().optional(),
  crop: z.enum(CROPS).optional(),
  limit: z.number().int().min(1).max(50).optional(),
}).refine((b) => b.targetSeedsPerAcre !== undefined || b.targetSpacingIn !== undefined, { message: 'Give a target population or spacing', path: ['targetSeedsPerAcre'] })

export const rateChartQuery = z.object({
  plateId: z.coerce.number().int().positive().optional(),
  cells: z.coerce.number().int().min(1).max(500).optional(),
  sectionId: z.coerce.number().int().positive().optional(),
  rowSpacings: z.string().max(100).optional().transform((s, ctx) => {
    if (!s) return []
    const list = s.split(',').map(Number)
    if (list.some((n) => !Number.isFinite(n) || n <= 0 || n > 120)) {
      ctx.addIssue({ code: 'custom', message: 'Row spacings are numbers from 1 to 120, separated by commas' })
      return z.NEVER
    }
    return list.slice(0, 6)
  }),
})

export type PlanterBody = z.infer<typeof planterBody>
export type RowUnitPatch = z.infer<typeof rowUnitPatch>
