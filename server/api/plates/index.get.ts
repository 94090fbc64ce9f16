import { listPlates } from '../../services/equipment'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  return cachedResponse(event, member, () => listPlates(member.farmId))
})
