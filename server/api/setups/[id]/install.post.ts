import { idParams } from '#shared/schemas/common'
import { installBody } from '#shared/schemas/shop'
import { installSetup } from '../../../services/installs'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'foreman'])
  const { id } = validParams(event, idParams)
  const body = await validBody(event, installBody)
  return installSetup(member, id, body)
})
