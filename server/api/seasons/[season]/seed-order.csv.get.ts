import Papa from 'papaparse'
import { seasonParams } from '#shared/schemas/plans'
import { seasonSummary } from '../../../services/plans'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { season } = validParams(event, seasonParams)
  const summary = await seasonSummary(member.farmId, season, { hoursPerDay: 10, efficiencyPercent: 65 })
  const fields = ['crop', 'variety', 'lot number', 'unit', 'seeds needed', 'units needed', 'units on hand', 'units to order']
  const data = summary.lots.map((l) => [l.crop, l.variety, l.lotNumber, l.unitKind === 'seeds' ? `${l.unitSize} seeds` : `${l.unitSize} lb`, Math.round(l.seeds), l.unitsNeeded, l.unitsOnHand, l.shortfall])
  setResponseHeader(event, 'content-type', 'text/csv; charset=utf-8')
  setResponseHeader(event, 'content-disposition', `attachment; filename="seed-order-${season}.csv"`)
  // Variety and lot names are free text: a leading = + - @ must not run as a formula in a spreadsheet.
  return Papa.unparse({ fields, data }, { escapeFormulae: true })
})
