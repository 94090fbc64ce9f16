import { idParams } from '#shared/schemas/common'
import { transitionBody } from '#shared/schemas/plans'
import { transitionPlan } from '../../../services/plans'

// Who may make which move is decided per target status in the service (PLAN_STATUS_ROLES).
export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  const body = await validBody(event, transitionBody)
  return transitionPlan(member, id, body)
})
