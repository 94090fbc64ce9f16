import { idParams } from '#shared/schemas/common'
import { getSeedLot } from '../../services/fields'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  return getSeedLot(member.farmId, id)
})
