import { z } from 'zod'

export const idParams = z.object({ id: z.coerce.number().int().positive().max(2_147_483_647) })
export const email = z.string().trim().toLowerCase().email('Enter a valid e-mail address').max(254)
export const password = z.string().min(10, 'Use at least 10 characters').max(200, 'Use at most 200 characters')
export const personName = z.string().trim().min(1, 'Enter a name').max(120)
export const shortText = (max = 200) => z.string().trim().max(max, `Use at most ${max} characters`)
