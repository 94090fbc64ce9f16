import { idParams } from '#shared/schemas/common'
import { FIELD_EDITORS } from '#shared/schemas/fields'
import { clearFieldBoundary } from '../../../services/fields'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, FIELD_EDITORS)
  const { id } = validParams(event, idParams)
  return clearFieldBoundary(member, id)
})
