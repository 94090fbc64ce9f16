import { beforeEach, describe, expect, it } from 'vitest'
import { mountSuspended, registerEndpoint } from '@nuxt/test-utils/runtime'
import type { VueWrapper } from '@vue/test-utils'
import { signInAs } from './signed-in'
import ChecksPage from '../../pages/checks/index.vue'

registerEndpoint('/api/setups', () => ({ items: [], nextAfter: null }))
registerEndpoint('/api/fields', () => ({ items: [] }))
registerEndpoint('/api/checks', () => ({ items: [] }))

const tab = (w: VueWrapper, name: string) => w.findAll('[role="tab"]').find((t) => t.text() === name)!
const pad = (w: VueWrapper, name: string) => w.find(`[role="group"][aria-label="${name}"]`)
async function typeOnPad(w: VueWrapper, group: string, value: string, addLabel: string) {
  for (const d of value) await pad(w, group).findAll('button').find((b) => b.attributes('aria-label') === d)!.trigger('click')
  await pad(w, group).findAll('button').find((b) => b.text() === addLabel)!.trigger('click')
}

describe('Field checks page', () => {
  beforeEach(() => {
    signInAs('operator')
  })

  it('keeps counts typed on one tab after a look at another', async () => {
    const wrapper = await mountSuspended(ChecksPage)
    await typeOnPad(wrapper, 'Plants counted', '31', 'Add count')
    await typeOnPad(wrapper, 'Plants counted', '33', 'Add count')
    const counts = () => wrapper.findAll('[data-testid="stand-counts"] button').map((b) => b.text())
    expect(counts()).toEqual(['31 ×', '33 ×'])

    await tab(wrapper, 'Spacing run').trigger('click')
    expect(wrapper.find('[data-testid="stand-counts"]').exists()).toBe(false)
    await typeOnPad(wrapper, 'Spacing', '6', 'Add spacing')
    expect(wrapper.findAll('[data-testid="typed-spacings"] li').map((l) => l.text())).toEqual(['6'])

    await tab(wrapper, 'Replant aid').trigger('click')
    await tab(wrapper, 'Stand count').trigger('click')
    expect(counts()).toEqual(['31 ×', '33 ×'])
    expect(wrapper.find('[data-testid="stand-mean"]').exists()).toBe(true)
    await tab(wrapper, 'Spacing run').trigger('click')
    expect(wrapper.findAll('[data-testid="typed-spacings"] li').map((l) => l.text())).toEqual(['6'])
  })

  it('shows only the form of the chosen tab, so labels stay unique on the page', async () => {
    const wrapper = await mountSuspended(ChecksPage)
    expect(wrapper.findAll('[role="group"][aria-label="Plants counted"]')).toHaveLength(1)
    await tab(wrapper, 'Spacing run').trigger('click')
    expect(wrapper.findAll('[role="group"][aria-label="Plants counted"]')).toHaveLength(0)
    expect(wrapper.findAll('[role="group"][aria-label="Spacing"]')).toHaveLength(1)
    expect(tab(wrapper, 'Spacing run').attributes('aria-selected')).toBe('true')
  })
})
