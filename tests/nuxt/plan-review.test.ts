import { beforeEach, describe, expect, it, vi } from 'vitest'
import { mountSuspended, registerEndpoint } from '@nuxt/test-utils/runtime'
import { getQuery } from 'h3'
import PlanReview from '../../components/plan/Review.vue'
import { signInAs } from './signed-in'

const asked: string[] = []
// Two planters, each with a corn and a soybean setup; the list answers the filters it is given.
const SETUPS = [
  { id: 1, name: 'North corn', planterId: 10, crop: 'corn', planterName: 'North', latestRevision: 2 },
  { id: 2, name: 'North beans', planterId: 10, crop: 'soybeans', planterName: 'North', latestRevision: 1 },
  { id: 3, name: 'Creek corn', planterId: 20, crop: 'corn', planterName: 'Creek', latestRevision: 4 },
]
const transitions: Record<string, unknown>[] = []
registerEndpoint('/api/plans/6/transition', { method: 'POST', handler: async (event) => {
  const { readBody } = await import('h3')
  transitions.push(await readBody(event))
  return {}
} })
registerEndpoint('/api/setups', (event) => {
  const q = getQuery(event)
  asked.push(`${q.planterId}-${q.crop}`)
  return { items: SETUPS.filter((s) => String(s.planterId) === q.planterId && s.crop === q.crop), nextAfter: null }
})

const plan = { id: 5, status: 'draft' as const, setupId: null, planterId: 10, crop: 'corn', fieldAcres: 80, proposedBy: null }

describe('PlanReview', () => {
  beforeEach(() => {
    signInAs('operator')
    asked.length = 0
  })

  it('lists the setups of the plan\'s current planter and crop after either changes', async () => {
    const wrapper = await mountSuspended(PlanReview, { props: { plan } })
    const options = () => wrapper.findAll('select option').map((o) => o.text())
    expect(options()).toEqual(['Choose a saved setup', 'North corn · North · rev. 2'])

    await wrapper.setProps({ plan: { ...plan, crop: 'soybeans' } })
    await vi.waitFor(() => expect(options()).toEqual(['Choose a saved setup', 'North beans · North · rev. 1']))

    await wrapper.setProps({ plan: { ...plan, planterId: 20 } })
    await vi.waitFor(() => expect(options()).toEqual(['Choose a saved setup', 'Creek corn · Creek · rev. 4']))
    expect(asked).toEqual(['10-corn', '10-soybeans', '20-corn'])
  })

  it('clears a chosen setup that no longer fits the plan', async () => {
    const wrapper = await mountSuspended(PlanReview, { props: { plan } })
    await wrapper.find('select').setValue('1')
    expect(wrapper.find('button:not([disabled])').text()).toBe('Propose this setup')
    await wrapper.setProps({ plan: { ...plan, crop: 'soybeans' } })
    await vi.waitFor(() => expect(wrapper.find('select').element.value).toBe('0'))
    expect(wrapper.find('button').attributes('disabled')).toBeDefined()
  })

  it('approves the setup revision the page shows, so a newer one saved meanwhile is refused', async () => {
    signInAs('agronomist')
    const waiting = { ...plan, id: 6, status: 'submitted' as const, setupId: 1, setupLatestRevision: 2, proposedBy: 999 }
    const wrapper = await mountSuspended(PlanReview, { props: { plan: waiting } })
    const approve = wrapper.findAll('button').find((b) => b.text() === 'Approve')!
    await approve.trigger('click')
    await vi.waitFor(() => expect(transitions).toEqual([{ to: 'approved', setupRevision: 2 }]))
  })
})
