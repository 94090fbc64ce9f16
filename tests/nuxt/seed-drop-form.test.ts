import { describe, expect, it } from 'vitest'
import { mountSuspended } from '@nuxt/test-utils/runtime'
import ChecksSeedDropForm from '../../components/checks/SeedDropForm.vue'
import { signInAs } from './signed-in'

// Two sections at different rates; 1/1000 acre of 30 in row is 17.424 ft, so seeds counted × 1,000
// is seeds per acre (University of Tennessee Extension 2011; figures computed).
const context = {
  setupId: 1, setupRevision: 2, fieldId: null, planId: null, crop: 'corn', rowSpacingIn: 30, theoreticalIn: 6, targetSeedsPerAcre: 34_000,
  seedsPerAcre: 34_000, sections: [{ rows: [1, 2], seedsPerAcre: 32_000 }, { rows: [3, 4], seedsPerAcre: 36_000 }],
}

describe('ChecksSeedDropForm', () => {
  it('previews a count against its own row\'s section, as the server stores it, not the planter mean', async () => {
    signInAs('operator')
    const wrapper = await mountSuspended(ChecksSeedDropForm, { props: { context } })
    const seeds = wrapper.findAll('input').find((i) => i.attributes('id') && wrapper.find(`label[for="${i.attributes('id')}"]`).text().startsWith('Seeds'))!
    await seeds.setValue(32)
    const preview = wrapper.get('[data-testid="seed-drop-preview"]').text()
    // Row 1 at 32,000 against its section's 32,000: on the mark, not −5.9 % against the 34,000 mean.
    expect(preview).toContain('32,000 /ac')
    expect(preview).toContain('Against the setup\'s 32,000')
    expect(preview).toMatch(/[+]?0\.0 %/)
    expect(preview).not.toContain('-5.9 %')
  })
})
