import { z } from 'zod'
import { positive, rowSpacingIn, speedMph } from './calc'
import { CROPS } from './equipment'
import { isoDate, shortText } from './common'

export const PLAN_STATUSES = ['draft', 'submitted', 'approved', 'changes-requested', 'set-up', 'planted'] as const
export type PlanStatus = (typeof PLAN_STATUSES)[number]

export const PLAN_STATUS_LABELS: Record<PlanStatus, string> = {
  'draft': 'Draft',
  'submitted': 'Waiting for review',
  'approved': 'Approved',
  'changes-requested': 'Changes asked',
  'set-up': 'Planter set',
  'planted': 'Planted',
}

export { isoDate }
export const season = z.number({ error: 'Season must be a year' }).int('Season must be a year from 2000 to 2100').min(2000, 'Season must be a year from 2000 to 2100').max(2100, 'Season must be a year from 2000 to 2100')
const id = (label: string) => z.number({ error: `Choose a ${label}` }).int(`Choose a ${label}`).positive(`Choose a ${label}`).max(2_147_483_647, `Choose a ${label}`)
const percent = (label: string, min: number) => z.number({ error: `${label} must be a number` }).min(min, `${label} must be from ${min} to 100 %`).max(100, `${label} must be from ${min} to 100 %`)
const targetStand = z.number({ error: 'Target stand must be a number' }).int('Target stand is a whole number of plants per acre').min(1000, 'Target stand must be from 1,000 to 1,000,000 plants per acre').max(1_000_000, 'Target stand must be from 1,000 to 1,000,000 plants per acre')

// Spelled out without defaults so that a patch leaves absent fields alone.
const planFields = {
  fieldId: id('field'),
  crop: z.enum(CROPS, { error: 'Choose a crop from the list' }),
  seedLotId: id('seed lot').nullable(),
  targetStand,
  survivalPercent: percent('Expected survival', 1),
  rowSpacingIn,
  windowStart: isoDate.nullable(),
  windowEnd: isoDate.nullable(),
  planterId: id('planter').nullable(),
  speedMph,
  marginPercent: percent('Margin', 0),
  sortOrder: z.number({ error: 'Order must be a number' }).int('Order must be a whole number from 0 to 10,000').min(0, 'Order must be a whole number from 0 to 10,000').max(10_000, 'Order must be a whole number from 0 to 10,000'),
  notes: shortText(2000).nullable(),
}

const windowInOrder = (b: { windowStart?: string | null, windowEnd?: string | null }) => !b.windowStart || !b.windowEnd || b.windowStart <= b.windowEnd
const windowMessage = { path: ['windowEnd'], message: 'The planting window ends on or after the day it starts' }

export const planBody = z.strictObject({
  season,
  ...planFields,
  seedLotId: planFields.seedLotId.optional(),
  survivalPercent: planFields.survivalPercent.default(95),
  windowStart: planFields.windowStart.optional(),
  windowEnd: planFields.windowEnd.optional(),
  planterId: planFields.planterId.optional(),
  speedMph: planFields.speedMph.default(5),
  marginPercent: planFields.marginPercent.default(5),
  sortOrder: planFields.sortOrder.default(0),
  notes: planFields.notes.optional(),
}).refine(windowInOrder, windowMessage)

export const planPatch = z.strictObject(planFields).partial().refine(windowInOrder, windowMessage)

export const planListQuery = z.object({
  season: z.coerce.number().pipe(season).optional(),
  status: z.enum(PLAN_STATUSES, { error: 'Choose a status from the list' }).optional(),
  fieldId: z.coerce.number().int().positive().max(2_147_483_647).optional(),
  planterId: z.coerce.number().int().positive().max(2_147_483_647).optional(),
})

export const transitionBody = z.strictObject({
  to: z.enum(PLAN_STATUSES, { error: 'Choose the status to move the plan to' }),
  comment: shortText(2000).optional(),
  setupId: id('setup').optional(),
  // On approval: the setup revision the reviewer looked at; a newer one is refused (409).
  setupRevision: z.number({ error: 'Give the setup revision you reviewed' }).int('Give the setup revision you reviewed').positive('Give the setup revision you reviewed').max(1_000_000, 'Give the setup revision you reviewed').optional(),
  plantedOn: isoDate.optional(),
  plantedAcres: positive('Planted acres', 100_000).optional(),
})

export const planCommentBody = z.strictObject({ body: z.string({ error: 'Write something' }).trim().min(1, 'Write something').max(4000, 'Use at most 4,000 characters') })

export const seasonParams = z.object({ season: z.coerce.number().int().min(2000).max(2100) })

export const seasonSummaryQuery = z.object({
  hoursPerDay: z.coerce.number({ error: 'Hours per day must be a number' }).gt(0, 'Hours per day must be more than 0').max(24, 'Hours per day must be at most 24').default(10),
  efficiencyPercent: z.coerce.number({ error: 'Field efficiency must be a number' }).gt(0, 'Field efficiency must be more than 0').max(100, 'Field efficiency must be at most 100 %').default(65),
})

export type PlanBody = z.infer<typeof planBody>
export type PlanPatch = z.infer<typeof planPatch>
export type TransitionBody = z.infer<typeof transitionBody>
