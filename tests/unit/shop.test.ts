import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { buildPickList, type InstalledState } from '../../shared/utils/pick-list'
import { serviceDue } from '../../shared/utils/maintenance'
import { sheetRows } from '../../shared/utils/sheet'
import type { SetupConfig, SetupRowUnit } from '../../shared/types/setup'

function unit(position: number, over: Partial<SetupRowUnit> = {}): SetupRowUnit {
  return {
    position, opener: 'double-disc', gaugeWheels: null, depthIn: 1.75, depthBand: null, downPressureLb: null, pressWheel: 'open-center',
    pressWheelWidthIn: null, covering: 'none', furrower: false, seedPlateId: 1, granular: 'none', granularBandWidthIn: null,
    granularDialSetting: null, fertilizerSetting: null, planting: true, ...over,
  }
}
const rows = [1, 2, 3, 4]
const installed: InstalledState = {
  sections: [{ sectionId: 10, name: 'Main drive', rows, stages: [{ position: 1, driverTeeth: 19, drivenTeeth: 23, chainPitch: '#40' }, { position: 2, driverTeeth: 17, drivenTeeth: 26, chainPitch: '#40' }] }],
  rowUnits: rows.map((p) => unit(p)),
}
function target(over: Partial<SetupConfig> = {}): SetupConfig {
  return {
    crop: 'soybeans', targetSeedsPerAcre: 140_000, rowSpacingIn: 30, speedMph: 5, wheelCircumferenceIn: 86.4, slipPercent: 0, meterRatio: 1,
    sections: [{ sectionId: 10, name: 'Main drive', rows, seedPlateId: 2, plateCode: 'S48', cellsPerPlate: 48, stages: [{ position: 1, driverTeeth: 17, drivenTeeth: 23 }, { position: 2, driverTeeth: 17, drivenTeeth: 26 }] }],
    rowUnits: rows.map((p) => unit(p, { seedPlateId: 2 })),
    ...over,
  }
}
const plates = [{ id: 1, code: 'C30', quantityOnHand: 0 }, { id: 2, code: 'S48', quantityOnHand: 3 }]
const sprockets = [{ id: 7, teeth: 17, chainPitch: '#40', quantityOnHand: 1 }, { id: 8, teeth: 19, chainPitch: '#40', quantityOnHand: 0 }]

// Hand-made scenario (invented): four rows move from plate C30 to S48 with three S48 on the shelf.
describe('buildPickList', () => {
  it('counts plates pulled and put back and flags the one short', () => {
    const list = buildPickList(installed, target(), plates, sprockets)
    const s48 = list.plates.find((l) => l.label === 'S48')!
    expect(s48).toMatchObject({ pull: 4, putBack: 0, onHand: 3, after: -1, short: 1 })
    expect(list.plates.find((l) => l.label === 'C30')).toMatchObject({ pull: 0, putBack: 4, onHand: 0, after: 4, short: 0 })
    expect(list.shortCount).toBe(1)
  })

  it('swaps the one stage sprocket that changes and leaves equal stages alone', () => {
    const list = buildPickList(installed, target(), plates, sprockets)
    expect(list.sprockets.map((l) => [l.label, l.pull, l.putBack, l.after])).toEqual([['17 teeth #40', 1, 0, 0], ['19 teeth #40', 0, 1, 1]])
    expect(list.sprockets[0]!.where).toEqual(['Main drive, stage 1 driver'])
  })

  it('lists press wheel changes as parts and depth as a setting, grouped by rows', () => {
    const t = target({ rowUnits: rows.map((p) => unit(p, { seedPlateId: 2, pressWheel: p <= 2 ? 'dual-rib' : 'open-center', depthIn: 1.25 })) })
    const list = buildPickList(installed, t, plates, sprockets)
    expect(list.parts).toEqual([{ part: 'Press wheel', from: 'open-center', to: 'dual-rib', rows: [1, 2] }])
    expect(list.adjustments).toEqual([{ part: 'Depth', from: '1.75 in', to: '1.25 in', rows: [1, 2, 3, 4] }])
  })

  it('says nothing moves when the planter already carries the setup', () => {
    const same = target({ sections: [{ ...target().sections[0]!, seedPlateId: 1, stages: [{ position: 1, driverTeeth: 19, drivenTeeth: 23 }, { position: 2, driverTeeth: 17, drivenTeeth: 26 }] }], rowUnits: installed.rowUnits })
    expect(buildPickList(installed, same, plates, sprockets).unchanged).toBe(true)
  })

  it('refuses a section the planter does not have', () => {
    const list = buildPickList(installed, target({ sections: [{ ...target().sections[0]!, sectionId: 99, name: 'Split bar' }] }), plates, sprockets)
    expect(list.blockers[0]).toMatch(/Split bar/)
  })

  it('keeps the shelf balance: after = on hand − pulled + put back, for any change of plates', () => {
    fc.assert(fc.property(fc.array(fc.constantFrom(1, 2, null), { minLength: 4, maxLength: 4 }), (ids) => {
      const t = target({ sections: [{ ...target().sections[0]!, seedPlateId: null }], rowUnits: rows.map((p, i) => unit(p, { seedPlateId: ids[i]! })) })
      const list = buildPickList(installed, t, plates, sprockets)
      for (const l of list.plates) expect(l.after).toBe(l.onHand - l.pull + l.putBack)
      const pulled = list.plates.reduce((n, l) => n + l.pull, 0)
      expect(pulled).toBe(ids.filter((x) => x !== null && x !== 1).length)
    }))
  })
})

// The 90 % / 14-day "soon" thresholds are Rowbench's choice (common practice, no source).
describe('serviceDue', () => {
  const base = { servicedOn: '2026-01-01', intervalAcres: 400, nextDueOn: null, today: '2026-05-01' }
  it('is due at the acre interval, soon within the last tenth, ok before', () => {
    expect(serviceDue({ ...base, acresSinceService: 400 })).toEqual({ state: 'due', acresLeft: 0, daysLeft: null })
    expect(serviceDue({ ...base, acresSinceService: 365 })).toMatchObject({ state: 'soon', acresLeft: 35 })
    expect(serviceDue({ ...base, acresSinceService: 100 })).toMatchObject({ state: 'ok', acresLeft: 300 })
  })
  it('judges acres before rounding them for display: 0.04 ac left is not due yet, float noise on the line is', () => {
    expect(serviceDue({ ...base, acresSinceService: 399.96 })).toMatchObject({ state: 'soon', acresLeft: 0 })
    // 0.1 + 0.2 + 399.7 is 400.00000000000006 in floating point: the interval is reached.
    expect(serviceDue({ ...base, acresSinceService: 0.1 + 0.2 + 399.7 })).toMatchObject({ state: 'due', acresLeft: 0 })
    expect(serviceDue({ ...base, acresSinceService: 400.04 })).toMatchObject({ state: 'due', acresLeft: 0 })
  })
  it('is due on the date and soon within 14 days of it', () => {
    expect(serviceDue({ ...base, intervalAcres: null, nextDueOn: '2026-05-01', acresSinceService: 0 })).toMatchObject({ state: 'due', daysLeft: 0 })
    expect(serviceDue({ ...base, intervalAcres: null, nextDueOn: '2026-05-11', acresSinceService: 0 })).toMatchObject({ state: 'soon', daysLeft: 10 })
    expect(serviceDue({ ...base, intervalAcres: null, nextDueOn: '2026-07-01', acresSinceService: 0 })).toMatchObject({ state: 'ok', daysLeft: 61 })
  })
})

describe('sheetRows', () => {
  it('words each row for print from its section and unit', () => {
    const r = sheetRows(target({ rowUnits: [unit(1, { granular: 'insecticide', granularDialSetting: 18, granularBandWidthIn: 7, downPressureLb: 150, fertilizerSetting: '2x2 at 6 gal/acre' })] }))
    expect(r[0]).toMatchObject({ row: 1, plate: 'S48', sprockets: '17/23 · 17/26', depth: '1.75 in', downPressure: '150 lb', granular: 'insecticide · dial 18 · 7 in band', fertilizer: '2x2 at 6 gal/acre' })
  })
})
