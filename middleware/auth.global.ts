// Signed-out visitors go to the sign-in page; the server still checks every request.
const PUBLIC = ['/login', '/accept', '/reset', '/forgot']

export default defineNuxtRouteMiddleware(async (to) => {
  const { loggedIn } = useUserSession()
  const isPublic = PUBLIC.includes(to.path)
  if (!loggedIn.value) {
    if (!isPublic) return navigateTo({ path: '/login', query: to.fullPath !== '/' ? { next: to.fullPath } : undefined })
    return
  }
  const account = useAccountStore()
  if (!account.me) await account.load()
  if (!account.me && !isPublic) return navigateTo('/login')
  if (to.path === '/login') return navigateTo('/')
  const needs = to.meta.roles as string[] | undefined
  if (needs && account.role && !needs.includes(account.role)) return navigateTo('/')
})
