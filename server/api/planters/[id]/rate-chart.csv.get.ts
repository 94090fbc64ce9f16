import Papa from 'papaparse'
import { idParams } from '#shared/schemas/common'
import { rateChartQuery } from '#shared/schemas/equipment'
import { planterRateChart } from '../../../services/equipment'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  const query = validQuery(event, rateChartQuery)
  const chart = await planterRateChart(member, id, query)
  const rows = chart.rows.map((r) => ({
    ...Object.fromEntries(r.stages.flatMap((s) => [[`stage ${s.position} driver`, s.driverTeeth], [`stage ${s.position} driven`, s.drivenTeeth]])),
    'plate revs per wheel rev': roundTo(r.plateRevsPerWheelRev, 4),
    'seed spacing in': roundTo(r.seedSpacingIn, 2),
    ...Object.fromEntries(r.byRowSpacing.map((b) => [`seeds/acre at ${b.rowSpacingIn} in`, Math.round(b.seedsPerAcre)])),
    installed: r.installed ? 'yes' : '',
  }))
  setResponseHeader(event, 'content-type', 'text/csv; charset=utf-8')
  setResponseHeader(event, 'content-disposition', `attachment; filename="rate-chart-${chart.planter.name.replace(/[^\w-]+/g, '-')}-${chart.cellsPerPlate}-cells.csv"`)
  return Papa.unparse(rows)
})
