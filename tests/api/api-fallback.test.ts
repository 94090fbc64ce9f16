import { describe, expect, it } from 'vitest'
import { baseUrl } from './helpers'

// An API client that gets a path or a method wrong is told so in JSON, not handed the app's HTML.
describe('requests no API route answers', () => {
  it.each([
    ['PATCH', '/api/health'],
    ['DELETE', '/api/setups'],
    ['GET', '/api/no-such-thing'],
    ['POST', '/api/fields/12/nowhere'],
  ])('%s %s is a JSON 404', async (method, path) => {
    const res = await fetch(`${baseUrl()}${path}`, { method, headers: { origin: baseUrl(), accept: 'application/json' } })
    expect(res.status).toBe(404)
    expect(res.headers.get('content-type')).toMatch(/application\/json/)
    const body = await res.json() as { message: string }
    expect(body.message).toContain(path)
  })
})
