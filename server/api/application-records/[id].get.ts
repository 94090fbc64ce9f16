import { idParams } from '#shared/schemas/common'
import { getRecord } from '../../services/applications'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  return getRecord(member.farmId, id)
})
