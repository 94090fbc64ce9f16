import Decimal from 'decimal.js'
import type { SetupConfig, SetupResults, SetupSectionResult } from '../types/setup'
import { computeMeter, rowLengthForFraction } from './meter'

// Results of a whole setup: the meter formula per drive section, and the planter's population as
// the mean over the planting rows (each row weighs the same). The page previews with this and the
// server stores what it returns. It warns beyond 5 % from the target: a rule of thumb (common
// practice, no source).
export function computeSetupResults(config: SetupConfig, plateRpmLimit?: number): SetupResults {
  const warnings: string[] = []
  const planting = new Set(config.rowUnits.filter((u) => u.planting).map((u) => u.position))
  const sections: SetupSectionResult[] = config.sections.map((s) => {
    const m = computeMeter({
      wheelCircumferenceIn: config.wheelCircumferenceIn,
      slipPercent: config.slipPercent,
      stages: s.stages,
      meterRatio: config.meterRatio,
      cellsPerPlate: s.cellsPerPlate,
      rowSpacingIn: config.rowSpacingIn,
      speedMph: config.speedMph ?? undefined,
      plateRpmLimit,
    })
    if (m.plateRpmWarning) warnings.push(`${s.name}: ${m.plateRpmWarning}`)
    return {
      sectionId: s.sectionId,
      plateRevsPerWheelRev: m.plateRevsPerWheelRev,
      seedsPerWheelRev: m.seedsPerWheelRev,
      seedSpacingIn: m.seedSpacingIn,
      seedsPerAcre: m.seedsPerAcre,
      seedsPerFoot: m.seedsPerFoot,
      errorPercent: new Decimal(m.seedsPerAcre).div(config.targetSeedsPerAcre).minus(1).mul(100).toNumber(),
      seedsPerSecond: m.seedsPerSecond,
      plateRpm: m.plateRpm,
    }
  })
  let rows = new Decimal(0)
  let seeds = new Decimal(0)
  config.sections.forEach((s, i) => {
    const n = s.rows.filter((r) => planting.size === 0 || planting.has(r)).length
    rows = rows.plus(n)
    seeds = seeds.plus(new Decimal(sections[i]!.seedsPerAcre).mul(n))
  })
  const seedsPerAcre = rows.gt(0) ? seeds.div(rows) : new Decimal(sections[0]?.seedsPerAcre ?? 0)
  const seedSpacingIn = seedsPerAcre.gt(0) ? new Decimal(6_272_640).div(seedsPerAcre.mul(config.rowSpacingIn)) : new Decimal(0)
  const errorPercent = seedsPerAcre.div(config.targetSeedsPerAcre).minus(1).mul(100)
  if (errorPercent.abs().gt(5)) warnings.push(`The computed population is ${errorPercent.toFixed(1)} % from the target.`)
  // With every listed row shut off the figure above is what the rows would drop if turned on.
  if (config.rowUnits.length && planting.size === 0) warnings.push('No row is set to plant; the population is what the drive sections would drop with their rows turned on.')
  const unassigned = config.rowUnits.filter((u) => u.planting && !config.sections.some((s) => s.rows.includes(u.position)))
  if (unassigned.length) warnings.push(`Rows ${unassigned.map((u) => u.position).join(', ')} plant but belong to no drive section.`)
  return {
    sections,
    seedsPerAcre: seedsPerAcre.toNumber(),
    seedSpacingIn: seedSpacingIn.toNumber(),
    errorPercent: errorPercent.toNumber(),
    checkLengthFt: rowLengthForFraction({ rowSpacingIn: config.rowSpacingIn }).lengthFt,
    warnings,
  }
}

// The rate a check on some rows should find: the mean of those rows' sections (results.sections is
// in config.sections' order); a row in no section counts at the planter's mean.
export function seedsPerAcreOnRows(config: { sections: { rows: number[] }[] }, results: { sections: { seedsPerAcre: number }[], seedsPerAcre: number }, rows: number[]): number {
  if (!rows.length) return results.seedsPerAcre
  const rateOf = (row: number) => {
    const i = config.sections.findIndex((sec) => sec.rows.includes(row))
    return i >= 0 && results.sections[i] ? results.sections[i]!.seedsPerAcre : results.seedsPerAcre
  }
  return Decimal.sum(...rows.map(rateOf)).div(rows.length).toNumber()
}
