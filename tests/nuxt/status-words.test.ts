import { beforeEach, describe, expect, it } from 'vitest'
import { mountSuspended, registerEndpoint } from '@nuxt/test-utils/runtime'
import BenchResults from '../../components/bench/Results.vue'
import DashboardSetupsPanel from '../../components/dashboard/SetupsPanel.vue'
import PlanterToolbar from '../../components/planter/Toolbar.vue'
import type { RowUnit } from '../../shared/types/equipment'
import { computeSetupResults } from '../../shared/utils/setup-results'
import { fourRowConfig, signInAs } from './signed-in'

const config = fourRowConfig

describe('rate badges say their state in words', () => {
  it('on the bench: on target, check, off target', async () => {
    const badge = async (target: number) => {
      const w = await mountSuspended(BenchResults, { props: { config: config(target), results: computeSetupResults(config(target)), metric: false } })
      return w.find('[data-testid="bench-error"]').text()
    }
    // 34,848 against 34,848 → 0 %; against 33,500 → +4.02 %; against 30,000 → +16.16 % (computed).
    expect(await badge(34_848)).toBe('0.00 % · on target')
    expect(await badge(33_500)).toBe('+4.02 % · check')
    expect(await badge(30_000)).toBe('+16.16 % · off target')
  })

  it('on the latest-setups panel', async () => {
    signInAs('agronomist')
    registerEndpoint('/api/setups', () => ({
      items: [
        { id: 1, name: 'Close', crop: 'corn', planterName: 'North', latestRevision: 1, updatedAt: '2027-05-01T12:00:00Z', seedsPerAcre: 34_033, errorPercent: 0.1 },
        { id: 2, name: 'Near', crop: 'corn', planterName: 'North', latestRevision: 1, updatedAt: '2027-05-01T12:00:00Z', seedsPerAcre: 35_400, errorPercent: -3.4 },
        { id: 3, name: 'Far', crop: 'soybeans', planterName: 'Creek', latestRevision: 2, updatedAt: '2027-05-01T12:00:00Z', seedsPerAcre: 120_000, errorPercent: -14.3 },
      ],
      nextAfter: null,
    }))
    const w = await mountSuspended(DashboardSetupsPanel)
    const badges = w.findAll('[data-testid="setup-rate-status"]')
    expect(badges.map((b) => b.text())).toEqual(['+0.1 % · on target', '-3.4 % · check', '-14.3 % · off target'])
    expect(badges.map((b) => b.classes().find((c) => c.startsWith('bg-')))).toEqual(['bg-emerald-50', 'bg-amber-50', 'bg-red-50'])
  })
})

describe('PlanterToolbar', () => {
  beforeEach(() => signInAs('foreman'))

  it('names each row unit\'s section, plate, granular box, depth and shut-off in its accessible name', async () => {
    const unit = (position: number, over: Partial<RowUnit> = {}) => ({
      id: position, planterId: 1, position, opener: 'double-disc', gaugeWheels: null, depthIn: 1.75, depthBand: null, downPressureLb: null, pressWheel: 'open-center',
      pressWheelWidthIn: null, covering: 'none', furrower: false, seedPlateId: null, granular: 'none', granularBandWidthIn: null, granularDialSetting: null,
      fertilizerSetting: null, planting: true, createdAt: new Date(), updatedAt: new Date(), ...over,
    }) as RowUnit
    const w = await mountSuspended(PlanterToolbar, {
      props: {
        units: [unit(1, { seedPlateId: 5, granular: 'insecticide' }), unit(2, { seedPlateId: 5, granular: 'both', depthIn: 2.25 }), unit(3, { planting: false })],
        sections: [{ name: 'Left wing', rows: [1, 2] }, { name: 'Right wing', rows: [3] }],
        plateCodes: { 5: 'C-30' },
      },
    })
    expect(w.findAll('[data-row-unit]').map((b) => b.attributes('aria-label'))).toEqual([
      'Row 1, Left wing, plate C-30, granular insecticide, depth 1.75 in',
      'Row 2, Left wing, plate C-30, granular insecticide and herbicide, depth 2.25 in',
      'Row 3, Right wing, no plate, no granular, depth 1.75 in, shut off',
    ])
  })
})
