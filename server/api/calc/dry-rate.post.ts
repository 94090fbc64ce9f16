import { dryRateBody } from '#shared/schemas/applications'
import { dryRateFromCatch } from '#shared/utils/application'

export default defineEventHandler(async (event) => {
  await requireMember(event)
  const body = await validBody(event, dryRateBody)
  return dryRateFromCatch(body)
})
