import { shopOverview } from '../../services/shop'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  return shopOverview(member.farmId)
})
