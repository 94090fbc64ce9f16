// Retries queued mail on a timer, so a message that failed waits and is delivered once SMTP is back.
export default defineNitroPlugin((nitro) => {
  if (import.meta.prerender) return
  const every = Number(process.env.ROWBENCH_OUTBOX_INTERVAL_MS || 10_000)
  const timer = setInterval(() => {
    flushOutbox().catch((err) => console.warn('[outbox] flush failed:', (err as Error).message))
  }, every)
  timer.unref()
  nitro.hooks.hook('close', () => clearInterval(timer))
})
