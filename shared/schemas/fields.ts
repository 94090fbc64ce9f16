import { z } from 'zod'
import { CROPS } from './equipment'
import { shortText } from './common'
import type { Role } from '../types/roles'

// Who edits fields and seed lots; every member reads them.
export const FIELD_EDITORS: Role[] = ['owner', 'agronomist']
export const TILLAGE = ['conventional', 'minimum', 'no-till'] as const
export const DRAINAGE = ['well', 'moderate', 'poor', 'tiled'] as const
export const SEED_UNIT_KINDS = ['seeds', 'lb'] as const
export const FIELD_SORTS = ['name', 'acres', 'soilTexture', 'tillage', 'drainage', 'boundaryAcres', 'updatedAt'] as const
export const IMPORT_MODES = ['check', 'all-or-nothing', 'good-rows'] as const

const num = (label: string, min: number, max: number, unit = '') => z.number({ error: `${label} must be a number` })
  .refine(Number.isFinite, `${label} must be a number`)
  .min(min, `${label} must be from ${min} to ${max.toLocaleString('en-US')}${unit}`)
  .max(max, `${label} must be from ${min} to ${max.toLocaleString('en-US')}${unit}`)
const optionalText = (max: number) => shortText(max).nullable().optional()

export const fieldName = z.string({ error: 'Enter a name' }).trim().min(1, 'Enter a name').max(80, 'Use at most 80 characters')
export const fieldAcres = num('Acres', 0.01, 100_000, ' ac')

export const fieldBody = z.strictObject({
  name: fieldName,
  acres: fieldAcres,
  soilTexture: optionalText(60),
  tillage: z.enum(TILLAGE, { error: 'Choose conventional, minimum or no-till' }).default('conventional'),
  drainage: z.enum(DRAINAGE, { error: 'Choose well, moderate, poor or tiled' }).nullable().optional(),
  notes: optionalText(2000),
})

export const fieldPatch = z.strictObject({
  name: fieldName,
  acres: fieldAcres,
  soilTexture: optionalText(60),
  tillage: z.enum(TILLAGE, { error: 'Choose conventional, minimum or no-till' }),
  drainage: z.enum(DRAINAGE, { error: 'Choose well, moderate, poor or tiled' }).nullable(),
  notes: optionalText(2000),
}).partial()

export const fieldListQuery = z.object({
  q: z.string().trim().max(80, 'Use at most 80 characters').optional(),
  tillage: z.enum(TILLAGE).optional(),
  sort: z.enum(FIELD_SORTS, { error: `Sort by one of ${FIELD_SORTS.join(', ')}` }).default('name'),
  dir: z.enum(['asc', 'desc'], { error: 'Direction is asc or desc' }).default('asc'),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  limit: z.coerce.number().int().min(1).max(500).default(25),
})

// The boundary upload is any JSON; shared/utils/boundary.ts checkBoundary says what is wrong with it.
export const boundaryQuery = z.object({ useAcres: z.enum(['true', 'false']).optional() })

export const fieldImportBody = z.strictObject({
  csv: z.string({ error: 'Paste or upload the CSV text' }).min(1, 'The file is empty').max(1_000_000, 'Keep the file under 1 MB'),
  mode: z.enum(IMPORT_MODES, { error: 'Mode is check, all-or-nothing or good-rows' }).default('check'),
})

const lotFields = {
  crop: z.enum(CROPS, { error: 'Choose a crop from the list' }),
  variety: z.string({ error: 'Enter the variety' }).trim().min(1, 'Enter the variety').max(80, 'Use at most 80 characters'),
  lotNumber: z.string({ error: 'Enter the lot number' }).trim().min(1, 'Enter the lot number').max(40, 'Use at most 40 characters'),
  seedsPerLb: num('Seeds per lb', 1, 1_000_000),
  germinationPercent: num('Germination', 1, 100, ' %'),
  sizeGrade: optionalText(40),
  treatment: optionalText(120),
  unitsOnHand: num('Units on hand', 0, 1_000_000),
  unitKind: z.enum(SEED_UNIT_KINDS, { error: 'A unit is a seed count (seeds) or a weight (lb)' }),
  unitSize: num('Unit size', 0.01, 100_000_000),
  notes: optionalText(2000),
}

export const seedLotBody = z.strictObject({
  ...lotFields,
  unitsOnHand: lotFields.unitsOnHand.default(0),
  unitKind: lotFields.unitKind.default('seeds'),
})
export const seedLotPatch = z.strictObject(lotFields).partial()

export const seedLotListQuery = z.object({
  q: z.string().trim().max(80, 'Use at most 80 characters').optional(),
  crop: z.enum(CROPS).optional(),
})

export type FieldBody = z.infer<typeof fieldBody>
export type SeedLotBody = z.infer<typeof seedLotBody>
