import { idParams } from '#shared/schemas/common'
import { commentBody } from '#shared/schemas/setups'
import { addComment } from '../../../services/setups'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  const body = await validBody(event, commentBody)
  setResponseStatus(event, 201)
  return addComment(member, id, body)
})
