import { z } from 'zod'
import { cellsPerPlate, meterRatio, positive, rowSpacingIn, slipPercent, speedMph, stage, wheelCircumferenceIn } from './calc'
import { CROPS, rowUnitPatch } from './equipment'
import { shortText } from './common'

const setupStage = stage.extend({ position: z.number().int().min(1).max(6) })

export const setupSection = z.strictObject({
  sectionId: z.number().int().positive().nullable(),
  name: z.string().trim().min(1).max(80),
  rows: z.array(z.number().int().min(1).max(96)).min(1, 'A section drives at least one row').max(96),
  seedPlateId: z.number().int().positive().nullable(),
  plateCode: z.string().max(40).nullable().default(null),
  cellsPerPlate,
  stages: z.array(setupStage).min(1, 'Give at least one drive stage').max(6, 'A drive has at most 6 stages'),
})

export const setupRowUnit = rowUnitPatch.required().extend({ position: z.number().int().min(1).max(96) })

export const setupConfig = z.strictObject({
  crop: z.enum(CROPS, { error: 'Choose a crop from the list' }),
  targetSeedsPerAcre: positive('Target population', 2_000_000),
  rowSpacingIn,
  speedMph: speedMph.nullable(),
  wheelCircumferenceIn,
  slipPercent,
  meterRatio,
  sections: z.array(setupSection).min(1, 'Give at least one drive section').max(8),
  rowUnits: z.array(setupRowUnit).min(1).max(96),
})

export const setupCreateBody = z.strictObject({
  planterId: z.number().int().positive(),
  name: z.string({ error: 'Name the setup' }).trim().min(1, 'Name the setup').max(120),
  config: setupConfig,
  note: shortText(1000).optional(),
})

export const setupRevisionBody = z.strictObject({
  baseRevision: z.number({ error: 'Say which revision you edited' }).int().min(1),
  config: setupConfig,
  note: shortText(1000).optional(),
})

export const setupListQuery = z.object({
  after: z.coerce.number().int().positive().optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
  planterId: z.coerce.number().int().positive().optional(),
  crop: z.enum(CROPS).optional(),
})

export const diffQuery = z.object({ from: z.coerce.number().int().min(1), to: z.coerce.number().int().min(1) })
export const commentBody = z.strictObject({ body: z.string().trim().min(1, 'Write something').max(4000), revision: z.number().int().min(1).optional() })
export const sheetRevisionQuery = z.object({ revision: z.coerce.number().int().min(1).optional() })

export type SetupConfigBody = z.infer<typeof setupConfig>
