import { inspectionBody } from '#shared/schemas/shop'
import { startInspection } from '../../services/shop'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'operator', 'foreman'])
  const body = await validBody(event, inspectionBody)
  setResponseStatus(event, 201)
  return startInspection(member, body)
})
