import { z } from 'zod'
import { idParams } from '#shared/schemas/common'
import { CROPS } from '#shared/schemas/equipment'
import { getPlanter, listPlates } from '../../../services/equipment'
import { configFromPlanter } from '../../../services/setups'

// The planter's installed configuration as a setup to start editing from, with its results.
export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  const q = validQuery(event, z.object({ crop: z.enum(CROPS).optional(), target: z.coerce.number().positive().max(2_000_000).optional() }))
  const planter = await getPlanter(member.farmId, id)
  const plates = await listPlates(member.farmId)
  // Without a crop, start from the crop of the plate on the planter.
  const installed = plates.find((p) => p.id === planter.rowUnits.find((u) => u.seedPlateId)?.seedPlateId)
  const crop = q.crop ?? (installed?.crops[0] as typeof CROPS[number] | undefined) ?? 'corn'
  const config = configFromPlanter(planter, plates, crop, q.target ?? STARTING_TARGETS[crop] ?? 34_000)
  return { config, results: computeSetupResults(config) }
})
