import { idParams } from '#shared/schemas/common'
import { inspectionItemPatch } from '#shared/schemas/shop'
import { updateInspectionItem } from '../../services/shop'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'operator', 'foreman'])
  const { id } = validParams(event, idParams)
  const body = await validBody(event, inspectionItemPatch)
  return updateInspectionItem(member, id, body)
})
