import type { SetupConfig } from '../types/setup'

export interface SetupChange { path: string, label: string, from: unknown, to: unknown }

const LABELS: Record<string, string> = {
  crop: 'Crop', targetSeedsPerAcre: 'Target population', rowSpacingIn: 'Row spacing (in)', speedMph: 'Planned speed (mph)',
  wheelCircumferenceIn: 'Rolling circumference (in)', slipPercent: 'Drive slip (%)', meterRatio: 'Meter ratio',
  driverTeeth: 'driver teeth', drivenTeeth: 'driven teeth', plateCode: 'seed plate', cellsPerPlate: 'cells', rows: 'rows',
  depthIn: 'depth (in)', downPressureLb: 'down pressure (lb)', pressWheel: 'press wheel', covering: 'covering', granular: 'granular applicator',
  granularDialSetting: 'granular dial', granularBandWidthIn: 'band width (in)', fertilizerSetting: 'fertilizer setting', planting: 'planting',
  opener: 'opener', gaugeWheels: 'gauge wheels', depthBand: 'depth band', furrower: 'furrower', pressWheelWidthIn: 'press wheel width (in)', seedPlateId: 'plate id',
}

function same(a: unknown, b: unknown) {
  return JSON.stringify(a) === JSON.stringify(b)
}

// Field-by-field differences between two setup configurations, in words a person reads.
export function diffSetupConfigs(from: SetupConfig, to: SetupConfig): SetupChange[] {
  const out: SetupChange[] = []
  for (const k of ['crop', 'targetSeedsPerAcre', 'rowSpacingIn', 'speedMph', 'wheelCircumferenceIn', 'slipPercent', 'meterRatio'] as const) {
    if (!same(from[k], to[k])) out.push({ path: k, label: LABELS[k]!, from: from[k], to: to[k] })
  }
  const sections = Math.max(from.sections.length, to.sections.length)
  for (let i = 0; i < sections; i++) {
    const a = from.sections[i]
    const b = to.sections[i]
    const name = b?.name ?? a?.name ?? `Section ${i + 1}`
    if (!a || !b) {
      out.push({ path: `sections.${i}`, label: `${name}`, from: a ? 'present' : 'absent', to: b ? 'present' : 'absent' })
      continue
    }
    for (const k of ['plateCode', 'cellsPerPlate', 'rows'] as const) if (!same(a[k], b[k])) out.push({ path: `sections.${i}.${k}`, label: `${name}: ${LABELS[k]}`, from: a[k], to: b[k] })
    const stages = Math.max(a.stages.length, b.stages.length)
    for (let j = 0; j < stages; j++) {
      for (const k of ['driverTeeth', 'drivenTeeth'] as const) {
        if (!same(a.stages[j]?.[k], b.stages[j]?.[k])) out.push({ path: `sections.${i}.stages.${j}.${k}`, label: `${name}: stage ${j + 1} ${LABELS[k]}`, from: a.stages[j]?.[k] ?? null, to: b.stages[j]?.[k] ?? null })
      }
    }
  }
  const byPos = (c: SetupConfig) => new Map(c.rowUnits.map((u) => [u.position, u]))
  const fa = byPos(from)
  const tb = byPos(to)
  for (const pos of [...new Set([...fa.keys(), ...tb.keys()])].sort((x, y) => x - y)) {
    const a = fa.get(pos)
    const b = tb.get(pos)
    if (!a || !b) {
      out.push({ path: `rowUnits.${pos}`, label: `Row ${pos}`, from: a ? 'present' : 'absent', to: b ? 'present' : 'absent' })
      continue
    }
    for (const k of Object.keys(b) as (keyof typeof b)[]) {
      if (k === 'position' || k === 'seedPlateId') continue
      if (!same(a[k], b[k])) out.push({ path: `rowUnits.${pos}.${k}`, label: `Row ${pos}: ${LABELS[k] ?? k}`, from: a[k], to: b[k] })
    }
  }
  return out
}
