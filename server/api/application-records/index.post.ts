import { applicationRecordBody } from '#shared/schemas/applications'
import { createRecord } from '../../services/applications'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'operator'])
  const body = await validBody(event, applicationRecordBody)
  setResponseStatus(event, 201)
  return createRecord(member, body)
})
