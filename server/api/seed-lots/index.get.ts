import { seedLotListQuery } from '#shared/schemas/fields'
import { listSeedLots } from '../../services/fields'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const query = validQuery(event, seedLotListQuery)
  return cachedResponse(event, member, () => listSeedLots(member.farmId, query))
})
