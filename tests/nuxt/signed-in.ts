import type { Role } from '../../shared/types/roles'
import type { SetupConfig } from '../../shared/types/setup'

// A signed-in member for component tests: the session the route guard reads and the account the pages read.
export function signInAs(role: Role, ids: { userId?: number, farmId?: number } = {}) {
  const userId = ids.userId ?? 3
  const farmId = ids.farmId ?? 1
  useState('nuxt-session').value = { user: { id: userId, email: `${role}@example.test`, name: `Test ${role}` } }
  useAccountStore().me = { user: { id: userId, email: `${role}@example.test`, name: `Test ${role}` }, farms: [{ id: farmId, name: 'Test Farm', role }], farmId, role, farmName: 'Test Farm' }
}

export const range = (from: number, to: number) => Array.from({ length: to - from + 1 }, (_, i) => from + i)

// A four-row setup: a 60 in wheel at 1:1 with 10 cells drops a seed every 6 in, 34,848 seeds/acre at 30 in (computed).
export const fourRowConfig = (targetSeedsPerAcre: number): SetupConfig => ({
  crop: 'corn', targetSeedsPerAcre, rowSpacingIn: 30, speedMph: null, wheelCircumferenceIn: 60, slipPercent: 0, meterRatio: 1,
  sections: [{ sectionId: null, name: 'Main drive', rows: range(1, 4), seedPlateId: null, plateCode: null, cellsPerPlate: 10, stages: [{ position: 1, driverTeeth: 20, drivenTeeth: 20 }] }],
  rowUnits: range(1, 4).map((position) => ({
    position, opener: 'double-disc', gaugeWheels: null, depthIn: 1.75, depthBand: null, downPressureLb: null, pressWheel: 'open-center', pressWheelWidthIn: null,
    covering: 'none', furrower: false, seedPlateId: null, granular: 'none', granularBandWidthIn: null, granularDialSetting: null, fertilizerSetting: null, planting: true,
  })),
})
