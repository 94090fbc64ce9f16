import { idParams } from '#shared/schemas/common'
import { sheetSendBody } from '#shared/schemas/shop'
import { sendSheet } from '../../../../services/sheets'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'operator', 'foreman'])
  const { id } = validParams(event, idParams)
  const body = await validBody(event, sheetSendBody)
  setResponseStatus(event, 202)
  return sendSheet(member, id, body)
})
