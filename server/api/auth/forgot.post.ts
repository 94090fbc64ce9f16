import { forgotBody } from '#shared/schemas/auth'
import { startPasswordReset } from '../../services/accounts'
// Always the same answer, so the form does not reveal which addresses have accounts.
export default defineEventHandler(async (event) => {
  const { email } = await validBody(event, forgotBody)
  await startPasswordReset(email)
  return { ok: true, message: 'If that address has an account, a reset link is on its way.' }
})
