import { checkListQuery } from '#shared/schemas/checks'
import { listChecks } from '../../services/checks'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const query = validQuery(event, checkListQuery)
  return cachedResponse(event, member, () => listChecks(member.farmId, query))
})
