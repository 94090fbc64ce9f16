import { idParams } from '#shared/schemas/common'
import { deletePlate } from '../../services/equipment'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'foreman'])
  const { id } = validParams(event, idParams)
  return deletePlate(member, id)
})
