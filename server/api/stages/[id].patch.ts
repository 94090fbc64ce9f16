import { idParams } from '#shared/schemas/common'
import { stagePatch } from '#shared/schemas/equipment'
import { updateStage } from '../../services/equipment'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'foreman'])
  const { id } = validParams(event, idParams)
  const body = await validBody(event, stagePatch)
  return updateStage(member, id, body)
})
