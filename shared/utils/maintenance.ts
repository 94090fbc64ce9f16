// When a planter's service is next due, by acres planted since the service or by a date.
export interface ServiceDueInput {
  servicedOn: string
  intervalAcres: number | null
  nextDueOn: string | null
  acresSinceService: number
  today: string
}

export type DueState = 'ok' | 'soon' | 'due'

// Due at 100 % of the acre interval or on the date; "soon" from 90 % or 14 days ahead (common practice, no source).
export function serviceDue(input: ServiceDueInput): { state: DueState, acresLeft: number | null, daysLeft: number | null } {
  // Judged to the thousandth of an acre (sums of field areas carry float noise), shown to the tenth:
  // 0.04 ac left is not yet due.
  const exactLeft = input.intervalAcres == null ? null : Math.round((input.intervalAcres - input.acresSinceService) * 1000) / 1000
  const acresLeft = exactLeft == null ? null : Math.round(exactLeft * 10) / 10 || 0
  const daysLeft = input.nextDueOn == null ? null : Math.round((Date.parse(input.nextDueOn) - Date.parse(input.today)) / 86_400_000)
  let state: DueState = 'ok'
  if ((exactLeft != null && exactLeft <= 0) || (daysLeft != null && daysLeft <= 0)) state = 'due'
  else if ((exactLeft != null && input.intervalAcres != null && exactLeft <= input.intervalAcres * 0.1) || (daysLeft != null && daysLeft <= 14)) state = 'soon'
  return { state, acresLeft, daysLeft }
}
