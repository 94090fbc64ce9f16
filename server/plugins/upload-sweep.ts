// Removes uploaded files that no record names a day after they were sent (a photo taken off a
// checklist line, a CSV never used), so storage holds only what the records show.
export default defineNitroPlugin((nitro) => {
  if (import.meta.prerender) return
  const every = Number(process.env.ROWBENCH_UPLOAD_SWEEP_MS || 3_600_000)
  const graceHours = Number(process.env.ROWBENCH_UPLOAD_GRACE_HOURS || 24)
  const timer = setInterval(() => {
    sweepOrphanUploads(graceHours)
      .then((n) => { if (n) console.log(`[uploads] removed ${n} file(s) no record named for ${graceHours} h`) })
      .catch((err) => console.warn('[uploads] sweep failed:', ((err as Error).cause as Error | undefined)?.message ?? (err as Error).message))
  }, every)
  timer.unref()
  nitro.hooks.hook('close', () => clearInterval(timer))
})
