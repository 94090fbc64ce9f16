import { idParams } from '#shared/schemas/common'
import { correctionBody } from '#shared/schemas/applications'
import { correctRecord } from '../../../services/applications'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'operator'])
  const { id } = validParams(event, idParams)
  const body = await validBody(event, correctionBody)
  setResponseStatus(event, 201)
  return correctRecord(member, id, body.reason, body.record)
})
