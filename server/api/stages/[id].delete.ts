import { idParams } from '#shared/schemas/common'
import { deleteStage } from '../../services/equipment'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'foreman'])
  const { id } = validParams(event, idParams)
  return deleteStage(member, id)
})
