import { idParams } from '#shared/schemas/common'
import { listCalibrations } from '../../../services/applications'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  return listCalibrations(member.farmId, id)
})
