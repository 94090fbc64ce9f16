import pg from 'pg'

// One LISTEN connection per instance on the channel that every farm table's trigger notifies
// (migration 0007). Listeners hear the table's name, or '*' when the feed goes down or comes back:
// while it is down nobody can know what changed, so whatever depends on it must not trust a cache.
export const CHANGE_CHANNEL = 'rowbench_change'
export const CHANGE_TRIGGER = 'rowbench_change'
export const ANY_TABLE = '*'

type ChangeListener = (table: string) => void

const listeners = new Set<ChangeListener>()
let client: pg.Client | undefined
let live = false
let stopped = true
let retryTimer: ReturnType<typeof setTimeout> | undefined
let retryMs = 500
let heartbeat: ReturnType<typeof setInterval> | undefined
// A connection that died without a reset (a dropped NAT entry, a failover) would look alive for
// hours; a query on it every HEARTBEAT_MS, answered within HEARTBEAT_TIMEOUT_MS, proves it is not.
const HEARTBEAT_MS = Number(process.env.ROWBENCH_FEED_HEARTBEAT_MS || 10_000)
const HEARTBEAT_TIMEOUT_MS = Number(process.env.ROWBENCH_FEED_HEARTBEAT_TIMEOUT_MS || 5_000)

export function onDataChange(listener: ChangeListener) {
  listeners.add(listener)
  return () => listeners.delete(listener)
}

// True while the LISTEN connection is up and every table carries the trigger.
export function changeFeedLive() {
  return live
}

function announce(table: string) {
  for (const listener of listeners) listener(table)
}

function goDown(reason: string) {
  const wasLive = live
  live = false
  clearInterval(heartbeat)
  const old = client
  client = undefined
  old?.removeAllListeners()
  old?.on('error', () => {})
  old?.end().catch(() => {})
  announce(ANY_TABLE)
  if (wasLive) console.warn(`[change-feed] down (${reason}); responses are not cached until it is back`)
  if (stopped) return
  clearTimeout(retryTimer)
  retryTimer = setTimeout(connect, retryMs)
  retryTimer.unref?.()
  retryMs = Math.min(retryMs * 2, 10_000)
}

// Tables of this schema without the trigger: a write there would go unheard.
export async function unwatchedTables(db: pg.ClientBase): Promise<string[]> {
  const { rows } = await db.query<{ name: string }>(
    `select c.relname as name from pg_class c join pg_namespace n on n.oid = c.relnamespace
      where n.nspname = current_schema() and c.relkind in ('r', 'p')
        and not exists (select 1 from pg_trigger t where t.tgrelid = c.oid and t.tgname = $1)
      order by 1`, [CHANGE_TRIGGER])
  return rows.map((r) => r.name)
}

async function connect() {
  if (stopped || client) return
  const next = new pg.Client({
    connectionString: process.env.DATABASE_URL || useRuntimeConfig().databaseUrl,
    application_name: 'rowbench-change-feed',
    keepAlive: true,
    keepAliveInitialDelayMillis: 10_000,
    query_timeout: HEARTBEAT_TIMEOUT_MS,
  })
  client = next
  next.on('error', (err) => goDown(err.message))
  next.on('end', () => { if (client === next) goDown('connection closed') })
  next.on('notification', (msg) => announce(msg.payload || ANY_TABLE))
  try {
    await next.connect()
    await next.query(`LISTEN ${CHANGE_CHANNEL}`)
    const missing = await unwatchedTables(next)
    if (client !== next) return
    if (missing.length) {
      // Fail safe: serve everything from the database rather than risk a stale answer.
      console.warn(`[change-feed] tables without the ${CHANGE_TRIGGER} trigger: ${missing.join(', ')}; caching stays off`)
      return
    }
    retryMs = 500
    live = true
    // Anything kept while the feed was down is suspect.
    announce(ANY_TABLE)
    clearInterval(heartbeat)
    heartbeat = setInterval(() => {
      if (client !== next) return
      next.query('select 1').catch((err: Error) => { if (client === next) goDown(`no answer to the heartbeat: ${err.message}`) })
    }, HEARTBEAT_MS)
    heartbeat.unref?.()
  } catch (err) {
    if (client === next) goDown((err as Error).message)
  }
}

export function startChangeFeed() {
  if (!stopped) return
  stopped = false
  void connect()
}

export async function stopChangeFeed() {
  stopped = true
  clearTimeout(retryTimer)
  clearInterval(heartbeat)
  const old = client
  client = undefined
  live = false
  old?.removeAllListeners()
  old?.on('error', () => {})
  await old?.end().catch(() => {})
}
