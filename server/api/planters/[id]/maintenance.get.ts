import { idParams } from '#shared/schemas/common'
import { maintenanceLog } from '../../../services/shop'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  return maintenanceLog(member.farmId, id)
})
