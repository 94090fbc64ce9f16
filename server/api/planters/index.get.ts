import { listPlanters } from '../../services/equipment'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  return cachedResponse(event, member, () => listPlanters(member.farmId))
})
