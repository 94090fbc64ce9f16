import { sprocketBody } from '#shared/schemas/equipment'
import { createSprocket } from '../../services/equipment'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'foreman'])
  const body = await validBody(event, sprocketBody)
  setResponseStatus(event, 201)
  return createSprocket(member, body)
})
