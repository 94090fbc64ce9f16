import { setupCreateBody } from '#shared/schemas/setups'
import { createSetup } from '../../services/setups'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'operator', 'foreman'])
  const body = await validBody(event, setupCreateBody)
  setResponseStatus(event, 201)
  return createSetup(member, body)
})
