import { planBody } from '#shared/schemas/plans'
import { createPlan } from '../../services/plans'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'agronomist'])
  const body = await validBody(event, planBody)
  setResponseStatus(event, 201)
  return createPlan(member, body)
})
