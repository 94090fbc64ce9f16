import { describe, expect, it } from 'vitest'
import { mountSuspended } from '@nuxt/test-utils/runtime'
import ApplicationRecordForm from '../../components/application/RecordForm.vue'

describe('ApplicationRecordForm', () => {
  it('names what a restricted-use record needs (7 CFR 110.3) as soon as the box is ticked, before any save', async () => {
    const wrapper = await mountSuspended(ApplicationRecordForm, { props: { choices: null } })
    const hintCount = () => wrapper.text().split('required for a restricted-use product').length - 1
    expect(hintCount()).toBe(0)
    await wrapper.find('input[type="checkbox"]').setValue(true)
    // Registration number, total amount and certification number.
    expect(hintCount()).toBe(3)
    await wrapper.find('input[type="checkbox"]').setValue(false)
    expect(hintCount()).toBe(0)
  })
})
