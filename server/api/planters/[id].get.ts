import { idParams } from '#shared/schemas/common'
import { getPlanter } from '../../services/equipment'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  return getPlanter(member.farmId, id)
})
