import { seasonParams, seasonSummaryQuery } from '#shared/schemas/plans'
import { seasonSummary } from '../../../services/plans'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { season } = validParams(event, seasonParams)
  const query = validQuery(event, seasonSummaryQuery)
  return cachedResponse(event, member, () => seasonSummary(member.farmId, season, query))
})
