import { checkListQuery } from '#shared/schemas/checks'
import { listChecks } from '../../services/checks'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const query = validQuery(event, checkListQuery)
  return listChecks(member.farmId, query)
})
