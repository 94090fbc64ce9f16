import { FIELD_EDITORS, fieldImportBody } from '#shared/schemas/fields'
import { importFields } from '../../services/fields'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, FIELD_EDITORS)
  const body = await validBody(event, fieldImportBody)
  const result = await importFields(member, body)
  if (result.imported > 0) setResponseStatus(event, 201)
  return result
})
