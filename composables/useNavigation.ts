import type { Role } from '#shared/types/roles'

export interface NavItem { to: string, label: string, roles: Role[], hint: string }

const ALL: Role[] = ['owner', 'agronomist', 'operator', 'foreman']

// What each role works with, in the order of the season.
export const NAV_ITEMS: NavItem[] = [
  { to: '/', label: 'Today', roles: ALL, hint: 'Your farm at a glance' },
  { to: '/members', label: 'People', roles: ['owner'], hint: 'Invite members and set their roles' },
  { to: '/mailbox', label: 'Mailbox', roles: ['owner'], hint: 'Messages Rowbench sent (demo mailbox)' },
]

export function useNavigation() {
  const account = useAccountStore()
  return computed(() => NAV_ITEMS.filter((i) => account.role && i.roles.includes(account.role)))
}
