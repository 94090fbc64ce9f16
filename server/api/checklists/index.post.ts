import { templateBody } from '#shared/schemas/shop'
import { createTemplate } from '../../services/shop'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'foreman'])
  const body = await validBody(event, templateBody)
  setResponseStatus(event, 201)
  return createTemplate(member, body)
})
