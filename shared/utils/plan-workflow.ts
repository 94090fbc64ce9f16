import type { Role } from '../types/roles'
import type { PlanStatus } from '../schemas/plans'

// Where a plan may go from each status. The server enforces these; pages use them to offer buttons.
export const PLAN_NEXT: Record<PlanStatus, PlanStatus[]> = {
  'draft': ['submitted'],
  'submitted': ['approved', 'changes-requested'],
  'changes-requested': ['submitted'],
  'approved': ['set-up', 'changes-requested'],
  'set-up': ['planted'],
  'planted': [],
}

// Who may move a plan into each status: the crew proposes and sets up, the agronomist or owner reviews.
export const PLAN_STATUS_ROLES: Record<PlanStatus, Role[]> = {
  'draft': [],
  'submitted': ['owner', 'operator', 'foreman'],
  'approved': ['agronomist', 'owner'],
  'changes-requested': ['agronomist', 'owner'],
  'set-up': ['owner', 'operator', 'foreman'],
  'planted': ['owner', 'operator', 'foreman'],
}

export function planActions(status: PlanStatus, role: Role | null | undefined): PlanStatus[] {
  if (!role) return []
  return PLAN_NEXT[status].filter((to) => PLAN_STATUS_ROLES[to].includes(role))
}
