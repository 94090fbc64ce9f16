// A write on this instance drops the cached pages of the writer's farm (every farm's when no member
// was resolved) just before its answer is sent, so the writer's next read is fresh without waiting
// for the change feed. Wrapping `end` covers every way out: a value, a thrown error, a stream, a 204.
export default defineEventHandler((event) => {
  const method = event.method
  if (method === 'GET' || method === 'HEAD' || method === 'OPTIONS') return
  // Calculators only compute; they never write.
  if (event.path.startsWith('/api/calc/')) return
  const res = event.node.res
  const end = res.end
  res.end = function (this: typeof res, ...args: Parameters<typeof end>) {
    forgetCachedResponses(event.context.member?.farmId)
    return end.apply(this, args)
  } as typeof end
})
