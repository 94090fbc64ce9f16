import type { Role } from '../../shared/types/roles'

// A signed-in member for component tests: the session the route guard reads and the account the pages read.
export function signInAs(role: Role, ids: { userId?: number, farmId?: number } = {}) {
  const userId = ids.userId ?? 3
  const farmId = ids.farmId ?? 1
  useState('nuxt-session').value = { user: { id: userId, email: `${role}@example.test`, name: `Test ${role}` } }
  useAccountStore().me = { user: { id: userId, email: `${role}@example.test`, name: `Test ${role}` }, farms: [{ id: farmId, name: 'Test Farm', role }], farmId, role, farmName: 'Test Farm' }
}
