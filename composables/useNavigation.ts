import type { Role } from '#shared/types/roles'

export interface NavItem { to: string, label: string, roles: Role[], hint: string }

const ALL: Role[] = ['owner', 'agronomist', 'operator', 'foreman']

// What each role works with, in the order of the season.
export const NAV_ITEMS: NavItem[] = [
  { to: '/', label: 'Today', roles: ALL, hint: 'Your farm at a glance' },
  { to: '/bench', label: 'Setup bench', roles: ALL, hint: 'Plate and sprocket choices, live seed rate, the solver' },
  { to: '/setups', label: 'Setups', roles: ALL, hint: 'Saved setups, their history and discussion' },
  { to: '/checks', label: 'Field checks', roles: ALL, hint: 'Seed drop, stand counts, spacing uniformity and the replant aid' },
  { to: '/planters', label: 'Equipment', roles: ALL, hint: 'Planters, row units and drive trains' },
  { to: '/inventory', label: 'Plates & sprockets', roles: ['owner', 'foreman', 'operator'], hint: 'What is on the shelf' },
  { to: '/fields', label: 'Fields', roles: ALL, hint: 'Acres, soils, tillage and outlines' },
  { to: '/seed-lots', label: 'Seed lots', roles: ALL, hint: 'Varieties, seed size, germination and units on hand' },
  { to: '/plans', label: 'Plans', roles: ALL, hint: 'Crop plans per field, their review and setups' },
  { to: '/season', label: 'Season', roles: ALL, hint: 'Seed needs, planting days and the seed order' },
  { to: '/shop', label: 'Shop', roles: ['owner', 'foreman', 'operator'], hint: 'Inspections, the work board and the maintenance log' },
  { to: '/applications', label: 'Applications', roles: ALL, hint: 'Granular rates, catch tests and pesticide records' },
  { to: '/members', label: 'People', roles: ['owner'], hint: 'Invite members and set their roles' },
  { to: '/mailbox', label: 'Mailbox', roles: ['owner'], hint: 'Messages Rowbench sent (demo mailbox)' },
]

export function useNavigation() {
  const account = useAccountStore()
  return computed(() => NAV_ITEMS.filter((i) => account.role && i.roles.includes(account.role)))
}
