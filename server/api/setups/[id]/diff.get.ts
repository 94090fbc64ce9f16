import { idParams } from '#shared/schemas/common'
import { diffQuery } from '#shared/schemas/setups'
import { diffRevisions } from '../../../services/setups'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  const { from, to } = validQuery(event, diffQuery)
  return diffRevisions(member.farmId, id, from, to)
})
