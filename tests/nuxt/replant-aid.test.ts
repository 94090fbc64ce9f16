import { describe, expect, it } from 'vitest'
import { mountSuspended } from '@nuxt/test-utils/runtime'
import ChecksReplantAid from '../../components/checks/ReplantAid.vue'

describe('ChecksReplantAid', () => {
  it('weighs a replant three weeks after the planting date by default, inside the yield table, not on today\'s date', async () => {
    const wrapper = await mountSuspended(ChecksReplantAid, { props: { stand: 31_167, plantingDate: '2026-04-27' } })
    const value = (label: string) => (wrapper.findAll('label').find((l) => l.text().startsWith(label))!.element.closest('div')!.querySelector('input') as HTMLInputElement).value
    expect(value('Planted on')).toBe('2026-04-27')
    expect(value('Replant date')).toBe('2026-05-18')
    expect(value('Stand found')).toBe('31167')
    // Both dates lie within the table (late April to early June), so no nearest-value warning.
    expect(wrapper.text()).not.toContain('outside the table')
  })
})
