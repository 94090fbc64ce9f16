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
  // Whose work this is ("user:farm"), so a different account or farm never finds it.
  const owner = ref<string | null>(null)
  // The config as loaded or last saved, to tell kept edits from a copy the server already has.
  const savedJson = ref<string | null>(null)

  function start(input: { planterId: number, config: SetupConfig, setupId?: number | null, baseRevision?: number | null, name?: string, owner?: string | null }) {
    planterId.value = input.planterId
    config.value = structuredClone(toRaw(input.config))
    setupId.value = input.setupId ?? null
    baseRevision.value = input.baseRevision ?? null
    name.value = input.name ?? ''
    owner.value = input.owner ?? null
    savedJson.value = JSON.stringify(config.value)
  }

  function markSaved() {
    savedJson.value = config.value ? JSON.stringify(config.value) : null
  }

  // Forget the work on a farm switch or a sign-out; the unit preference stays unless asked.
  function reset(options: { preferences?: boolean } = {}) {
    planterId.value = null
    setupId.value = null
    baseRevision.value = null
    name.value = ''
    config.value = null
    owner.value = null
    savedJson.value = null
    if (options.preferences) metric.value = false
  }

  const edited = computed(() => !!config.value && JSON.stringify(config.value) !== savedJson.value)

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

  return { planterId, setupId, baseRevision, name, config, metric, owner, start, markSaved, reset, edited, results, problems }
})
