import { idParams } from '#shared/schemas/common'
import { removeMember } from '../../services/accounts'
export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner'])
  const { id } = validParams(event, idParams)
  return removeMember(member, id)
})
