import { idParams } from '#shared/schemas/common'
import { planPatch } from '#shared/schemas/plans'
import { updatePlan } from '../../services/plans'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'agronomist'])
  const { id } = validParams(event, idParams)
  const body = await validBody(event, planPatch)
  return updatePlan(member, id, body)
})
