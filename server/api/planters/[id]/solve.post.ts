import { idParams } from '#shared/schemas/common'
import { solveBody } from '#shared/schemas/equipment'
import { solvePlanter } from '../../../services/equipment'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  const body = await validBody(event, solveBody)
  return solvePlanter(member, id, body)
})
