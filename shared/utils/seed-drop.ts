import Decimal from 'decimal.js'
import { seedCheckRate } from './field-checks'
import { impliedSlipPercent } from './meter'

export interface SeedDropInput {
  rows: { row: number, seedsCounted: number }[]
  // Either a measured length of row, or turns of the drive wheel.
  lengthFt?: number
  wheelRevolutions?: number
  rowSpacingIn: number
  wheelCircumferenceIn: number
  // The setup revision's computed rate and the slip it assumed.
  setupSeedsPerAcre: number
  setupSlipPercent: number
  targetSeedsPerAcre: number
  // The slip stored on the planter now, which the solver computes with.
  planterSlipPercent: number
}

export interface SeedDropSummary {
  basis: 'length' | 'revolutions'
  rows: { row: number, seedsCounted: number, lengthFt: number, seedsPerAcre: number }[]
  lengthFt: number
  seedsPerAcre: number
  errorVsSetupPercent: number
  errorVsTargetPercent: number
  impliedSlipPercent: number | null
  slipStorable: boolean
  // 0 when nothing was counted.
  solverTargetSeedsPerAcre: number
}

// Each row as seedCheckRate; the planter is their mean. Over N wheel turns the length is N rolling
// circumferences and the count gives the rate at 0 % slip, so the seed on the ground is that rate ×
// (1 − setup slip) and no slip can be read from it. Over a measured length the implied slip is
// (1 − counted ÷ setup rate at 0 % slip) × 100 (the meter formula). The solver, which reckons with
// the planter's slip, is asked for target × (1 − planter slip) ÷ ((1 − setup slip) × found ÷ setup rate),
// the setting whose seed on the ground lands on the target.
export function seedDropSummary(input: SeedDropInput): SeedDropSummary {
  if (!input.rows.length) throw new RangeError('Count at least one row')
  const byTurns = input.wheelRevolutions !== undefined
  const lengthFt = byTurns ? new Decimal(input.wheelRevolutions!).mul(input.wheelCircumferenceIn).div(12).toNumber() : input.lengthFt!
  const rows = input.rows.map((r) => ({ ...r, lengthFt, seedsPerAcre: seedCheckRate({ seedsCounted: r.seedsCounted, lengthFt, rowSpacingIn: input.rowSpacingIn }).seedsPerAcre }))
  const counted = Decimal.sum(...rows.map((r) => r.seedsPerAcre)).div(rows.length)
  const keep = (slip: number) => new Decimal(1).minus(new Decimal(slip).div(100))
  const onGround = byTurns ? counted.mul(keep(input.setupSlipPercent)) : counted
  const setup = new Decimal(input.setupSeedsPerAcre)
  const implied = !byTurns && setup.gt(0)
    ? impliedSlipPercent({ expectedSeedsPerAcre: setup.div(keep(input.setupSlipPercent)).toNumber(), countedSeedsPerAcre: counted.toNumber() })
    : null
  const found = setup.gt(0) ? onGround.div(setup) : new Decimal(0)
  // Judged at the 0.01 % the planter stores, so a count that matches the setup exactly is a slip of 0,
  // not a floating-point hair below it (-0 becomes 0).
  const storedSlip = implied === null ? null : new Decimal(implied).toDecimalPlaces(2).toNumber() || 0
  return {
    basis: byTurns ? 'revolutions' : 'length',
    rows, lengthFt,
    seedsPerAcre: counted.toNumber(),
    errorVsSetupPercent: setup.gt(0) ? found.minus(1).mul(100).toNumber() : 0,
    errorVsTargetPercent: onGround.div(input.targetSeedsPerAcre).minus(1).mul(100).toNumber(),
    impliedSlipPercent: implied,
    slipStorable: storedSlip !== null && storedSlip >= 0 && storedSlip <= 50,
    solverTargetSeedsPerAcre: found.isZero() ? 0 : new Decimal(input.targetSeedsPerAcre).mul(keep(input.planterSlipPercent)).div(keep(input.setupSlipPercent).mul(found)).toNumber(),
  }
}

// Seed on the ground from a stored seed-drop check: a count over a measured length already is;
// one over wheel turns measured the drive at 0 % slip, so it is × (1 − setup slip ÷ 100).
export function seedsOnGroundPerAcre(check: { basis: 'length' | 'revolutions', seedsPerAcre: number, setupSlipPercent: number }): number {
  if (check.basis !== 'revolutions') return check.seedsPerAcre
  return new Decimal(check.seedsPerAcre).mul(new Decimal(1).minus(new Decimal(check.setupSlipPercent).div(100))).toNumber()
}
