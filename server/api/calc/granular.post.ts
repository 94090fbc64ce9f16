import { granularBody } from '#shared/schemas/calc'
import { computeGranular } from '#shared/utils/application'

export default defineEventHandler(async (event) => {
  await requireMember(event)
  const body = await validBody(event, granularBody)
  return computeGranular(body)
})
