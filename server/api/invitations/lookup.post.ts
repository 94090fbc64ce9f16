import { z } from 'zod'
import { findOpenInvitation, findUserByEmail } from '../../services/accounts'

// Public: the accept page shows whom and which farm an invitation is for.
export default defineEventHandler(async (event) => {
  const { token } = await validBody(event, z.strictObject({ token: z.string().min(20).max(200) }))
  const inv = await findOpenInvitation(token)
  if (!inv) throw createError({ statusCode: 404, message: 'This invitation link is invalid, used or expired' })
  // The page asks for the existing account's password instead of a new one.
  return { email: inv.email, name: inv.name, role: inv.role, farmName: inv.farmName, accountExists: !!(await findUserByEmail(inv.email)) }
})
