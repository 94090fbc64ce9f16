import { idParams } from '#shared/schemas/common'
import { getField } from '../../services/fields'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  return getField(member.farmId, id)
})
