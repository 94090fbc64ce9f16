// A request under /api that no route answers (an unknown path, or a method its path does not take)
// gets a JSON 404 instead of the page renderer's HTML.
export default defineNitroPlugin((nitro) => {
  nitro.hooks.hook('render:before', ({ event }) => {
    const path = event.path.split('?')[0]!
    if (path === '/api' || path.startsWith('/api/')) {
      throw createError({ statusCode: 404, message: `Nothing answers ${event.method} ${path}` })
    }
  })
})
