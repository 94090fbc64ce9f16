import { z } from 'zod'
import { idParams } from '#shared/schemas/common'
import { CROPS } from '#shared/schemas/equipment'
import { getPlanter, listPlates } from '../../../services/equipment'
import { configFromPlanter } from '../../../services/setups'

// The planter's installed configuration as a setup to start editing from, with its results.
export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  const q = validQuery(event, z.object({ crop: z.enum(CROPS).default('corn'), target: z.coerce.number().positive().max(2_000_000).default(34_000) }))
  const planter = await getPlanter(member.farmId, id)
  const config = configFromPlanter(planter, await listPlates(member.farmId), q.crop, q.target)
  return { config, results: computeSetupResults(config) }
})
