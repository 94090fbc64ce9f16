import { describe, expect, inject, it } from 'vitest'
import { Client, createFarm, linkToken, sql, TEST_PASSWORD, waitForMail } from './helpers'
import { startTestServer } from '../../scripts/lib/test-server.mjs'

// Production headers, the cookie behind HTTPS, and secrets that must never leave the server:
// passwords, their hashes and the one-time tokens mailed for invitations and resets.

describe('security', () => {
  it('sends the production security headers on pages and on the API', async () => {
    for (const path of ['/login', '/api/health']) {
      const res = await fetch(`${inject('baseUrl')}${path}`)
      expect(res.status).toBe(200)
      const csp = res.headers.get('content-security-policy') ?? ''
      expect(csp).toContain("default-src 'self'")
      expect(csp).toContain("frame-ancestors 'none'")
      expect(csp).toContain("object-src 'none'")
      expect(csp).not.toContain('unsafe-eval')
      expect(res.headers.get('x-content-type-options')).toBe('nosniff')
      expect(res.headers.get('x-frame-options')).toBe('DENY')
      expect(res.headers.get('referrer-policy')).toBe('same-origin')
    }
  })

  it('behind HTTPS marks the session cookie Secure, and never logs, returns or audits a password, hash or mailed token', async () => {
    const databaseName = new URL(inject('databaseUrl')).pathname.slice(1)
    const other = await startTestServer({ database: databaseName, fresh: false, port: 3185, smtpPort: 2595, captureOutput: true, env: { NUXT_SESSION_COOKIE_SECURE: 'true' } })
    try {
      const farm = await createFarm()
      const login = await fetch(`${other.baseUrl}/api/auth/login`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email: farm.users.owner.email, password: TEST_PASSWORD }) })
      expect(login.status).toBe(200)
      const cookie = login.headers.getSetCookie().find((c) => c.startsWith('rowbench-session='))!
      expect(cookie).toMatch(/;\s*Secure/i)
      expect(cookie).toMatch(/HttpOnly/i)
      const owner = new Client(other.baseUrl)
      owner.cookie = cookie.split(';')[0]!

      const wrong = 'not-the-password-7'
      expect((await new Client(other.baseUrl).post('/api/auth/login', { email: farm.users.owner.email, password: wrong })).status).toBe(401)
      const email = `secret-keeper-${Date.now()}@test.example`
      const answers: unknown[] = []
      const invite = await owner.post('/api/members/invite', { email, name: 'Sam Secret', role: 'operator' })
      expect(invite.status).toBe(201)
      answers.push(invite.data)
      const inviteToken = linkToken((await waitForMail((m) => m.to.includes(email), 15_000, other.mailbox)).text)
      const chosen = 'chosen-password-42'
      const invitee = new Client(other.baseUrl)
      const accepted = await invitee.post('/api/invitations/accept', { token: inviteToken, password: chosen })
      expect(accepted.status).toBe(200)
      answers.push(accepted.data, (await invitee.get('/api/auth/me')).data, (await owner.get('/api/members')).data)
      answers.push((await new Client(other.baseUrl).post('/api/auth/forgot', { email })).data)
      const resetToken = linkToken((await waitForMail((m) => m.to.includes(email) && /reset/i.test(m.subject), 15_000, other.mailbox)).text)
      const renewed = 'renewed-password-43'
      const reset = await new Client(other.baseUrl).post('/api/auth/reset', { token: resetToken, password: renewed })
      expect(reset.status).toBe(200)
      answers.push(reset.data)

      const [{ password_hash: hash }] = await sql<{ password_hash: string }>('select password_hash from users where email = $1', [email]) as [{ password_hash: string }]
      const secrets = [TEST_PASSWORD, wrong, chosen, renewed, inviteToken, resetToken, hash]
      const answered = JSON.stringify(answers)
      const logged = other.log()
      const audited = JSON.stringify(await sql('select before, after from audit_log where farm_id = $1 or user_id in (select id from users where email = $2)', [farm.farmId, email]))
      expect(audited.length).toBeGreaterThan(100)
      for (const secret of secrets) {
        expect(answered).not.toContain(secret)
        expect(logged).not.toContain(secret)
        expect(audited).not.toContain(secret)
      }
      expect(answered).not.toMatch(/password|token_hash|tokenHash/i)
      expect(audited).not.toMatch(/"(password\w*|token\w*)"\s*:/i)
    } finally {
      await other.stop()
    }
  }, 60_000)
})
