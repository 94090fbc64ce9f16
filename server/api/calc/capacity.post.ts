import { capacityBody } from '#shared/schemas/calc'

export default defineEventHandler(async (event) => {
  await requireMember(event)
  const body = await validBody(event, capacityBody)
  return computeCapacity(body)
})
