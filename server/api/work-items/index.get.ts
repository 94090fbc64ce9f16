import { workItemQuery } from '#shared/schemas/shop'
import { listWorkItems } from '../../services/shop'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const query = validQuery(event, workItemQuery)
  return cachedResponse(event, member, () => listWorkItems(member.farmId, query))
})
