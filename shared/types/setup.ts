// The configuration a setup revision stores (JSON), and the results computed from it.
export interface SetupStage { position: number, driverTeeth: number, drivenTeeth: number }

export interface SetupSection {
  sectionId: number | null
  name: string
  rows: number[]
  seedPlateId: number | null
  plateCode: string | null
  cellsPerPlate: number
  stages: SetupStage[]
}

export interface SetupRowUnit {
  position: number
  opener: 'runner' | 'double-disc'
  gaugeWheels: string | null
  depthIn: number
  depthBand: string | null
  downPressureLb: number | null
  pressWheel: 'open-center' | 'flat-tread' | 'center-rib' | 'dual-rib' | 'semi-pneumatic'
  pressWheelWidthIn: number | null
  covering: 'none' | 'knife' | 'disc'
  furrower: boolean
  seedPlateId: number | null
  granular: 'none' | 'insecticide' | 'herbicide' | 'both'
  granularBandWidthIn: number | null
  granularDialSetting: number | null
  fertilizerSetting: string | null
  planting: boolean
}

export interface SetupConfig {
  crop: string
  targetSeedsPerAcre: number
  rowSpacingIn: number
  speedMph: number | null
  wheelCircumferenceIn: number
  slipPercent: number
  meterRatio: number
  sections: SetupSection[]
  rowUnits: SetupRowUnit[]
}

export interface SetupSectionResult {
  sectionId: number | null
  plateRevsPerWheelRev: number
  seedsPerWheelRev: number
  seedSpacingIn: number
  seedsPerAcre: number
  seedsPerFoot: number
  errorPercent: number
  seedsPerSecond?: number
  plateRpm?: number
}

export interface SetupResults {
  sections: SetupSectionResult[]
  // Planting-row-weighted mean over the sections.
  seedsPerAcre: number
  seedSpacingIn: number
  errorPercent: number
  checkLengthFt: number
  warnings: string[]
}
