import { CHECK_REVIEWER_ROLES } from '#shared/types/checks'
import { idParams } from '#shared/schemas/common'
import { checkReviewBody } from '#shared/schemas/checks'
import { reviewCheck } from '../../../services/checks'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, CHECK_REVIEWER_ROLES)
  const { id } = validParams(event, idParams)
  const body = await validBody(event, checkReviewBody)
  return reviewCheck(member, id, body)
})
