import { fillPlanBody } from '#shared/schemas/applications'
import { planFills } from '#shared/utils/fills'

export default defineEventHandler(async (event) => {
  await requireMember(event)
  const body = await validBody(event, fillPlanBody)
  return planFills(body)
})
