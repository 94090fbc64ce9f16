import { idParams } from '#shared/schemas/common'
import { deletePlanter } from '../../services/equipment'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'foreman'])
  const { id } = validParams(event, idParams)
  return deletePlanter(member, id)
})
