// Refuses state-changing requests sent from another site's pages (a second line behind SameSite=Lax).
export default defineEventHandler((event) => {
  const method = event.method
  if (method === 'GET' || method === 'HEAD' || method === 'OPTIONS') return
  const origin = getRequestHeader(event, 'origin')
  if (!origin) return
  const host = getRequestHeader(event, 'x-forwarded-host') || getRequestHeader(event, 'host')
  let originHost = ''
  try {
    originHost = new URL(origin).host
  } catch { /* malformed origin is refused below */ }
  if (!host || originHost !== host) {
    throw createError({ statusCode: 403, message: 'Requests from another site are refused' })
  }
})
