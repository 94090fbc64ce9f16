import { defineStore } from 'pinia'
import type { SetupConfig } from '#shared/types/setup'
import { setupConfig } from '#shared/schemas/setups'

// The setup being worked on at the bench; it survives moving to the rate chart and back.
export const useBenchStore = defineStore('bench', () => {
  const planterId = ref<number | null>(null)
  const setupId = ref<number | null>(null)
  const baseRevision = ref<number | null>(null)
  const name = ref('')
  const config = ref<SetupConfig | null>(null)
  const metric = ref(false)

  function start(input: { planterId: number, config: SetupConfig, setupId?: number | null, baseRevision?: number | null, name?: string }) {
    planterId.value = input.planterId
    config.value = structuredClone(toRaw(input.config))
    setupId.value = input.setupId ?? null
    baseRevision.value = input.baseRevision ?? null
    name.value = input.name ?? ''
  }

  // What the server would refuse, shown as the user types instead of after a failed save.
  const problems = computed(() => {
    if (!config.value) return []
    const check = setupConfig.safeParse(config.value)
    return check.success ? [] : [...new Set(check.error.issues.map((i) => i.message))]
  })

  const results = computed(() => {
    if (!config.value) return null
    try {
      return computeSetupResults(config.value)
    } catch {
      return null
    }
  })

  return { planterId, setupId, baseRevision, name, config, metric, start, results, problems }
})
