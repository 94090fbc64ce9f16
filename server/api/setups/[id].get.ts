import { idParams } from '#shared/schemas/common'
import { getSetup } from '../../services/setups'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  return getSetup(member.farmId, id)
})
