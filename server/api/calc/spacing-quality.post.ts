import { spacingQualityBody } from '#shared/schemas/calc'

export default defineEventHandler(async (event) => {
  await requireMember(event)
  const body = await validBody(event, spacingQualityBody)
  return spacingQuality(body)
})
