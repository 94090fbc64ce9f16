import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { mountSuspended, registerEndpoint } from '@nuxt/test-utils/runtime'
import type { VueWrapper } from '@vue/test-utils'
import ApplicationRecordForm from '../../components/application/RecordForm.vue'
import ChecksReplantAid from '../../components/checks/ReplantAid.vue'
import PlanReview from '../../components/plan/Review.vue'
import MaintenancePage from '../../pages/shop/maintenance.vue'
import { signInAs } from './signed-in'

registerEndpoint('/api/planters', () => [{ id: 1, name: 'North' }])
registerEndpoint('/api/planters/1/maintenance', () => ({ planter: { id: 1, name: 'North' }, acresPlanted: 0, plantings: [], events: [], due: [] }))

// 22:30 on May 12 in Iowa (CDT, UTC−5) is already 03:30 on May 13 in UTC.
const IOWA_EVENING = new Date('2027-05-13T03:30:00Z')
const zone = process.env.TZ
const valueOf = (w: VueWrapper, label: string) => (w.findAll('label').find((l) => l.text().startsWith(label))!.element.closest('div')!.querySelector('input') as HTMLInputElement).value

beforeEach(() => {
  process.env.TZ = 'America/Chicago'
  vi.useFakeTimers({ now: IOWA_EVENING, toFake: ['Date'] })
})
afterEach(() => {
  vi.useRealTimers()
  if (zone === undefined) delete process.env.TZ
  else process.env.TZ = zone
})

describe('the day a form starts on is the local day', () => {
  it('dates a new application record on the evening it is written, not on the UTC tomorrow', async () => {
    const wrapper = await mountSuspended(ApplicationRecordForm, { props: { choices: null } })
    expect(valueOf(wrapper, 'Date applied')).toBe('2027-05-12')
  })

  it('counts the days since a restricted-use application in local calendar days', async () => {
    const wrapper = await mountSuspended(ApplicationRecordForm, { props: { choices: null, initial: { appliedOn: '2027-04-27', restrictedUse: true } } })
    // April 27 to May 12 is 15 days; from the UTC clock it would read 16.
    expect(wrapper.text()).toContain('15 days ago: the federal rule asks for the record within 14 days')
    const onTime = await mountSuspended(ApplicationRecordForm, { props: { choices: null, initial: { appliedOn: '2027-04-28', restrictedUse: true } } })
    expect(onTime.text()).not.toContain('days ago')
  })

  it('proposes May 1 of the local year as the planting date to weigh', async () => {
    vi.setSystemTime(new Date('2027-01-01T04:00:00Z')) // still Dec 31, 2026 in Iowa
    const wrapper = await mountSuspended(ChecksReplantAid, { props: { stand: 28_000 } })
    expect(valueOf(wrapper, 'Planted on')).toBe('2026-05-01')
    expect(valueOf(wrapper, 'Replant date')).toBe('2026-05-22')
  })

  it('records planting on the local day', async () => {
    signInAs('operator')
    const plan = { id: 5, status: 'set-up' as const, setupId: 1, planterId: 1, crop: 'corn', fieldAcres: 80, proposedBy: null }
    const wrapper = await mountSuspended(PlanReview, { props: { plan } })
    expect(valueOf(wrapper, 'Planted on')).toBe('2027-05-12')
  })

  it('logs a service on the local day', async () => {
    signInAs('foreman')
    const wrapper = await mountSuspended(MaintenancePage, { route: '/shop/maintenance?planter=1' })
    expect(valueOf(wrapper, 'Serviced on')).toBe('2027-05-12')
  })
})
