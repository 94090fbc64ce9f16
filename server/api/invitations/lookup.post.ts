import { z } from 'zod'
import { findOpenInvitation } from '../../services/accounts'

// Public: the accept page shows whom and which farm an invitation is for.
export default defineEventHandler(async (event) => {
  const { token } = await validBody(event, z.strictObject({ token: z.string().min(20).max(200) }))
  const inv = await findOpenInvitation(token)
  if (!inv) throw createError({ statusCode: 404, message: 'This invitation link is invalid, used or expired' })
  return { email: inv.email, name: inv.name, role: inv.role, farmName: inv.farmName }
})
