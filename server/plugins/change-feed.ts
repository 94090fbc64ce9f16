// Starts the change feed and lets it clear what this instance keeps: cached pages on any change,
// cached roles when memberships or farms change (or when the feed cannot tell).
const ROLE_TABLES = new Set(['memberships', 'farms', 'users', ANY_TABLE])

export default defineNitroPlugin((nitro) => {
  if (import.meta.prerender) return
  onDataChange((table) => {
    forgetCachedResponses()
    if (ROLE_TABLES.has(table)) forgetAllMemberships()
  })
  startChangeFeed()
  nitro.hooks.hook('close', () => stopChangeFeed())
})
