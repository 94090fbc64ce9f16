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
  const acresLeft = input.intervalAcres == null ? null : Math.round((input.intervalAcres - input.acresSinceService) * 10) / 10
  const daysLeft = input.nextDueOn == null ? null : Math.round((Date.parse(input.nextDueOn) - Date.parse(input.today)) / 86_400_000)
  let state: DueState = 'ok'
  if ((acresLeft != null && acresLeft <= 0) || (daysLeft != null && daysLeft <= 0)) state = 'due'
  else if ((acresLeft != null && input.intervalAcres != null && acresLeft <= input.intervalAcres * 0.1) || (daysLeft != null && daysLeft <= 14)) state = 'soon'
  return { state, acresLeft, daysLeft }
}
