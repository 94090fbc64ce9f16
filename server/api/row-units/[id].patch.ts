import { idParams } from '#shared/schemas/common'
import { rowUnitPatch } from '#shared/schemas/equipment'
import { updateRowUnit } from '../../services/equipment'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'foreman'])
  const { id } = validParams(event, idParams)
  const body = await validBody(event, rowUnitPatch)
  return updateRowUnit(member, id, body)
})
