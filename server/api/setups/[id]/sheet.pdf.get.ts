import { idParams } from '#shared/schemas/common'
import { sheetRevisionQuery } from '#shared/schemas/setups'
import { buildSheet, sheetFileName, sheetPdf } from '../../../services/sheets'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  const { revision } = validQuery(event, sheetRevisionQuery)
  const sheet = await buildSheet(member.farmId, id, revision)
  const pdf = await sheetPdf(sheet)
  setResponseHeader(event, 'content-type', 'application/pdf')
  setResponseHeader(event, 'content-disposition', `attachment; filename="${sheetFileName(sheet)}"`)
  setResponseHeader(event, 'cache-control', 'private, no-store')
  return pdf
})
