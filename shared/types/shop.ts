import type { PickList } from '../utils/pick-list'
import type { SheetRow } from '../utils/sheet'
import type { SetupStage } from './setup'

export type PickListResponse = PickList & { setupId: number, revision: number, installedRevision: number | null, planterConfigVersion: number }

// What a setup sheet shows; the PDF, the print page and the e-mail are all made from it.
export interface SetupSheet {
  farmName: string
  setup: { id: number, name: string, crop: string, installedRevision: number | null }
  revision: { revision: number, latestRevision: number, savedAt: Date | string, note: string | null }
  planter: { id: number, name: string, rowCount: number, frameKind: string | null, configVersion: number | null }
  fields: { name: string, acres: number, season: number, status: string }[]
  figures: { targetSeedsPerAcre: number, seedsPerAcre: number, errorPercent: number, seedSpacingIn: number, rowSpacingIn: number, checkLengthFt: number, wheelCircumferenceIn: number, slipPercent: number }
  sections: { name: string, rows: number[], plateCode: string | null, stages: SetupStage[], seedsPerAcre: number | null }[]
  rows: SheetRow[]
  pickList: PickList & { planterConfigVersion: number }
  warnings: string[]
  chemicals: boolean
  chemicalCautions: string[]
  machineCautions: string[]
  url: string
  qrDataUrl: string
}
