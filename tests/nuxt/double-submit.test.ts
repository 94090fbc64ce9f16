import { beforeEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { getQuery, readBody } from 'h3'
import { mountSuspended, registerEndpoint } from '@nuxt/test-utils/runtime'
import SetupShopActions from '../../components/setup/ShopActions.vue'
import SetupsPage from '../../pages/setups/index.vue'
import { signInAs } from './signed-in'

const sent: unknown[] = []
let pages = 0
registerEndpoint('/api/members', () => [{ id: 4, name: 'Dana Shop', role: 'foreman' }])
registerEndpoint('/api/setups/7/sheet/send', {
  method: 'POST',
  handler: async (event) => {
    sent.push(await readBody(event))
    await new Promise((r) => setTimeout(r, 30))
    return { message: 'Sheet sent to Dana Shop' }
  },
})
registerEndpoint('/api/planters', () => [])
registerEndpoint('/api/setups', async (event) => {
  const after = getQuery(event).after
  if (!after) return { items: [{ id: 9, name: 'Newest', crop: 'corn', planterName: 'North', latestRevision: 1, installedRevision: null, updatedAt: '2027-05-01T12:00:00Z', targetSeedsPerAcre: 34_000, seedsPerAcre: 34_033, errorPercent: 0.1 }], nextAfter: 9 }
  pages++
  await new Promise((r) => setTimeout(r, 30))
  return { items: [{ id: 3, name: 'Older', crop: 'corn', planterName: 'North', latestRevision: 2, installedRevision: null, updatedAt: '2026-05-01T12:00:00Z', targetSeedsPerAcre: 32_000, seedsPerAcre: 32_100, errorPercent: 0.3 }], nextAfter: null }
})

const button = (w: VueWrapper, name: string) => w.findAll('button').find((b) => b.text() === name)!

describe('a second press while the first is on its way does nothing', () => {
  beforeEach(() => {
    signInAs('operator')
    sent.length = 0
    pages = 0
  })

  it('sends the setup sheet once and shows the Send button busy meanwhile', async () => {
    const wrapper = await mountSuspended(SetupShopActions, { props: { setupId: 7, revision: 2 } })
    await button(wrapper, 'Send sheet').trigger('click')
    await vi.waitFor(() => expect(wrapper.findAll('option').map((o) => o.text())).toContain('Dana Shop (foreman)'))
    await wrapper.findAll('select').at(-1)!.setValue('4')
    const send = button(wrapper, 'Send')
    void send.trigger('click')
    void send.trigger('click')
    await wrapper.vm.$nextTick()
    expect(button(wrapper, 'Send').attributes('aria-busy')).toBe('true')
    await vi.waitFor(() => expect(useToast().toasts.value.map((t) => t.text)).toContain('Sheet sent to Dana Shop'))
    expect(sent).toEqual([{ memberId: 4, revision: 2, message: null }])
  })

  it('appends the older setups once however often "Show older setups" is clicked', async () => {
    const wrapper = await mountSuspended(SetupsPage)
    const names = () => wrapper.findAll('tbody tr').map((tr) => tr.find('td').text())
    expect(names()).toEqual(['Newest'])
    const older = button(wrapper, 'Show older setups')
    void older.trigger('click')
    void older.trigger('click')
    await vi.waitFor(() => expect(names()).toEqual(['Newest', 'Older']))
    await flushPromises()
    expect(pages).toBe(1)
    expect(wrapper.findAll('button').some((b) => b.text() === 'Show older setups')).toBe(false)
  })
})
