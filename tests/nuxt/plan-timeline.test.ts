import { describe, expect, it } from 'vitest'
import { mountSuspended } from '@nuxt/test-utils/runtime'
import PlanTimeline from '../../components/plan/Timeline.vue'

describe('PlanTimeline', () => {
  it('shows a move as from → to, and a setup revised while waiting as such, not "Waiting → Waiting"', async () => {
    const events = [
      { id: 1, fromStatus: 'draft' as const, toStatus: 'submitted' as const, userName: 'Luis', comment: null, setupRevision: 3, createdAt: '2026-12-01T15:00:00Z' },
      { id: 2, fromStatus: 'submitted' as const, toStatus: 'submitted' as const, userName: 'Marty', comment: 'Revision 4 of the setup was saved while the plan waited for review', setupRevision: 4, createdAt: '2026-12-02T15:00:00Z' },
    ]
    const wrapper = await mountSuspended(PlanTimeline, { props: { events } })
    const heads = wrapper.findAll('li > p:first-child').map((p) => p.text().replace(/[\s\u00a0]+/g, ' '))
    expect(heads).toEqual(['Draft → Waiting for review · setup revision 3', 'Setup revised while waiting for review · setup revision 4'])
  })
})
