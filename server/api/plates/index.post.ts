import { plateBody } from '#shared/schemas/equipment'
import { createPlate } from '../../services/equipment'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'foreman'])
  const body = await validBody(event, plateBody)
  setResponseStatus(event, 201)
  return createPlate(member, body)
})
