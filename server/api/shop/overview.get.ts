import { shopOverview } from '../../services/shop'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  return cachedResponse(event, member, () => shopOverview(member.farmId))
})
