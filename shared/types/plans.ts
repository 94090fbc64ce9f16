import type { PlanStatus } from '../schemas/plans'
import type { PlanCapacity, PlanHopper, PlanLot, PlanSeed } from '../utils/season'
import type { SolverChoice } from '../utils/solver'

// A plan as GET /api/plans lists it.
export interface PlanItem {
  id: number
  season: number
  status: PlanStatus
  fieldId: number
  fieldName: string
  fieldAcres: number
  crop: string
  seedLotId: number | null
  lot: PlanLot | null
  targetStand: number
  survivalPercent: number
  marginPercent: number
  rowSpacingIn: number
  speedMph: number
  sortOrder: number
  windowStart: string | null
  windowEnd: string | null
  notes: string | null
  planterId: number | null
  planterName: string | null
  setupId: number | null
  setupName: string | null
  setupLatestRevision: number | null
  proposedBy: number | null
  proposerName: string | null
  approvedBy: number | null
  approverName: string | null
  approvedRevision: number | null
  approvedAt: string | null
  plantedOn: string | null
  plantedAcres: number | null
  createdAt: string
  updatedAt: string
  setupChangedSinceApproval: boolean
  seed: PlanSeed
}

export interface PlanEvent { id: number, fromStatus: PlanStatus | null, toStatus: PlanStatus, userName: string | null, comment: string | null, setupRevision: number | null, createdAt: string }

// A plan as GET /api/plans/:id shows it.
export interface PlanDetail extends PlanItem {
  hopper: PlanHopper | null
  capacity: PlanCapacity | null
  setupRevisions: { revision: number, savedAt: string, note: string | null, savedByName: string | null, seedsPerAcre: number, errorPercent: number }[]
  events: PlanEvent[]
  recommendation: { choices: SolverChoice[], message: string | null } | null
}
