import { idParams } from '#shared/schemas/common'
import { sectionBody } from '#shared/schemas/equipment'
import { addSection } from '../../../services/equipment'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'foreman'])
  const { id } = validParams(event, idParams)
  const body = await validBody(event, sectionBody)
  setResponseStatus(event, 201)
  return addSection(member, id, body)
})
