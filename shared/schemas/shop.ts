import { MAX_PHOTOS_PER_RECORD } from '../utils/upload-limits'
import { z } from 'zod'
import { isoDate, shortText } from './common'

const optionalText = (max = 200) => shortText(max).nullable().optional()

export const ITEM_RESULTS = ['ok', 'needs-fixing', 'replaced'] as const
export const WORK_ITEM_STATUSES = ['open', 'in-progress', 'closed'] as const

export const checklistItem = z.strictObject({
  area: z.string({ error: 'Name the area' }).trim().min(1, 'Name the area').max(60, 'Use at most 60 characters'),
  label: z.string({ error: 'Say what to check' }).trim().min(1, 'Say what to check').max(200, 'Use at most 200 characters'),
  hint: optionalText(500).transform((v) => v || null),
})

export const templateBody = z.strictObject({
  name: z.string({ error: 'Name the checklist' }).trim().min(1, 'Name the checklist').max(120, 'Use at most 120 characters'),
  items: z.array(checklistItem, { error: 'Items must be a list' }).min(1, 'A checklist has at least one item').max(200, 'At most 200 items'),
})
export const templatePatch = templateBody.partial()

export const inspectionBody = z.strictObject({
  planterId: z.number({ error: 'Choose a planter' }).int().positive(),
  templateId: z.number().int().positive().optional(),
  notes: optionalText(2000),
})
export const inspectionListQuery = z.object({ planterId: z.coerce.number().int().positive().optional() })

export const inspectionItemPatch = z.strictObject({
  result: z.enum(ITEM_RESULTS, { error: 'Choose ok, needs fixing or replaced' }).nullable(),
  notes: optionalText(2000),
  photoUploadIds: z.array(z.number().int().positive().max(2_147_483_647, 'Photos must be a list of ids'), { error: 'Photos must be a list of ids' }).max(MAX_PHOTOS_PER_RECORD, 'At most 10 photos').optional(),
}).partial()

export const inspectionComplete = z.strictObject({ notes: optionalText(2000) })

export const workItemPatch = z.strictObject({
  status: z.enum(WORK_ITEM_STATUSES, { error: 'Choose open, in progress or closed' }),
  notes: optionalText(2000),
  assignedTo: z.number().int().positive().nullable(),
}).partial()
export const workItemQuery = z.object({
  status: z.enum(WORK_ITEM_STATUSES).optional(),
  planterId: z.coerce.number().int().positive().optional(),
})

export const serviceEventBody = z.strictObject({
  servicedOn: isoDate,
  task: z.string({ error: 'Say what was serviced' }).trim().min(1, 'Say what was serviced').max(200, 'Use at most 200 characters'),
  notes: optionalText(2000),
  intervalAcres: z.number({ error: 'Acres must be a number' }).gt(0, 'Acres must be more than 0').max(1_000_000, 'At most 1,000,000 acres').nullable().optional(),
  nextDueOn: isoDate.nullable().optional(),
}).refine((b) => !b.nextDueOn || b.nextDueOn >= b.servicedOn, { message: 'The next service falls after this one', path: ['nextDueOn'] })

export const installBody = z.strictObject({
  revision: z.number({ error: 'Say which revision goes on the planter' }).int().min(1),
  planterConfigVersion: z.number({ error: 'Send the planter version the pick list showed' }).int().min(1),
})

export const sheetSendBody = z.strictObject({
  memberId: z.number({ error: 'Choose a member' }).int().positive(),
  revision: z.number().int().min(1).optional(),
  message: optionalText(1000),
})
