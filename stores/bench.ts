import { defineStore } from 'pinia'
import type { SetupConfig } from '#shared/types/setup'

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

  const results = computed(() => {
    if (!config.value) return null
    try {
      return computeSetupResults(config.value)
    } catch {
      return null
    }
  })

  return { planterId, setupId, baseRevision, name, config, metric, start, results }
})
