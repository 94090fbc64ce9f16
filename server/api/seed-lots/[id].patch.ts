import { idParams } from '#shared/schemas/common'
import { FIELD_EDITORS, seedLotPatch } from '#shared/schemas/fields'
import { updateSeedLot } from '../../services/fields'

// The owner and agronomist edit a lot; the foreman counts what is on the shelf.
export default defineEventHandler(async (event) => {
  const member = await requireRole(event, [...FIELD_EDITORS, 'foreman'])
  const { id } = validParams(event, idParams)
  const body = await validBody(event, seedLotPatch)
  if (member.role === 'foreman' && Object.keys(body).some((k) => k !== 'unitsOnHand')) {
    throw createError({ statusCode: 403, message: 'A foreman changes only the units on hand; ask the agronomist or owner for the rest' })
  }
  return updateSeedLot(member, id, body)
})
