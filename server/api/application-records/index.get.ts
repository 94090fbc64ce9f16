import { recordListQuery } from '#shared/schemas/applications'
import { listRecords, recordSeasons } from '../../services/applications'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { season } = validQuery(event, recordListQuery)
  return cachedResponse(event, member, async () => ({ season: season ?? null, seasons: await recordSeasons(member.farmId), items: await listRecords(member.farmId, season) }))
})
