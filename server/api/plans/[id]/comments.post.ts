import { idParams } from '#shared/schemas/common'
import { planCommentBody } from '#shared/schemas/plans'
import { addPlanComment } from '../../../services/plans'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  const body = await validBody(event, planCommentBody)
  setResponseStatus(event, 201)
  return addPlanComment(member, id, body)
})
