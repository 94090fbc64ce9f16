// Maps low-level failures to answers a client can act on: the database being away is a 503 with a
// retry hint (the pool reconnects by itself), a unique-key clash or a record still in use a 409.
const UNAVAILABLE_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'EPIPE', 'ETIMEDOUT', '57P01', '57P02', '57P03', '08000', '08001', '08003', '08006'])

function rootCauses(error: unknown): Array<{ code?: string, message?: string }> {
  const out: Array<{ code?: string, message?: string }> = []
  let cur = error as { cause?: unknown, code?: string, message?: string } | undefined
  for (let i = 0; cur && i < 6; i++) {
    out.push(cur)
    cur = cur.cause as typeof cur
  }
  return out
}

export function classifyError(error: unknown) {
  for (const c of rootCauses(error)) {
    if ((c.code && UNAVAILABLE_CODES.has(c.code)) || /Connection terminated|timeout exceeded when trying to connect|Client has encountered a connection error/i.test(c.message ?? '')) {
      return createError({ statusCode: 503, message: 'The database is briefly unavailable. Please retry in a few seconds.', data: { retryAfterSeconds: 3 } })
    }
    if (c.code === '23505') return createError({ statusCode: 409, message: 'That already exists' })
    // A record still in use elsewhere (a foreign key with on delete restrict).
    if (c.code === '23503') return createError({ statusCode: 409, message: 'Other records still use this one; remove or change them first' })
    if (c.code === '22003') return createError({ statusCode: 400, message: 'A number is out of range', data: { fields: {} } })
    // A date PostgreSQL cannot store; the schemas refuse these first, this is the last line.
    if (c.code === '22007' || c.code === '22008') return createError({ statusCode: 400, message: 'A date is not valid', data: { fields: {} } })
  }
  return undefined
}

export default defineNitroPlugin((nitro) => {
  const original = nitro.h3App.options.onError
  nitro.h3App.options.onError = (error, event) => {
    const mapped = (error as { statusCode?: number }).statusCode && (error as { statusCode?: number }).statusCode! < 500 ? undefined : classifyError(error)
    if (mapped?.statusCode === 503) setResponseHeader(event, 'Retry-After', 3)
    return original?.(mapped ?? error, event)
  }
})
