// What a stored field check holds (JSON): the inputs as entered and the results computed from them.
import type { SolverChoice } from '../utils/solver'
import type { SpacingBin, SpacingQuality, StandCountSummary } from '../utils/field-checks'

export const CHECK_KINDS = ['seed-drop', 'stand-count', 'spacing'] as const
export type CheckKind = (typeof CHECK_KINDS)[number]

// The agronomist's word on a check; a new check waits for it.
export const REVIEW_STATUSES = ['awaiting-review', 'accepted', 'correction-needed', 'replant-considered'] as const
export type ReviewStatus = (typeof REVIEW_STATUSES)[number]
export const REVIEW_LABELS: Record<ReviewStatus, string> = {
  'awaiting-review': 'Awaiting review',
  'accepted': 'Accepted',
  'correction-needed': 'Correction needed',
  'replant-considered': 'Replant considered',
}
export const KIND_LABELS: Record<CheckKind, string> = {
  'seed-drop': 'Seed-drop check',
  'stand-count': 'Stand count',
  'spacing': 'Spacing uniformity',
}

export interface SeedDropRowResult { row: number, seedsCounted: number, lengthFt: number, seedsPerAcre: number }

export interface SeedDropResults {
  // length: seed dug or caught over a measured length; revolutions: over N turns of the drive wheel.
  basis: 'length' | 'revolutions'
  rows: SeedDropRowResult[]
  lengthFt: number
  rowSpacingIn: number
  // Mean of the rows checked.
  seedsPerAcre: number
  setupSeedsPerAcre: number
  errorVsSetupPercent: number
  targetSeedsPerAcre: number
  // Where the target came from: the crop plan, or the setup revision when no plan is given.
  targetFrom: 'plan' | 'setup'
  errorVsTargetPercent: number
  // Slip the setup assumed, and the slip this count implies for the drive (same formula, from the count).
  setupSlipPercent: number
  impliedSlipPercent: number | null
  // The implied slip can be stored on the planter only within 0–50 %.
  slipStorable: boolean
  fix: { solverTargetSeedsPerAcre: number, choices: SolverChoice[], message: string | null }
}

export interface StandCountResults extends StandCountSummary {
  lengthFt: number
  rowSpacingIn: number
  targetStand: number | null
  targetFrom: 'entered' | 'plan' | null
  errorVsTargetPercent: number | null
  seedsDroppedPerAcre: number | null
  seedsDroppedFrom: string | null
  // Plants ÷ seeds dropped × 100.
  survivalPercent: number | null
}

export interface SpacingResults extends SpacingQuality {
  theoreticalIn: number
  histogram: SpacingBin[]
  // Corn only: estimate from the spacing standard deviation (Nielsen 1991, as cited by UW Extension 2000).
  cornYieldLossBuPerAcre: number | null
}

export type CheckResults = SeedDropResults | StandCountResults | SpacingResults

// Who takes checks in the field, and who reviews them.
export const CHECK_TAKER_ROLES = ['owner', 'agronomist', 'operator'] as const
export const CHECK_REVIEWER_ROLES = ['owner', 'agronomist'] as const
