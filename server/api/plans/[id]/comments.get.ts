import { idParams } from '#shared/schemas/common'
import { listComments } from '../../../services/plans'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  return listComments(member.farmId, id)
})
