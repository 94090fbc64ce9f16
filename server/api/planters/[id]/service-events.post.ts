import { idParams } from '#shared/schemas/common'
import { serviceEventBody } from '#shared/schemas/shop'
import { addServiceEvent } from '../../../services/shop'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'foreman'])
  const { id } = validParams(event, idParams)
  const body = await validBody(event, serviceEventBody)
  setResponseStatus(event, 201)
  return addServiceEvent(member, id, body)
})
