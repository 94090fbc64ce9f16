import { FIELD_EDITORS, seedLotBody } from '#shared/schemas/fields'
import { createSeedLot } from '../../services/fields'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, FIELD_EDITORS)
  const body = await validBody(event, seedLotBody)
  setResponseStatus(event, 201)
  return createSeedLot(member, body)
})
