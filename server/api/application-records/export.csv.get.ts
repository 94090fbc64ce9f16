import Papa from 'papaparse'
import { recordListQuery } from '#shared/schemas/applications'
import { recordsCsv } from '../../services/applications'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { season } = validQuery(event, recordListQuery)
  const csv = await recordsCsv(member.farmId, season)
  setResponseHeader(event, 'content-type', 'text/csv; charset=utf-8')
  setResponseHeader(event, 'content-disposition', `attachment; filename="application-records-${season ?? 'all'}.csv"`)
  // Free text could start a spreadsheet formula; escapeFormulae prefixes such cells with a quote.
  return Papa.unparse({ fields: [...csv.fields], data: csv.data }, { escapeFormulae: true })
})
