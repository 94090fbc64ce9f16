import { idParams } from '#shared/schemas/common'
import { archiveTemplate } from '../../services/shop'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'foreman'])
  const { id } = validParams(event, idParams)
  return archiveTemplate(member, id)
})
