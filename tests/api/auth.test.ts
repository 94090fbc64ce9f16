import { describe, expect, it } from 'vitest'
import { Client, createFarm, linkToken, sql, TEST_PASSWORD, waitForMail } from './helpers'

describe('sign-in', () => {
  it('signs in with the right pair and sets an HttpOnly, SameSite=Lax session cookie', async () => {
    const farm = await createFarm()
    const res = await fetch(`${(await import('./helpers')).baseUrl()}/api/auth/login`, {
      method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email: farm.users.owner.email, password: TEST_PASSWORD }),
    })
    expect(res.status).toBe(200)
    const cookie = res.headers.getSetCookie().find((c) => c.startsWith('rowbench-session='))!
    expect(cookie).toMatch(/HttpOnly/i)
    expect(cookie).toMatch(/SameSite=Lax/i)
    const body = await res.json()
    expect(body.farmId).toBe(farm.farmId)
    expect(JSON.stringify(body)).not.toMatch(/password/i)
  })

  it('refuses a bad pair with one message that does not say which part was wrong', async () => {
    const farm = await createFarm()
    const c = new Client()
    const wrongPassword = await c.post('/api/auth/login', { email: farm.users.owner.email, password: 'not-the-password' })
    const unknownUser = await c.post('/api/auth/login', { email: 'nobody-here@test.example', password: 'not-the-password' })
    expect(wrongPassword.status).toBe(401)
    expect(unknownUser.status).toBe(401)
    expect(wrongPassword.data.message).toBe(unknownUser.data.message)
  })

  it('limits failed attempts per e-mail with a 429 and a clear message', async () => {
    const farm = await createFarm()
    const c = new Client()
    const statuses: number[] = []
    for (let i = 0; i < 11; i++) statuses.push((await c.post('/api/auth/login', { email: farm.users.foreman.email, password: `wrong-${i}` })).status)
    expect(statuses.slice(0, 10).every((s) => s === 401)).toBe(true)
    const limited = await c.post('/api/auth/login', { email: farm.users.foreman.email, password: TEST_PASSWORD })
    expect(limited.status).toBe(429)
    expect(limited.data.message).toMatch(/too many/i)
  })

  it('limits failed attempts per client address across e-mails', async () => {
    const c = new Client()
    const ip = { 'x-forwarded-for': '203.0.113.77' }
    for (let i = 0; i < 20; i++) {
      const r = await c.request('POST', '/api/auth/login', { email: `guess-${i}@test.example`, password: 'nope' }, ip)
      expect(r.status).toBe(401)
    }
    const limited = await c.request('POST', '/api/auth/login', { email: 'guess-last@test.example', password: 'nope' }, ip)
    expect(limited.status).toBe(429)
    const otherAddress = await c.request('POST', '/api/auth/login', { email: 'guess-last@test.example', password: 'nope' }, { 'x-forwarded-for': '203.0.113.78' })
    expect(otherAddress.status).toBe(401)
  })

  it('signs out', async () => {
    const farm = await createFarm()
    const c = await farm.as('operator')
    expect((await c.get('/api/auth/me')).status).toBe(200)
    expect((await c.post('/api/auth/logout')).status).toBe(200)
    expect((await c.get('/api/auth/me')).status).toBe(401)
  })

  it('rejects unknown fields and bad e-mail with per-field messages', async () => {
    const res = await new Client().post('/api/auth/login', { email: 'nope', password: 'x', extra: 1 })
    expect(res.status).toBe(400)
    expect(res.data.data.fields.email).toBeTruthy()
    expect(res.data.data.fields.extra).toBe('Unknown field')
  })
})

describe('invitations and password reset', () => {
  it('invites by e-mail, accepts with a password, and signs the new member in', async () => {
    const farm = await createFarm()
    const owner = await farm.as('owner')
    const email = `invitee-${Date.now()}@test.example`
    const inv = await owner.post('/api/members/invite', { email, name: 'Ivy Invitee', role: 'agronomist' })
    expect(inv.status).toBe(201)
    const mail = await waitForMail((m) => m.to.includes(email))
    expect(mail.subject).toContain(farm.farmName)
    const token = linkToken(mail.text)
    const fresh = new Client()
    const accepted = await fresh.post('/api/invitations/accept', { token, password: 'a-new-password-1' })
    expect(accepted.status).toBe(200)
    const me = await fresh.get('/api/auth/me')
    expect(me.data.role).toBe('agronomist')
    expect(me.data.farmId).toBe(farm.farmId)
    const again = await new Client().post('/api/invitations/accept', { token, password: 'a-new-password-2' })
    expect(again.status).toBe(400)
    const signIn = await new Client().post('/api/auth/login', { email, password: 'a-new-password-1' })
    expect(signIn.status).toBe(200)
    const [row] = await sql<{ token_hash: string }>('select token_hash from invitations where email = $1', [email])
    expect(row!.token_hash).not.toBe(token)
  })

  it('resets a password with the link read from the fake SMTP', async () => {
    const farm = await createFarm()
    const email = farm.users.operator.email
    const res = await new Client().post('/api/auth/forgot', { email })
    expect(res.status).toBe(200)
    const mail = await waitForMail((m) => m.to.includes(email) && /reset/i.test(m.subject))
    const token = linkToken(mail.text)
    expect((await new Client().post('/api/auth/reset', { token, password: 'brand-new-pass-9' })).status).toBe(200)
    expect((await new Client().post('/api/auth/login', { email, password: TEST_PASSWORD })).status).toBe(401)
    expect((await new Client().post('/api/auth/login', { email, password: 'brand-new-pass-9' })).status).toBe(200)
    expect((await new Client().post('/api/auth/reset', { token, password: 'another-pass-99' })).status).toBe(400)
  })
})

describe('roles and farm scope', () => {
  it('answers 401 to anonymous requests', async () => {
    const c = new Client()
    expect((await c.get('/api/members')).status).toBe(401)
    expect((await c.get('/api/auth/me')).status).toBe(401)
  })

  it('refuses owner-only routes to every other role with 403', async () => {
    const farm = await createFarm()
    for (const role of ['agronomist', 'operator', 'foreman'] as const) {
      const c = await farm.as(role)
      expect((await c.post('/api/members/invite', { email: 'x@test.example', name: 'X', role: 'operator' })).status).toBe(403)
      expect((await c.get('/api/mailbox')).status).toBe(403)
    }
  })

  it('answers 404 when a member of one farm touches another farm\'s record', async () => {
    const a = await createFarm()
    const b = await createFarm()
    const [bMembership] = await sql<{ id: number }>('select id from memberships where farm_id = $1 limit 1', [b.farmId])
    const ownerA = await a.as('owner')
    expect((await ownerA.patch(`/api/members/${bMembership!.id}`, { role: 'operator' })).status).toBe(404)
    expect((await ownerA.delete(`/api/members/${bMembership!.id}`)).status).toBe(404)
    expect((await ownerA.post('/api/auth/switch-farm', { farmId: b.farmId })).status).toBe(404)
  })

  it('never removes the last owner, and a removed member loses access at once', async () => {
    const farm = await createFarm()
    const owner = await farm.as('owner')
    const members = (await owner.get('/api/members')).data as { id: number, role: string, userId: number }[]
    const ownerRow = members.find((m) => m.role === 'owner')!
    expect((await owner.delete(`/api/members/${ownerRow.id}`)).status).toBe(409)
    expect((await owner.patch(`/api/members/${ownerRow.id}`, { role: 'operator' })).status).toBe(409)
    const operator = await farm.as('operator')
    expect((await operator.get('/api/members')).status).toBe(200)
    const opRow = members.find((m) => m.userId === farm.users.operator.id)!
    expect((await owner.delete(`/api/members/${opRow.id}`)).status).toBe(200)
    expect((await operator.get('/api/members')).status).toBe(403)
  })

  it('a role change takes effect on the next request', async () => {
    const farm = await createFarm()
    const owner = await farm.as('owner')
    const foreman = await farm.as('foreman')
    expect((await foreman.get('/api/mailbox')).status).toBe(403)
    const members = (await owner.get('/api/members')).data as { id: number, userId: number }[]
    const row = members.find((m) => m.userId === farm.users.foreman.id)!
    expect((await owner.patch(`/api/members/${row.id}`, { role: 'owner' })).status).toBe(200)
    expect((await foreman.get('/api/mailbox')).status).toBe(200)
  })

  it('writes every member change to the audit log', async () => {
    const farm = await createFarm()
    const owner = await farm.as('owner')
    const members = (await owner.get('/api/members')).data as { id: number, userId: number }[]
    const row = members.find((m) => m.userId === farm.users.agronomist.id)!
    await owner.patch(`/api/members/${row.id}`, { role: 'foreman' })
    const audit = await sql<{ action: string, before: { role: string }, after: { role: string } }>('select action, before, after from audit_log where farm_id = $1 and entity = $2', [farm.farmId, 'membership'])
    expect(audit).toContainEqual({ action: 'change-role', before: { role: 'agronomist' }, after: { role: 'foreman' } })
  })

  it('refuses a state-changing request from a foreign origin', async () => {
    const farm = await createFarm()
    const owner = await farm.as('owner')
    const res = await owner.request('POST', '/api/members/invite', { email: 'x@test.example', name: 'X', role: 'operator' }, { origin: 'https://evil.example' })
    expect(res.status).toBe(403)
  })
})

describe('accounts under pressure', () => {
  it('an invitation to an address with an account asks for that account\'s password and never replaces it', async () => {
    const home = await createFarm()
    const other = await createFarm()
    const inviter = await other.as('owner')
    const email = home.users.agronomist.email
    expect((await inviter.post('/api/members/invite', { email, name: 'Already Here', role: 'operator' })).status).toBe(201)
    const token = linkToken((await waitForMail((m) => m.to.includes(email) && m.subject.includes(other.farmName))).text)
    expect((await new Client().post('/api/invitations/lookup', { token })).data).toMatchObject({ email, accountExists: true })
    // Whoever holds the link cannot set a new password on the existing account.
    const takeover = await new Client().post('/api/invitations/accept', { token, password: 'attacker-chosen-1' })
    expect(takeover.status).toBe(400)
    expect(takeover.data.data.fields.password).toBe('Enter the password of your Rowbench account')
    expect((await new Client().post('/api/auth/login', { email, password: 'attacker-chosen-1' })).status).toBe(401)
    expect(await sql('select 1 from memberships where farm_id = $1 and user_id = $2', [other.farmId, home.users.agronomist.id])).toEqual([])
    // With the account's own password the farm is added and the password stays.
    const joined = new Client()
    expect((await joined.post('/api/invitations/accept', { token, password: TEST_PASSWORD })).status).toBe(200)
    expect((await joined.get('/api/auth/me')).data.farmId).toBe(other.farmId)
    expect((await new Client().post('/api/auth/login', { email, password: TEST_PASSWORD })).status).toBe(200)
  })

  it('one invitation link used twice at once joins once', async () => {
    const farm = await createFarm()
    const owner = await farm.as('owner')
    const email = `twice-${Date.now()}@test.example`
    expect((await owner.post('/api/members/invite', { email, name: 'Twice Tried', role: 'foreman' })).status).toBe(201)
    const token = linkToken((await waitForMail((m) => m.to.includes(email))).text)
    const results = await Promise.all([1, 2, 3].map((i) => new Client().post('/api/invitations/accept', { token, password: `first-try-pass-${i}` })))
    expect(results.map((r) => r.status).sort()).toEqual([200, 400, 400])
    expect(await sql<{ n: number }>('select count(*)::int as n from users where email = $1', [email])).toEqual([{ n: 1 }])
  })

  it('two owners demoting each other at the same moment leave the farm one owner', async () => {
    const farm = await createFarm()
    const owner = await farm.as('owner')
    const members = (await owner.get('/api/members')).data as { id: number, userId: number }[]
    const second = members.find((m) => m.userId === farm.users.agronomist.id)!
    expect((await owner.patch(`/api/members/${second.id}`, { role: 'owner' })).status).toBe(200)
    const first = members.find((m) => m.userId === farm.users.owner.id)!
    const secondOwner = await farm.as('agronomist')
    for (let round = 0; round < 5; round++) {
      const [a, b] = await Promise.all([owner.patch(`/api/members/${second.id}`, { role: 'operator' }), secondOwner.patch(`/api/members/${first.id}`, { role: 'operator' })])
      const owners = await sql<{ n: number }>(`select count(*)::int as n from memberships where farm_id = $1 and role = 'owner'`, [farm.farmId])
      expect(owners).toEqual([{ n: 1 }])
      // One wins; the other is refused: 409 when both ran together, 403 when it came after and
      // its sender was no longer an owner.
      const statuses = [a.status, b.status].sort((x, y) => x - y)
      expect(statuses[0]).toBe(200)
      expect([403, 409]).toContain(statuses[1])
      // Put both back as owners for the next round, through the one who kept the role.
      const keeper = a.status === 200 ? owner : secondOwner
      const demoted = a.status === 200 ? second : first
      expect((await keeper.patch(`/api/members/${demoted.id}`, { role: 'owner' })).status).toBe(200)
    }
  })

  it('shows an owner only the current farm\'s mail, and never a password reset', async () => {
    const a = await createFarm()
    const b = await createFarm()
    const ownerA = await a.as('owner')
    const ownerB = await b.as('owner')
    const invited = `mailbox-${Date.now()}@test.example`
    expect((await ownerA.post('/api/members/invite', { email: invited, name: 'Mail Box', role: 'operator' })).status).toBe(201)
    await waitForMail((m) => m.to.includes(invited))
    expect((await new Client().post('/api/auth/forgot', { email: b.users.owner.email })).status).toBe(200)
    await waitForMail((m) => m.to.includes(b.users.owner.email) && /reset/i.test(m.subject))
    const seenByA = (await ownerA.get('/api/mailbox')).data as { to: string[], subject: string }[]
    const seenByB = (await ownerB.get('/api/mailbox')).data as { to: string[], subject: string }[]
    expect(seenByA.some((m) => m.to.includes(invited))).toBe(true)
    expect(seenByB.some((m) => m.to.includes(invited))).toBe(false)
    expect([...seenByA, ...seenByB].some((m) => /reset/i.test(m.subject))).toBe(false)
  })
})
