import { planListQuery } from '#shared/schemas/plans'
import { listPlans } from '../../services/plans'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const query = validQuery(event, planListQuery)
  return cachedResponse(event, member, () => listPlans(member.farmId, query))
})
