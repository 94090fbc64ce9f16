import { beforeEach, describe, expect, it, vi } from 'vitest'
import type { VueWrapper } from '@vue/test-utils'
import { mountSuspended, registerEndpoint } from '@nuxt/test-utils/runtime'
import { createError, readBody } from 'h3'
import SetupPage from '../../pages/setups/[id].vue'
import { computeSetupResults } from '../../shared/utils/setup-results'
import type { SetupConfig } from '../../shared/types/setup'
import { signInAs } from './signed-in'

const range = (from: number, to: number) => Array.from({ length: to - from + 1 }, (_, i) => from + i)
const config: SetupConfig = {
  crop: 'corn', targetSeedsPerAcre: 34_848, rowSpacingIn: 30, speedMph: null, wheelCircumferenceIn: 60, slipPercent: 0, meterRatio: 1,
  sections: [{ sectionId: null, name: 'Main drive', rows: range(1, 4), seedPlateId: null, plateCode: null, cellsPerPlate: 10, stages: [{ position: 1, driverTeeth: 20, drivenTeeth: 20 }] }],
  rowUnits: range(1, 4).map((position) => ({
    position, opener: 'double-disc', gaugeWheels: null, depthIn: 1.75, depthBand: null, downPressureLb: null, pressWheel: 'open-center', pressWheelWidthIn: null,
    covering: 'none', furrower: false, seedPlateId: null, granular: 'none', granularBandWidthIn: null, granularDialSetting: null, fertilizerSetting: null, planting: true,
  })),
}
const comments: { id: number, body: string, authorName: string, createdAt: string, revision: number }[] = []
let refuse = false
registerEndpoint('/api/setups/7', () => ({
  id: 7, name: 'Test setup', crop: 'corn', planterId: 1, planterName: 'North', latestRevision: 1, installedRevision: null,
  revisions: [{ revision: 1, config, results: computeSetupResults(config), note: null, savedAt: '2027-05-01T12:00:00Z', savedByName: 'Test' }],
  comments,
}))
registerEndpoint('/api/setups/7/diff', () => ({ changes: [], from: { results: computeSetupResults(config) }, to: { results: computeSetupResults(config) } }))
registerEndpoint('/api/setups/7/calibrations', () => [])
registerEndpoint('/api/checks', () => ({ items: [] }))
registerEndpoint('/api/setups/7/comments', {
  method: 'POST',
  handler: async (event) => {
    const body = await readBody<{ body: string, revision: number }>(event)
    await new Promise((r) => setTimeout(r, 20))
    if (refuse) throw createError({ statusCode: 503, statusMessage: 'The database is briefly unavailable' })
    comments.push({ id: comments.length + 1, body: body.body, authorName: 'Test', createdAt: '2027-05-02T12:00:00Z', revision: body.revision })
    return comments.at(-1)
  },
})

const textarea = (w: VueWrapper) => w.find('textarea#comment')
const post = (w: VueWrapper) => w.findAll('button').find((b) => b.text() === 'Post')!

describe('Setup discussion', () => {
  beforeEach(() => {
    signInAs('agronomist')
    comments.length = 0
    refuse = false
    useToast().toasts.value = []
  })

  it('keeps the comment typed when posting fails, and says why', async () => {
    refuse = true
    const wrapper = await mountSuspended(SetupPage, { route: '/setups/7' })
    await textarea(wrapper).setValue('Check the left wing plates')
    await wrapper.find('form:has(textarea#comment)').trigger('submit')
    await wrapper.vm.$nextTick()
    expect(post(wrapper).attributes('aria-busy')).toBe('true')
    await vi.waitFor(() => expect(post(wrapper).attributes('aria-busy')).toBe('false'))
    expect((textarea(wrapper).element as HTMLTextAreaElement).value).toBe('Check the left wing plates')
    expect(useToast().toasts.value.filter((t) => t.kind === 'error').map((t) => t.text)).toEqual(['The database is briefly unavailable'])
    expect(comments).toEqual([])
  })

  it('posts once, clears the box and lists the comment', async () => {
    const wrapper = await mountSuspended(SetupPage, { route: '/setups/7' })
    await textarea(wrapper).setValue('Plates checked')
    const form = wrapper.find('form:has(textarea#comment)')
    void form.trigger('submit')
    void form.trigger('submit')
    await vi.waitFor(() => expect(wrapper.text()).toContain('Plates checked'))
    await vi.waitFor(() => expect((textarea(wrapper).element as HTMLTextAreaElement).value).toBe(''))
    expect(comments.map((c) => [c.body, c.revision])).toEqual([['Plates checked', 1]])
  })
})
