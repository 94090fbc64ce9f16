import { setupListQuery } from '#shared/schemas/setups'
import { listSetups } from '../../services/setups'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const query = validQuery(event, setupListQuery)
  return cachedResponse(event, member, () => listSetups(member.farmId, query))
})
