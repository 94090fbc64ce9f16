import { idParams } from '#shared/schemas/common'
import { platePatch } from '#shared/schemas/equipment'
import { updatePlate } from '../../services/equipment'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'foreman'])
  const { id } = validParams(event, idParams)
  const body = await validBody(event, platePatch)
  return updatePlate(member, id, body)
})
