import { resetBody } from '#shared/schemas/auth'
import { finishPasswordReset } from '../../services/accounts'
export default defineEventHandler(async (event) => {
  const { token, password } = await validBody(event, resetBody)
  await finishPasswordReset(token, password)
  return { ok: true }
})
