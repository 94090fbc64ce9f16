import { idParams } from '#shared/schemas/common'
import { setupRevisionBody } from '#shared/schemas/setups'
import { saveRevision } from '../../../services/setups'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'operator', 'foreman'])
  const { id } = validParams(event, idParams)
  const body = await validBody(event, setupRevisionBody)
  setResponseStatus(event, 201)
  return saveRevision(member, id, body)
})
