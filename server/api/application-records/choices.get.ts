import { recordChoices } from '../../services/applications'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  return recordChoices(member.farmId)
})
