import { CHECK_TAKER_ROLES } from '#shared/types/checks'
import { checkCreateBody } from '#shared/schemas/checks'
import { createCheck } from '../../services/checks'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, CHECK_TAKER_ROLES)
  const body = await validBody(event, checkCreateBody)
  setResponseStatus(event, 201)
  return createCheck(member, body)
})
