import { listTemplates } from '../../services/shop'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  return cachedResponse(event, member, () => listTemplates(member.farmId))
})
