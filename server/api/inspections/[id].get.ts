import { idParams } from '#shared/schemas/common'
import { getInspection } from '../../services/shop'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  return getInspection(member.farmId, id)
})
