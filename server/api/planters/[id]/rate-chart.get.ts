import { idParams } from '#shared/schemas/common'
import { rateChartQuery } from '#shared/schemas/equipment'
import { planterRateChart } from '../../../services/equipment'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  const query = validQuery(event, rateChartQuery)
  return planterRateChart(member, id, query)
})
