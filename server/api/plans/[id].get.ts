import { idParams } from '#shared/schemas/common'
import { getPlan } from '../../services/plans'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  return getPlan(member, id, { recommend: true })
})
