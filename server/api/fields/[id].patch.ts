import { idParams } from '#shared/schemas/common'
import { FIELD_EDITORS, fieldPatch } from '#shared/schemas/fields'
import { updateField } from '../../services/fields'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, FIELD_EDITORS)
  const { id } = validParams(event, idParams)
  const body = await validBody(event, fieldPatch)
  return updateField(member, id, body)
})
