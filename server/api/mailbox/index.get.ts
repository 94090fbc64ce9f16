// The demo's fake SMTP inbox; absent when Rowbench sends through a real SMTP server.
export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner'])
  const dir = mailboxDir()
  if (!dir) throw createError({ statusCode: 404, message: 'There is no local mailbox: mail goes to a real SMTP server' })
  return readMailbox(dir, member.farmId)
})
