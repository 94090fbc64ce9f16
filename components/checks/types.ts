// What the checks page knows about the setup and field a check is taken on.
export interface CheckContext {
  setupId: number | null
  setupRevision: number | null
  fieldId: number | null
  planId: number | null
  crop: string | null
  rowSpacingIn: number | null
  theoreticalIn: number | null
  targetSeedsPerAcre: number | null
  seedsPerAcre: number | null
  // Each drive section's rows and computed rate, so a count is compared with its own rows' sections.
  sections: { rows: number[], seedsPerAcre: number }[]
}
