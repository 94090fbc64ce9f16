import { farmsOfUser } from '../../services/accounts'
// Who is signed in, their farms and their role on the current one.
export default defineEventHandler(async (event) => {
  const session = await requireUserSession(event, { message: 'Sign in to continue' })
  const farms = await farmsOfUser(session.user.id)
  const current = farms.find((f) => f.id === session.farmId) ?? farms[0] ?? null
  if (current && current.id !== session.farmId) await setUserSession(event, { farmId: current.id })
  return { user: session.user, farms, farmId: current?.id ?? null, role: current?.role ?? null, farmName: current?.name ?? null }
})
