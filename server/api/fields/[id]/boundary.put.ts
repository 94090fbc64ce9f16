import { z } from 'zod'
import { idParams } from '#shared/schemas/common'
import { FIELD_EDITORS, boundaryQuery } from '#shared/schemas/fields'
import { setFieldBoundary } from '../../../services/fields'

// The body is the GeoJSON itself; checkBoundary in the service says what is wrong with it.
export default defineEventHandler(async (event) => {
  const member = await requireRole(event, FIELD_EDITORS)
  const { id } = validParams(event, idParams)
  const { useAcres } = validQuery(event, boundaryQuery)
  const body = await validBody(event, z.unknown())
  return setFieldBoundary(member, id, body, useAcres === 'true')
})
