import { defineStore } from 'pinia'
import type { Role } from '#shared/types/roles'

export interface FarmChoice { id: number, name: string, role: Role }
interface Me { user: { id: number, email: string, name: string }, farms: FarmChoice[], farmId: number | null, role: Role | null, farmName: string | null }

// Who is signed in and on which farm: outlives every page.
export const useAccountStore = defineStore('account', () => {
  const me = ref<Me | null>(null)
  const role = computed(() => me.value?.role ?? null)
  const farmName = computed(() => me.value?.farmName ?? '')

  async function load() {
    const headers = import.meta.server ? useRequestHeaders(['cookie']) : undefined
    try {
      me.value = await $fetch<Me>('/api/auth/me', { headers })
    } catch {
      me.value = null
    }
    return me.value
  }

  async function switchFarm(farmId: number) {
    await $fetch('/api/auth/switch-farm', { method: 'POST', body: { farmId } })
    await load()
  }

  function can(...roles: Role[]) {
    return !!role.value && roles.includes(role.value)
  }

  function clear() {
    me.value = null
  }

  return { me, role, farmName, load, switchFarm, can, clear }
})
