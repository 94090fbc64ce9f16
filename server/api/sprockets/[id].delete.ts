import { idParams } from '#shared/schemas/common'
import { deleteSprocket } from '../../services/equipment'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'foreman'])
  const { id } = validParams(event, idParams)
  return deleteSprocket(member, id)
})
