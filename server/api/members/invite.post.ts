import { inviteBody } from '#shared/schemas/auth'
import { createInvitation } from '../../services/accounts'
export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner'])
  const body = await validBody(event, inviteBody)
  setResponseStatus(event, 201)
  return createInvitation(member, body)
})
