import type { SetupConfig } from '../types/setup'

// One line of a setup sheet's row table, already worded for print.
export interface SheetRow {
  row: number
  planting: boolean
  plate: string
  sprockets: string
  depth: string
  pressWheel: string
  downPressure: string
  gaugeWheels: string
  covering: string
  granular: string
  fertilizer: string
}

export const SHEET_COLUMNS: { key: keyof SheetRow, label: string }[] = [
  { key: 'row', label: 'Row' },
  { key: 'plate', label: 'Plate' },
  { key: 'sprockets', label: 'Sprockets (driver/driven by stage)' },
  { key: 'depth', label: 'Depth · band' },
  { key: 'pressWheel', label: 'Press wheel' },
  { key: 'downPressure', label: 'Down pressure' },
  { key: 'gaugeWheels', label: 'Gauge wheels' },
  { key: 'covering', label: 'Covering' },
  { key: 'granular', label: 'Granular · dial' },
  { key: 'fertilizer', label: 'Fertilizer' },
]

export function sheetRows(config: SetupConfig, plateCodes: Map<number, string> = new Map()): SheetRow[] {
  return config.rowUnits.map((u) => {
    const section = config.sections.find((s) => s.rows.includes(u.position))
    const plateId = section?.seedPlateId ?? u.seedPlateId
    const plate = section?.plateCode ?? (plateId != null ? plateCodes.get(plateId) ?? `#${plateId}` : null)
    return {
      row: u.position,
      planting: u.planting,
      plate: u.planting ? plate ?? '—' : 'off',
      sprockets: section ? section.stages.map((s) => `${s.driverTeeth}/${s.drivenTeeth}`).join(' · ') : '—',
      depth: `${u.depthIn} in${u.depthBand ? ` · ${u.depthBand}` : ''}`,
      pressWheel: `${u.pressWheel}${u.pressWheelWidthIn ? ` ${u.pressWheelWidthIn} in` : ''}`,
      downPressure: u.downPressureLb == null ? 'none' : `${u.downPressureLb} lb`,
      gaugeWheels: u.gaugeWheels ?? '—',
      covering: `${u.covering}${u.furrower ? ' + furrower' : ''}`,
      granular: u.granular === 'none' ? '—' : `${u.granular} · dial ${u.granularDialSetting ?? '?'} · ${u.granularBandWidthIn ?? '?'} in band`,
      fertilizer: u.fertilizerSetting ?? '—',
    }
  })
}

// The caution block printed on every sheet, in Rowbench's own words.
export const CHEMICAL_CAUTIONS = [
  'Read the product label before you fill, calibrate or clean a granular or fertilizer meter; the label is the law and governs over this sheet.',
  'Wear the protective equipment the label lists, and keep treated seed and granules away from children, livestock and feed.',
  'Restricted-use products are handled only by a certified applicator and recorded as local rules require.',
  'Clean out meters over a catch pan, never by hand; return leftover product to its container or dispose of it as the label says.',
]
export const MACHINE_CAUTIONS = [
  'Shut the tractor off and take the key before working on the drive, meters or row units; lower the planter or set its lift locks.',
  'Keep hands away from chains and sprockets, never turn the drive with fingers near a chain, and refit every guard.',
  'Keep people clear of folding wings and markers; hydraulic lines stay under pressure after the engine stops.',
]
