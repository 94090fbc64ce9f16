import { idParams } from '#shared/schemas/common'
import { planterPatch } from '#shared/schemas/equipment'
import { updatePlanter } from '../../services/equipment'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'foreman'])
  const { id } = validParams(event, idParams)
  const body = await validBody(event, planterPatch)
  return updatePlanter(member, id, body)
})
