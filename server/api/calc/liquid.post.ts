import { liquidBody } from '#shared/schemas/calc'
import { computeLiquid } from '#shared/utils/application'

export default defineEventHandler(async (event) => {
  await requireMember(event)
  const body = await validBody(event, liquidBody)
  return computeLiquid(body)
})
