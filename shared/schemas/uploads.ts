import { z } from 'zod'

export const uploadQuery = z.object({
  name: z.string().trim().min(1).max(200, 'Use a file name of at most 200 characters').optional(),
  // What the caller expects: a photo, a CSV, or any accepted type.
  kind: z.enum(['any', 'photo', 'csv'], { error: 'Kind must be any, photo or csv' }).default('any'),
})
