import { describe, expect, it } from 'vitest'
import { mountSuspended } from '@nuxt/test-utils/runtime'
import BaseTable from '../../components/base/Table.vue'
import BaseField from '../../components/base/Field.vue'

describe('BaseTable', () => {
  it('sorts by a sortable column and flips the order on a second click', async () => {
    const wrapper = await mountSuspended(BaseTable, {
      props: {
        columns: [{ key: 'name', label: 'Name', sortable: true }, { key: 'teeth', label: 'Teeth', sortable: true, align: 'right' }],
        rows: [{ id: 1, name: 'B', teeth: 19 }, { id: 2, name: 'A', teeth: 26 }, { id: 3, name: 'C', teeth: 15 }],
      },
    })
    const firstColumn = () => wrapper.findAll('tbody tr').map((tr) => tr.find('td').text())
    expect(firstColumn()).toEqual(['B', 'A', 'C'])
    const teethHeader = wrapper.findAll('th button')[1]!
    await teethHeader.trigger('click')
    expect(firstColumn()).toEqual(['C', 'B', 'A'])
    await teethHeader.trigger('click')
    expect(firstColumn()).toEqual(['A', 'B', 'C'])
    expect(wrapper.findAll('th')[1]!.attributes('aria-sort')).toBe('descending')
  })

  it('shows the empty message when there are no rows', async () => {
    const wrapper = await mountSuspended(BaseTable, { props: { columns: [{ key: 'a', label: 'A' }], rows: [], empty: 'No sprockets on the shelf.' } })
    expect(wrapper.text()).toContain('No sprockets on the shelf.')
  })
})

describe('BaseField', () => {
  it('emits numbers for number inputs and null when cleared, and links its label', async () => {
    const wrapper = await mountSuspended(BaseField, { props: { label: 'Row spacing', type: 'number', unit: 'in', modelValue: 30 } })
    const input = wrapper.find('input')
    expect(wrapper.find('label').attributes('for')).toBe(input.attributes('id'))
    await input.setValue('22.5')
    await input.setValue('')
    expect(wrapper.emitted('update:modelValue')).toEqual([[22.5], [null]])
  })

  it('marks the input invalid and shows the error', async () => {
    const wrapper = await mountSuspended(BaseField, { props: { label: 'Teeth', error: 'Driver teeth must be a whole number from 1 to 200' } })
    expect(wrapper.find('input').attributes('aria-invalid')).toBe('true')
    expect(wrapper.text()).toContain('Driver teeth must be a whole number from 1 to 200')
  })
})

describe('BaseToastHost', () => {
  it('announces an error at once (role alert) and other news politely (role status), each dismissable', async () => {
    const { default: BaseToastHost } = await import('../../components/base/ToastHost.vue')
    const toast = useToast()
    toast.dismiss(-1)
    toast.toasts.value = []
    const wrapper = await mountSuspended(BaseToastHost)
    toast.error('The database is briefly unavailable. Please retry in a few seconds.')
    toast.success('Setup saved')
    await nextTick()
    const items = wrapper.findAll('[data-kind]')
    expect(items.map((i) => [i.attributes('data-kind'), i.attributes('role')])).toEqual([['error', 'alert'], ['success', 'status']])
    await items[0]!.find('button[aria-label="Dismiss"]').trigger('click')
    expect(wrapper.findAll('[data-kind]').map((i) => i.text())).toEqual([expect.stringContaining('Setup saved')])
  })
})
