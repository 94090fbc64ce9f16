import { listMembers } from '../../services/accounts'
export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  return cachedResponse(event, member, () => listMembers(member.farmId))
})
