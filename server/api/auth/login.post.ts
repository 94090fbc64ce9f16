import { loginBody } from '#shared/schemas/auth'
import { farmsOfUser, findUserByEmail } from '../../services/accounts'
export default defineEventHandler(async (event) => {
  const body = await validBody(event, loginBody)
  const keys = loginKeys(event, body.email)
  if (isLimited(keys)) {
    setResponseHeader(event, 'Retry-After', 900)
    throw createError({ statusCode: 429, message: 'Too many failed sign-in attempts. Wait 15 minutes and try again, or reset your password.' })
  }
  const user = await findUserByEmail(body.email)
  const ok = user?.passwordHash ? await verifyPassword(user.passwordHash, body.password) : false
  if (!user || !ok) {
    recordFailure(keys)
    throw createError({ statusCode: 401, message: 'E-mail or password is not right' })
  }
  clearFailures(keys.email)
  const farms = await farmsOfUser(user.id)
  await setUserSession(event, { user: { id: user.id, email: user.email, name: user.name }, farmId: farms[0]?.id ?? null })
  return { user: { id: user.id, email: user.email, name: user.name }, farms, farmId: farms[0]?.id ?? null }
})
