import { idParams } from '#shared/schemas/common'
import { calibrationBody } from '#shared/schemas/applications'
import { createCalibration } from '../../../services/applications'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'operator', 'foreman'])
  const { id } = validParams(event, idParams)
  const body = await validBody(event, calibrationBody)
  setResponseStatus(event, 201)
  return createCalibration(member, id, body)
})
