import type { H3Event } from 'h3'
import type { z } from 'zod'
import { fieldErrors } from '#shared/utils/validation'

export function badRequest(message: string, fields?: Record<string, string>): never {
  throw createError({ statusCode: 400, statusMessage: 'Bad Request', message, data: { fields: fields ?? {} } })
}

export async function validBody<S extends z.ZodType>(event: H3Event, schema: S): Promise<z.infer<S>> {
  // JSON.parse on the raw text: the API takes only JSON, JSON.parse never touches prototypes, and
  // the strict schemas below refuse any key they do not name; h3's readBody adds a scan on top.
  let body: unknown
  try {
    const raw = await readRawBody(event, 'utf8')
    body = raw ? JSON.parse(raw) : undefined
  } catch {
    badRequest('The request body is not valid JSON')
  }
  const result = schema.safeParse(body ?? {})
  if (!result.success) badRequest('Some fields need attention', fieldErrors(result.error))
  return result.data
}

export function validQuery<S extends z.ZodType>(event: H3Event, schema: S): z.infer<S> {
  const result = schema.safeParse(getQuery(event))
  if (!result.success) badRequest('Some query parameters need attention', fieldErrors(result.error))
  return result.data
}

export function validParams<S extends z.ZodType>(event: H3Event, schema: S): z.infer<S> {
  const result = schema.safeParse(getRouterParams(event))
  if (!result.success) throw createError({ statusCode: 404, message: 'Not found' })
  return result.data
}

export function notFound(what = 'Record'): never {
  throw createError({ statusCode: 404, message: `${what} not found` })
}
