import { idParams } from '#shared/schemas/common'
import { templatePatch } from '#shared/schemas/shop'
import { updateTemplate } from '../../services/shop'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'foreman'])
  const { id } = validParams(event, idParams)
  const body = await validBody(event, templatePatch)
  return updateTemplate(member, id, body)
})
