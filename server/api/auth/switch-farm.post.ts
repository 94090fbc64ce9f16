import { switchFarmBody } from '#shared/schemas/auth'
import { farmsOfUser } from '../../services/accounts'
export default defineEventHandler(async (event) => {
  const session = await requireUserSession(event, { message: 'Sign in to continue' })
  const { farmId } = await validBody(event, switchFarmBody)
  const farm = (await farmsOfUser(session.user.id)).find((f) => f.id === farmId)
  if (!farm) throw createError({ statusCode: 404, message: 'Farm not found' })
  await setUserSession(event, { farmId })
  return farm
})
