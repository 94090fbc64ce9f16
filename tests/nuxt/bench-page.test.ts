import { beforeEach, describe, expect, it, vi } from 'vitest'
import { mountSuspended, registerEndpoint } from '@nuxt/test-utils/runtime'
import { createError } from 'h3'
import type { VueWrapper } from '@vue/test-utils'
import { fourRowConfig, signInAs } from './signed-in'
import BenchPage from '../../pages/bench.vue'

const config = fourRowConfig

const calls = { setup: 0, draft: 0 }
registerEndpoint('/api/planters', () => [{ id: 1, name: 'Test four-row' }])
registerEndpoint('/api/plates', () => [])
registerEndpoint('/api/planters/1', () => ({ id: 1, name: 'Test four-row', sections: [], rowUnits: [] }))
registerEndpoint('/api/planters/1/setup-draft', () => {
  calls.draft++
  return { config: config(32_000) }
})
registerEndpoint('/api/setups/7', () => {
  calls.setup++
  return { id: 7, name: 'Test four-row · corn 34k', planterId: 1, latestRevision: 2, revisions: [{ revision: 2, config: config(34_848) }] }
})

const target = (w: VueWrapper) => (w.findAll('label').find((l) => l.text() === 'Target seeding rate')!.element.closest('div')!.querySelector('input') as HTMLInputElement)
async function mountBench(route: string) {
  const wrapper = await mountSuspended(BenchPage, { route })
  await vi.waitFor(() => expect(wrapper.findAll('label').some((l) => l.text() === 'Target seeding rate')).toBe(true))
  return wrapper
}

describe('Setup bench', () => {
  beforeEach(() => {
    signInAs('operator')
    useBenchStore().reset()
    calls.setup = 0
    calls.draft = 0
  })

  it('keeps edits to a setup after leaving the bench and coming back to the same ?setup', async () => {
    const first = await mountBench('/bench?setup=7')
    expect(calls.setup).toBe(1)
    expect(target(first).value).toBe('34848')
    await first.find(`#${target(first).id}`).setValue('30000')
    expect(useBenchStore().edited).toBe(true)
    expect(first.find('[data-testid="bench-kept"]').text()).toContain('unsaved changes are kept')
    first.unmount()

    const back = await mountBench('/bench?setup=7')
    expect(calls.setup).toBe(1)
    expect(target(back).value).toBe('30000')
    expect(useBenchStore().config?.targetSeedsPerAcre).toBe(30_000)
  })

  it('reloads a setup it holds unedited, and discards edits on request', async () => {
    const first = await mountBench('/bench?setup=7')
    first.unmount()
    const again = await mountBench('/bench?setup=7')
    expect(calls.setup).toBe(2)
    await again.find(`#${target(again).id}`).setValue('30000')
    await again.find('[data-testid="bench-kept"] button').trigger('click')
    await vi.waitFor(() => expect(target(again).value).toBe('34848'))
    expect(calls.setup).toBe(3)
    expect(useBenchStore().edited).toBe(false)
  })

  it('does not hand one account\'s work to another, and starts on the first planter instead', async () => {
    useBenchStore().start({ planterId: 1, config: config(28_000), setupId: 7, baseRevision: 2, name: 'Someone else', owner: '9:4' })
    const wrapper = await mountBench('/bench')
    expect(calls.draft).toBe(1)
    expect(target(wrapper).value).toBe('32000')
    expect(useBenchStore().setupId).toBeNull()
    expect(useBenchStore().owner).toBe('3:1')
  })

  it('falls back to the first planter when the stored planter cannot be loaded', async () => {
    registerEndpoint('/api/planters/42', () => {
      throw createError({ statusCode: 404, statusMessage: 'Planter not found' })
    })
    useBenchStore().start({ planterId: 42, config: config(28_000), owner: '3:1' })
    const wrapper = await mountBench('/bench')
    expect(useBenchStore().planterId).toBe(1)
    expect(target(wrapper).value).toBe('32000')
    expect(wrapper.find('[data-testid="bench-load-failed"]').exists()).toBe(false)
  })
})

describe('bench store reset', () => {
  it('forgets the work and keeps the unit preference unless asked', () => {
    const bench = useBenchStore()
    bench.start({ planterId: 1, config: config(34_848), setupId: 7, baseRevision: 2, name: 'A', owner: '3:1' })
    bench.metric = true
    bench.reset()
    expect([bench.planterId, bench.setupId, bench.baseRevision, bench.config, bench.name, bench.owner]).toEqual([null, null, null, null, '', null])
    expect(bench.metric).toBe(true)
    bench.reset({ preferences: true })
    expect(bench.metric).toBe(false)
  })
})
