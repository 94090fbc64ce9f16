import { planterBody } from '#shared/schemas/equipment'
import { createPlanter } from '../../services/equipment'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'foreman'])
  const body = await validBody(event, planterBody)
  setResponseStatus(event, 201)
  return createPlanter(member, body)
})
