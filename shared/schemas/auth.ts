import { z } from 'zod'
import { ROLES } from '../types/roles'
import { email, password, personName } from './common'

export const loginBody = z.strictObject({ email, password: z.string().min(1, 'Enter your password').max(200) })
export const switchFarmBody = z.strictObject({ farmId: z.number().int().positive() })
export const inviteBody = z.strictObject({ email, name: personName, role: z.enum(ROLES) })
export const acceptInviteBody = z.strictObject({ token: z.string().min(20).max(200), password, name: personName.optional() })
export const forgotBody = z.strictObject({ email })
export const resetBody = z.strictObject({ token: z.string().min(20).max(200), password })
export const roleChangeBody = z.strictObject({ role: z.enum(ROLES) })

export type LoginBody = z.infer<typeof loginBody>
export type InviteBody = z.infer<typeof inviteBody>
