import { idParams } from '#shared/schemas/common'
import { bulkRowUnitBody } from '#shared/schemas/equipment'
import { updateRowUnits } from '../../../services/equipment'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'foreman'])
  const { id } = validParams(event, idParams)
  const body = await validBody(event, bulkRowUnitBody)
  return updateRowUnits(member, id, body)
})
