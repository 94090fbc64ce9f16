import { replantBody } from '#shared/schemas/calc'

export default defineEventHandler(async (event) => {
  await requireMember(event)
  const body = await validBody(event, replantBody)
  return replantDecision(body)
})
