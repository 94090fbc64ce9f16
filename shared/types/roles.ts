export const ROLES = ['owner', 'agronomist', 'operator', 'foreman'] as const
export type Role = (typeof ROLES)[number]

export const ROLE_LABELS: Record<Role, string> = {
  owner: 'Owner',
  agronomist: 'Agronomist',
  operator: 'Operator',
  foreman: 'Shop foreman',
}
