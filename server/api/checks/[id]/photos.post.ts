import { CHECK_TAKER_ROLES } from '#shared/types/checks'
import { idParams } from '#shared/schemas/common'
import { checkPhotosBody } from '#shared/schemas/checks'
import { addCheckPhotos } from '../../../services/checks'

// The service narrows the takers to the check's author; the owner and agronomists may add to any.
export default defineEventHandler(async (event) => {
  const member = await requireRole(event, CHECK_TAKER_ROLES)
  const { id } = validParams(event, idParams)
  const body = await validBody(event, checkPhotosBody)
  return addCheckPhotos(member, id, body)
})
