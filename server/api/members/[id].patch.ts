import { idParams } from '#shared/schemas/common'
import { roleChangeBody } from '#shared/schemas/auth'
import { changeRole } from '../../services/accounts'
export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner'])
  const { id } = validParams(event, idParams)
  const { role } = await validBody(event, roleChangeBody)
  return changeRole(member, id, role)
})
