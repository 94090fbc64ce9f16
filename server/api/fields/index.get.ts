import { fieldListQuery } from '#shared/schemas/fields'
import { listFields } from '../../services/fields'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const query = validQuery(event, fieldListQuery)
  return cachedResponse(event, member, () => listFields(member.farmId, query))
})
