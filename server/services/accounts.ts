import type { Tx } from '../utils/db'
import type { Member } from '../utils/membership'
import { and, asc, eq, gt, isNull, sql } from 'drizzle-orm'
import type { Role } from '#shared/types/roles'

export async function farmsOfUser(userId: number) {
  return useDb()
    .select({ id: schema.farms.id, name: schema.farms.name, role: schema.memberships.role })
    .from(schema.memberships)
    .innerJoin(schema.farms, eq(schema.farms.id, schema.memberships.farmId))
    .where(eq(schema.memberships.userId, userId))
    .orderBy(asc(schema.farms.name))
}

export async function findUserByEmail(email: string) {
  const [user] = await useDb().select().from(schema.users).where(eq(schema.users.email, email.toLowerCase()))
  return user
}

export async function listMembers(farmId: number) {
  return useDb()
    .select({ id: schema.memberships.id, userId: schema.users.id, name: schema.users.name, email: schema.users.email, role: schema.memberships.role, since: schema.memberships.createdAt })
    .from(schema.memberships)
    .innerJoin(schema.users, eq(schema.users.id, schema.memberships.userId))
    .where(eq(schema.memberships.farmId, farmId))
    .orderBy(asc(schema.users.name))
}

export async function createInvitation(member: Member, input: { email: string, name: string, role: Role }) {
  const { token, hash } = newToken()
  return useDb().transaction(async (tx) => {
    const existing = await tx.select({ id: schema.memberships.id }).from(schema.memberships)
      .innerJoin(schema.users, eq(schema.users.id, schema.memberships.userId))
      .where(and(eq(schema.memberships.farmId, member.farmId), eq(schema.users.email, input.email)))
    if (existing.length) throw createError({ statusCode: 409, message: `${input.email} is already a member of this farm` })
    const [inv] = await tx.insert(schema.invitations).values({
      farmId: member.farmId, email: input.email, name: input.name, role: input.role, tokenHash: hash,
      invitedBy: member.user.id, expiresAt: new Date(Date.now() + 7 * 86_400_000),
    }).returning({ id: schema.invitations.id, email: schema.invitations.email, role: schema.invitations.role, expiresAt: schema.invitations.expiresAt })
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'invite', entity: 'invitation', entityId: inv!.id, after: inv })
    const link = appUrl(`/accept?token=${token}`)
    await queueMail({
      farmId: member.farmId,
      to: input.email,
      subject: `You are invited to ${member.farmName} on Rowbench`,
      text: `Hello ${input.name},\n\n${member.user.name} invited you to join ${member.farmName} on Rowbench as ${input.role}.\n\nSet your password and join here (the link works for 7 days):\n${link}\n`,
    }, tx)
    return inv!
  }).finally(() => void flushOutbox())
}

export async function findOpenInvitation(token: string) {
  const [inv] = await useDb()
    .select({ id: schema.invitations.id, email: schema.invitations.email, name: schema.invitations.name, role: schema.invitations.role, farmId: schema.invitations.farmId, farmName: schema.farms.name })
    .from(schema.invitations)
    .innerJoin(schema.farms, eq(schema.farms.id, schema.invitations.farmId))
    .where(and(eq(schema.invitations.tokenHash, hashToken(token)), isNull(schema.invitations.acceptedAt), gt(schema.invitations.expiresAt, new Date())))
  return inv
}

export async function acceptInvitation(token: string, password: string, name?: string) {
  const inv = await findOpenInvitation(token)
  if (!inv) throw invalidInvitation()
  const [existing] = await useDb().select().from(schema.users).where(eq(schema.users.email, inv.email))
  // An address that already has an account joins with that account's password: whoever holds the
  // link must not be able to set a new one (that would take the account over).
  if (existing && !(existing.passwordHash && await verifyPassword(existing.passwordHash, password))) {
    throw createError({ statusCode: 400, message: 'This address already has a Rowbench account: enter its password to join', data: { fields: { password: 'Enter the password of your Rowbench account' } } })
  }
  const passwordHash = existing ? null : await hashPassword(password)
  return useDb().transaction(async (tx) => {
    // Claimed in one statement, so two uses of the same link cannot both succeed.
    const [claimed] = await tx.update(schema.invitations).set({ acceptedAt: new Date() })
      .where(and(eq(schema.invitations.id, inv.id), isNull(schema.invitations.acceptedAt), gt(schema.invitations.expiresAt, new Date())))
      .returning({ id: schema.invitations.id })
    if (!claimed) throw invalidInvitation()
    let user = existing
    if (!user) [user] = await tx.insert(schema.users).values({ email: inv.email, name: name || inv.name, passwordHash: passwordHash! }).returning()
    await tx.insert(schema.memberships).values({ farmId: inv.farmId, userId: user!.id, role: inv.role }).onConflictDoNothing()
    await writeAudit(tx, { farmId: inv.farmId, userId: user!.id, action: 'accept-invitation', entity: 'membership', entityId: user!.id, after: { role: inv.role } })
    return { user: { id: user!.id, email: user!.email, name: user!.name }, farmId: inv.farmId }
  })
}

function invalidInvitation() {
  return createError({ statusCode: 400, message: 'This invitation link is invalid, used or expired', data: { fields: { token: 'Invalid or expired invitation' } } })
}

export async function changeRole(member: Member, membershipId: number, role: Role) {
  return useDb().transaction(async (tx) => {
    await lockOwners(tx, member.farmId)
    const [before] = await tx.select().from(schema.memberships)
      .where(and(eq(schema.memberships.id, membershipId), eq(schema.memberships.farmId, member.farmId))).for('update')
    if (!before) notFound('Member')
    if (before.role === 'owner' && role !== 'owner') await assertAnotherOwner(tx, member.farmId, membershipId)
    const [after] = await tx.update(schema.memberships).set({ role }).where(eq(schema.memberships.id, membershipId)).returning()
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'change-role', entity: 'membership', entityId: membershipId, before: { role: before.role }, after: { role } })
    forgetMembership(before.userId, member.farmId)
    return after!
  })
}

export async function removeMember(member: Member, membershipId: number) {
  return useDb().transaction(async (tx) => {
    await lockOwners(tx, member.farmId)
    const [before] = await tx.select().from(schema.memberships)
      .where(and(eq(schema.memberships.id, membershipId), eq(schema.memberships.farmId, member.farmId))).for('update')
    if (!before) notFound('Member')
    if (before.role === 'owner') await assertAnotherOwner(tx, member.farmId, membershipId)
    await tx.delete(schema.memberships).where(eq(schema.memberships.id, membershipId))
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'remove', entity: 'membership', entityId: membershipId, before })
    forgetMembership(before.userId, member.farmId)
    return { removed: membershipId }
  })
}

// Taken first, in id order, by every change that could leave a farm without an owner: two owners
// demoting each other at once then run one after the other (no deadlock), and the second is refused.
async function lockOwners(tx: Tx, farmId: number) {
  await tx.select({ id: schema.memberships.id }).from(schema.memberships)
    .where(and(eq(schema.memberships.farmId, farmId), eq(schema.memberships.role, 'owner'))).orderBy(asc(schema.memberships.id)).for('update')
}

async function assertAnotherOwner(tx: Tx, farmId: number, exceptMembershipId: number) {
  const [row] = await tx.select({ n: sql<number>`count(*)::int` }).from(schema.memberships)
    .where(and(eq(schema.memberships.farmId, farmId), eq(schema.memberships.role, 'owner'), sql`${schema.memberships.id} <> ${exceptMembershipId}`))
  if (!row || row.n < 1) throw createError({ statusCode: 409, message: 'A farm must keep at least one owner' })
}

export async function startPasswordReset(email: string) {
  const user = await findUserByEmail(email)
  if (!user) return
  const { token, hash } = newToken()
  await useDb().transaction(async (tx) => {
    await tx.insert(schema.passwordResets).values({ userId: user.id, tokenHash: hash, expiresAt: new Date(Date.now() + 60 * 60_000) })
    await writeAudit(tx, { farmId: null, userId: user.id, action: 'request-reset', entity: 'user', entityId: user.id })
    await queueMail({
      to: user.email,
      subject: 'Reset your Rowbench password',
      text: `Hello ${user.name},\n\nSomeone asked to reset the password of this account. If it was you, choose a new password here (the link works for one hour):\n${appUrl(`/reset?token=${token}`)}\n\nIf it was not you, ignore this message.\n`,
    }, tx)
  })
  void flushOutbox()
}

export async function finishPasswordReset(token: string, password: string) {
  const passwordHash = await hashPassword(password)
  return useDb().transaction(async (tx) => {
    const [reset] = await tx.select().from(schema.passwordResets)
      .where(and(eq(schema.passwordResets.tokenHash, hashToken(token)), isNull(schema.passwordResets.usedAt), gt(schema.passwordResets.expiresAt, new Date()))).for('update')
    if (!reset) throw createError({ statusCode: 400, message: 'This reset link is invalid, used or expired', data: { fields: { token: 'Invalid or expired link' } } })
    await tx.update(schema.passwordResets).set({ usedAt: new Date() }).where(eq(schema.passwordResets.id, reset.id))
    await tx.update(schema.users).set({ passwordHash }).where(eq(schema.users.id, reset.userId))
    await writeAudit(tx, { farmId: null, userId: reset.userId, action: 'reset-password', entity: 'user', entityId: reset.userId })
    return { ok: true }
  })
}
