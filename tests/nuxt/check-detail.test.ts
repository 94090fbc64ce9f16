import { beforeEach, describe, expect, it } from 'vitest'
import { mountSuspended, registerEndpoint } from '@nuxt/test-utils/runtime'
import CheckPage from '../../pages/checks/[id].vue'
import { standCountSummary } from '../../shared/utils/field-checks'
import { signInAs } from './signed-in'

// Two counts of 31 and 33 plants over 1/1000 acre at 30 in (17.424 ft): 31,000 and 33,000 per acre.
const inputs = { kind: 'stand-count', counts: [31, 33], lengthFt: 17.424, rowSpacingIn: 30 }
const summary = standCountSummary({ counts: inputs.counts, lengthFt: inputs.lengthFt, rowSpacingIn: inputs.rowSpacingIn })
registerEndpoint('/api/checks/5', () => ({
  id: 5, kind: 'stand-count', setupId: null, setupName: null, setupRevision: null, fieldName: 'Test field', rows: [], checkedOn: '2027-05-20',
  authorName: 'Test operator', note: null, reviewStatus: 'awaiting-review', reviewComment: null, reviewerName: null, reviewedAt: null,
  photoUploadIds: [], csvUploadId: null, slipAppliedPercent: null, authorId: 99, planterName: null, planterConfigVersion: null, inputs,
  results: { ...summary, lengthFt: 17.424, rowSpacingIn: 30, targetStand: null, targetFrom: null, errorVsTargetPercent: null, seedsDroppedPerAcre: null, seedsDroppedFrom: null, survivalPercent: null },
}))

describe('Stand count page', () => {
  beforeEach(() => signInAs('operator'))

  it('lists the plants counted under "Counts over … ft", and each count per acre under its own heading', async () => {
    const wrapper = await mountSuspended(CheckPage, { route: '/checks/5' })
    const tile = (testid: string) => {
      const dd = wrapper.find(`[data-testid="${testid}"]`)
      return [dd.element.previousElementSibling!.textContent, dd.text()]
    }
    expect(tile('stand-raw-counts')).toEqual(['Counts over 17.42 ft', '31, 33'])
    expect(tile('stand-counts-per-acre')).toEqual(['Each count as plants per acre', '31,000, 33,000'])
    expect(wrapper.find('[data-testid="stand-result"]').text()).toContain('32,000 /ac')
  })
})
