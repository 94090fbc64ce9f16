import { acceptInviteBody } from '#shared/schemas/auth'
import { acceptInvitation } from '../../services/accounts'
export default defineEventHandler(async (event) => {
  const body = await validBody(event, acceptInviteBody)
  const { user, farmId } = await acceptInvitation(body.token, body.password, body.name)
  await setUserSession(event, { user, farmId })
  return { user, farmId }
})
