import { FIELD_EDITORS, fieldBody } from '#shared/schemas/fields'
import { createField } from '../../services/fields'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, FIELD_EDITORS)
  const body = await validBody(event, fieldBody)
  setResponseStatus(event, 201)
  return createField(member, body)
})
