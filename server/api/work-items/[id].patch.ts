import { idParams } from '#shared/schemas/common'
import { workItemPatch } from '#shared/schemas/shop'
import { updateWorkItem } from '../../services/shop'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'operator', 'foreman'])
  const { id } = validParams(event, idParams)
  const body = await validBody(event, workItemPatch)
  return updateWorkItem(member, id, body)
})
