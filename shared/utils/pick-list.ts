import type { SetupConfig, SetupRowUnit } from '../types/setup'

// What the planter carries now: its sections with stages (and chain pitch) and its row units.
export interface InstalledState {
  sections: { sectionId: number, name: string, rows: number[], stages: { position: number, driverTeeth: number, drivenTeeth: number, chainPitch: string }[] }[]
  rowUnits: SetupRowUnit[]
}
export interface StockPlate { id: number, code: string, quantityOnHand: number }
export interface StockSprocket { id: number, teeth: number, chainPitch: string, quantityOnHand: number }

export interface PickLine {
  kind: 'plate' | 'sprocket'
  key: string
  label: string
  inventoryId: number | null
  // Taken from the shelf, put back on it, on the shelf now and after the swap.
  pull: number
  putBack: number
  onHand: number
  after: number
  short: number
  where: string[]
}
export interface PartChange { part: string, from: string, to: string, rows: number[] }
export interface PickList { plates: PickLine[], sprockets: PickLine[], parts: PartChange[], adjustments: PartChange[], shortCount: number, blockers: string[], unchanged: boolean }

const show = (v: unknown) => v == null || v === '' ? 'none' : String(v)

// Net shelf change per part: after = on hand − pulled + put back; short when after would go below 0.
function tally(kind: PickLine['kind'], lines: Map<string, PickLine>, key: string, label: string, stockId: number | null, onHand: number, delta: 'pull' | 'putBack', where: string) {
  let line = lines.get(key)
  if (!line) {
    line = { kind, key, label, inventoryId: stockId, pull: 0, putBack: 0, onHand, after: onHand, short: 0, where: [] }
    lines.set(key, line)
  }
  line[delta]++
  if (delta === 'pull' && !line.where.includes(where)) line.where.push(where)
  line.after = line.onHand - line.pull + line.putBack
  line.short = Math.max(0, -line.after)
}

// The row's plate in a setup: its section's plate when the section names one, else the row's own.
function targetPlate(config: SetupConfig, u: SetupRowUnit) {
  const section = config.sections.find((s) => s.rows.includes(u.position))
  return section?.seedPlateId ?? u.seedPlateId
}

export function buildPickList(installed: InstalledState, target: SetupConfig, plates: StockPlate[], sprockets: StockSprocket[]): PickList {
  const blockers: string[] = []
  const plateLines = new Map<string, PickLine>()
  const sprocketLines = new Map<string, PickLine>()
  const plateById = new Map(plates.map((p) => [p.id, p]))

  for (const u of target.rowUnits) {
    const now = installed.rowUnits.find((r) => r.position === u.position)
    if (!now) { blockers.push(`Row ${u.position} is not on the planter`); continue }
    const want = targetPlate(target, u)
    if (want === now.seedPlateId) continue
    if (want != null) {
      const p = plateById.get(want)
      tally('plate', plateLines, `plate:${want}`, p?.code ?? `plate #${want}`, p?.id ?? null, p?.quantityOnHand ?? 0, 'pull', `row ${u.position}`)
    }
    if (now.seedPlateId != null) {
      const p = plateById.get(now.seedPlateId)
      tally('plate', plateLines, `plate:${now.seedPlateId}`, p?.code ?? `plate #${now.seedPlateId}`, p?.id ?? null, p?.quantityOnHand ?? 0, 'putBack', `row ${u.position}`)
    }
  }

  const sprocketKey = (teeth: number, pitch: string) => `sprocket:${teeth}:${pitch}`
  const swap = (teeth: number, pitch: string, delta: 'pull' | 'putBack', where: string) => {
    const s = sprockets.find((x) => x.teeth === teeth && x.chainPitch === pitch)
    tally('sprocket', sprocketLines, sprocketKey(teeth, pitch), `${teeth} teeth ${pitch}`, s?.id ?? null, s?.quantityOnHand ?? 0, delta, where)
  }
  for (const ts of target.sections) {
    const now = installed.sections.find((s) => s.sectionId === ts.sectionId)
    if (!now) { blockers.push(`Drive section "${ts.name}" is not on the planter; add it under Equipment first`); continue }
    const positions = new Set([...ts.stages.map((s) => s.position), ...now.stages.map((s) => s.position)])
    for (const pos of [...positions].sort((a, b) => a - b)) {
      const a = now.stages.find((s) => s.position === pos)
      const b = ts.stages.find((s) => s.position === pos)
      const pitch = a?.chainPitch ?? now.stages[0]?.chainPitch ?? '#40'
      const where = `${ts.name}, stage ${pos}`
      for (const side of ['driverTeeth', 'drivenTeeth'] as const) {
        if (a?.[side] === b?.[side]) continue
        if (b) swap(b[side], pitch, 'pull', `${where} ${side === 'driverTeeth' ? 'driver' : 'driven'}`)
        if (a) swap(a[side], pitch, 'putBack', `${where} ${side === 'driverTeeth' ? 'driver' : 'driven'}`)
      }
    }
  }

  // Parts without stock counts, and settings that change with a tool rather than a part.
  const group = (list: PartChange[], part: string, from: string, to: string, row: number) => {
    const hit = list.find((c) => c.part === part && c.from === from && c.to === to)
    if (hit) hit.rows.push(row)
    else list.push({ part, from, to, rows: [row] })
  }
  const parts: PartChange[] = []
  const adjustments: PartChange[] = []
  for (const u of target.rowUnits) {
    const now = installed.rowUnits.find((r) => r.position === u.position)
    if (!now) continue
    const pw = (x: SetupRowUnit) => `${x.pressWheel}${x.pressWheelWidthIn ? ` ${x.pressWheelWidthIn} in` : ''}`
    if (pw(now) !== pw(u)) group(parts, 'Press wheel', pw(now), pw(u), u.position)
    if (now.covering !== u.covering) group(parts, 'Coverers', now.covering, u.covering, u.position)
    if (now.furrower !== u.furrower) group(parts, 'Furrower', now.furrower ? 'fitted' : 'none', u.furrower ? 'fitted' : 'none', u.position)
    if (now.opener !== u.opener) group(parts, 'Opener', now.opener, u.opener, u.position)
    if (show(now.gaugeWheels) !== show(u.gaugeWheels)) group(parts, 'Gauge wheels', show(now.gaugeWheels), show(u.gaugeWheels), u.position)
    if (show(now.depthBand) !== show(u.depthBand)) group(parts, 'Depth band', show(now.depthBand), show(u.depthBand), u.position)
    if ((now.downPressureLb == null) !== (u.downPressureLb == null)) group(parts, 'Down-pressure springs', now.downPressureLb == null ? 'none' : 'fitted', u.downPressureLb == null ? 'none' : 'fitted', u.position)
    else if (now.downPressureLb !== u.downPressureLb) group(adjustments, 'Down pressure', `${now.downPressureLb} lb`, `${u.downPressureLb} lb`, u.position)
    if (now.depthIn !== u.depthIn) group(adjustments, 'Depth', `${now.depthIn} in`, `${u.depthIn} in`, u.position)
    if (now.granular !== u.granular) group(adjustments, 'Granular applicator', now.granular, u.granular, u.position)
    if (show(now.granularDialSetting) !== show(u.granularDialSetting)) group(adjustments, 'Granular dial', show(now.granularDialSetting), show(u.granularDialSetting), u.position)
    if (show(now.granularBandWidthIn) !== show(u.granularBandWidthIn)) group(adjustments, 'Granular band width', show(now.granularBandWidthIn), show(u.granularBandWidthIn), u.position)
    if (show(now.fertilizerSetting) !== show(u.fertilizerSetting)) group(adjustments, 'Fertilizer', show(now.fertilizerSetting), show(u.fertilizerSetting), u.position)
    if (now.planting !== u.planting) group(adjustments, 'Row planting', now.planting ? 'on' : 'off', u.planting ? 'on' : 'off', u.position)
  }

  const platesOut = [...plateLines.values()].sort((a, b) => a.label.localeCompare(b.label))
  const sprocketsOut = [...sprocketLines.values()].sort((a, b) => a.label.localeCompare(b.label, undefined, { numeric: true }))
  const shortCount = [...platesOut, ...sprocketsOut].filter((l) => l.short > 0).length
  return {
    plates: platesOut, sprockets: sprocketsOut, parts, adjustments, shortCount, blockers,
    unchanged: !platesOut.length && !sprocketsOut.length && !parts.length && !adjustments.length && !blockers.length,
  }
}
