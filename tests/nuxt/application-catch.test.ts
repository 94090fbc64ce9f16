import { describe, expect, it } from 'vitest'
import { mountSuspended } from '@nuxt/test-utils/runtime'
import CatchResult from '../../components/application/CatchResult.vue'
import { fitCatchTest } from '../../shared/utils/application'

// Course 1/128 acre at 19 in (University of Georgia Extension, Sumner): rate = oz × 8.
const courseFt = 43_560 / 128 / (19 / 12)

describe('ApplicationCatchResult', () => {
  it('shows the setting for the target and no warning when the target lies within the catches', async () => {
    const fit = fitCatchTest({ points: [{ setting: 10, weightOz: 5 }, { setting: 20, weightOz: 10 }, { setting: 30, weightOz: 15 }], courseFt, rowSpacingIn: 19, targetLbPerAcre: 100 })
    const w = await mountSuspended(CatchResult, { props: { fit, targetLbPerAcre: 100, currentSetting: null } })
    expect(w.find('[data-testid="setting-for-target"]').text()).toBe('25.0')
    expect(w.find('[data-testid="catch-r2"]').text()).toBe('1.000')
    expect(w.find('[data-testid="catch-out-of-range"]').exists()).toBe(false)
    expect(w.findAll('tbody tr').map((tr) => tr.findAll('td')[1]!.text())).toEqual(['40.00', '80.00', '120.00'])
  })

  it('flags a target beyond the caught settings and a catch more than 10 % off the line (rule of thumb)', async () => {
    // Rates 40, 80, 120, 160, 200 and 144 at setting 30: the line is 4 + 4 × setting and only 144 is off it (computed by hand).
    const points = [10, 20, 30, 40, 50].map((s) => ({ setting: s, weightOz: s / 2 })).concat({ setting: 30, weightOz: 18 })
    const fit = fitCatchTest({ points, courseFt, rowSpacingIn: 19, targetLbPerAcre: 300 })
    const w = await mountSuspended(CatchResult, { props: { fit, targetLbPerAcre: 300, currentSetting: null } })
    expect(w.find('[data-testid="catch-out-of-range"]').text()).toContain('300.00 lb/ac lies outside the settings you caught')
    const flagged = w.findAll('tbody tr').filter((tr) => tr.text().includes('off the line')).map((tr) => tr.findAll('td')[1]!.text())
    expect(flagged).toEqual(['144.00'])
  })
})
