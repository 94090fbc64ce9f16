import { catchTestBody } from '#shared/schemas/calc'
import { fitCatchTest } from '#shared/utils/application'

export default defineEventHandler(async (event) => {
  await requireMember(event)
  const body = await validBody(event, catchTestBody)
  return fitCatchTest(body)
})
