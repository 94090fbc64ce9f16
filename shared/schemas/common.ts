import { z } from 'zod'

export const idParams = z.object({ id: z.coerce.number().int().positive().max(2_147_483_647) })
export const email = z.string().trim().toLowerCase().email('Enter a valid e-mail address').max(254)
export const password = z.string().min(10, 'Use at least 10 characters').max(200, 'Use at most 200 characters')
export const personName = z.string().trim().min(1, 'Enter a name').max(120)
export const shortText = (max = 200) => z.string().trim().max(max, `Use at most ${max} characters`)

// A calendar date as YYYY-MM-DD that exists (2026-02-30 does not; Date.parse alone would take it
// and PostgreSQL would then refuse it with a 500).
const isRealDate = (s: string) => {
  const d = new Date(`${s}T00:00:00Z`)
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === s
}
export const isoDate = z.string({ error: 'Give a date as YYYY-MM-DD' }).regex(/^\d{4}-\d{2}-\d{2}$/, 'Give a date as YYYY-MM-DD').refine(isRealDate, 'Give a date that exists, as YYYY-MM-DD')
