import { idParams } from '#shared/schemas/common'
import { sheetRevisionQuery } from '#shared/schemas/setups'
import { setupPickList } from '../../../services/installs'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  const { revision } = validQuery(event, sheetRevisionQuery)
  return setupPickList(member.farmId, id, revision)
})
