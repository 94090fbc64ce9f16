import { fillPlan } from './planning'

export interface FillContainer { name: string, kind: string, capacity: number, ratePerAcre: number }
export interface FillField { name: string, acres: number }

// Each hopper or tank against each field with fillPlan (acres per fill = capacity ÷ rate, starting
// full); the planter stops to refill whenever any one runs out, so a field needs at least the
// largest of its containers' refill stops.
export function planFills(input: { containers: FillContainer[], fields: FillField[] }) {
  const containers = input.containers.map((c) => ({ ...c, acresPerFill: fillPlan({ capacity: c.capacity, ratePerAcre: c.ratePerAcre, fieldAcres: 1 }).acresPerFill }))
  return {
    containers,
    fields: input.fields.map((f) => {
      const byContainer = input.containers.map((c) => ({ name: c.name, ...fillPlan({ capacity: c.capacity, ratePerAcre: c.ratePerAcre, fieldAcres: f.acres }) }))
      return { name: f.name, acres: f.acres, containers: byContainer, mostRefillStops: Math.max(0, ...byContainer.map((c) => c.refillStops)) }
    }),
  }
}
