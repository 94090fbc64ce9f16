import { idParams } from '#shared/schemas/common'
import { sprocketPatch } from '#shared/schemas/equipment'
import { updateSprocket } from '../../services/equipment'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'foreman'])
  const { id } = validParams(event, idParams)
  const body = await validBody(event, sprocketPatch)
  return updateSprocket(member, id, body)
})
