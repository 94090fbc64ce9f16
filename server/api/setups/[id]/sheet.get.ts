import { idParams } from '#shared/schemas/common'
import { sheetRevisionQuery } from '#shared/schemas/setups'
import { buildSheet } from '../../../services/sheets'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  const { revision } = validQuery(event, sheetRevisionQuery)
  return buildSheet(member.farmId, id, revision)
})
