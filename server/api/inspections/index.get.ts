import { inspectionListQuery } from '#shared/schemas/shop'
import { listInspections } from '../../services/shop'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { planterId } = validQuery(event, inspectionListQuery)
  return cachedResponse(event, member, () => listInspections(member.farmId, planterId))
})
