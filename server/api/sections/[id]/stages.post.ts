import { idParams } from '#shared/schemas/common'
import { stageBody } from '#shared/schemas/equipment'
import { addStage } from '../../../services/equipment'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'foreman'])
  const { id } = validParams(event, idParams)
  const body = await validBody(event, stageBody)
  setResponseStatus(event, 201)
  return addStage(member, id, body)
})
