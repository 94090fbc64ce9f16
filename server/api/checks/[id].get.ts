import { idParams } from '#shared/schemas/common'
import { getCheck } from '../../services/checks'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  return getCheck(member.farmId, id)
})
