import { idParams } from '#shared/schemas/common'
import { deletePlan } from '../../services/plans'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'agronomist'])
  const { id } = validParams(event, idParams)
  return deletePlan(member, id)
})
