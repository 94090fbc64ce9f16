import { idParams } from '#shared/schemas/common'
import { applySlipBody } from '#shared/schemas/checks'
import { applyCheckSlip } from '../../../services/checks'

// Same roles as editing the planter itself.
export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'foreman'])
  const { id } = validParams(event, idParams)
  const body = await validBody(event, applySlipBody)
  return applyCheckSlip(member, id, body)
})
