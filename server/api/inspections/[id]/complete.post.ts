import { idParams } from '#shared/schemas/common'
import { inspectionComplete } from '#shared/schemas/shop'
import { completeInspection } from '../../../services/shop'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'operator', 'foreman'])
  const { id } = validParams(event, idParams)
  const body = await validBody(event, inspectionComplete)
  return completeInspection(member, id, body.notes)
})
