import { idParams } from '#shared/schemas/common'
import { sectionPatch } from '#shared/schemas/equipment'
import { updateSection } from '../../services/equipment'

export default defineEventHandler(async (event) => {
  const member = await requireRole(event, ['owner', 'foreman'])
  const { id } = validParams(event, idParams)
  const body = await validBody(event, sectionPatch)
  return updateSection(member, id, body)
})
