import { describe, expect, it, vi } from 'vitest'
import type { VueWrapper } from '@vue/test-utils'
import { mountSuspended } from '@nuxt/test-utils/runtime'
import ChecksSpacingForm from '../../components/checks/SpacingForm.vue'

// The histogram draws on a canvas, which the test DOM lacks; the indices show the values were read.
const context = { setupId: null, setupRevision: null, fieldId: null, planId: null, crop: 'corn', rowSpacingIn: 30, theoreticalIn: 6, targetSeedsPerAcre: null, seedsPerAcre: null, sections: [] }
const TABLE = 'row,spacing_in,note\n1,6.1,\n1,5.9,double?\n1,6.2,\n'

async function choose(wrapper: VueWrapper, file: File) {
  const input = wrapper.find('#spacing-csv')
  Object.defineProperty(input.element, 'files', { value: [file], configurable: true })
  await input.trigger('change')
}
const report = (w: VueWrapper) => w.find('[data-testid="csv-report"]')
const columnInput = (w: VueWrapper) => w.find(`#${w.findAll('label').find((l) => l.text() === 'Column name (optional)')!.attributes('for')}`)

describe('ChecksSpacingForm reading a CSV', () => {
  it('reads the chosen file again when the column name changes', async () => {
    const wrapper = await mountSuspended(ChecksSpacingForm, { props: { context }, global: { stubs: { ChecksSpacingHistogram: true } } })
    await choose(wrapper, new File([TABLE], 'row1.csv', { type: 'text/csv' }))
    // No column named: each whole line is read as a spacing, which a table's lines are not.
    await vi.waitFor(() => expect(report(wrapper).text()).toContain('0 spacings read from row1.csv'))
    expect(report(wrapper).text()).toContain('Line 2: "1,6.1," is not a number')

    await columnInput(wrapper).setValue('spacing')
    await vi.waitFor(() => expect(report(wrapper).text()).toContain('Line 1: No column named "spacing" in the header'))

    await columnInput(wrapper).setValue('spacing_in')
    await vi.waitFor(() => expect(report(wrapper).text()).toContain('3 spacings read from row1.csv'))
    expect(report(wrapper).text()).not.toContain('No column named')
    expect(report(wrapper).text()).not.toContain('is not a number')
    expect(wrapper.find('[data-testid="qfi"]').exists()).toBe(true)
  })

  it('clears the file input after reading, so the same file can be chosen again once fixed', async () => {
    const wrapper = await mountSuspended(ChecksSpacingForm, { props: { context }, global: { stubs: { ChecksSpacingHistogram: true } } })
    const input = wrapper.find('#spacing-csv').element as HTMLInputElement
    const setValue = vi.spyOn(input, 'value', 'set')
    await choose(wrapper, new File(['6\nabc\n6.2\n'], 'row2.csv', { type: 'text/csv' }))
    await vi.waitFor(() => expect(report(wrapper).text()).toContain('Line 2: "abc" is not a number'))
    expect(setValue).toHaveBeenCalledTimes(1)
    expect(setValue).toHaveBeenLastCalledWith('')
    const save = () => wrapper.findAll('button').find((b) => b.text() === 'Save spacing run')!

    expect(save().attributes('disabled')).toBeDefined()
    await choose(wrapper, new File(['6\n5.8\n6.2\n'], 'row2.csv', { type: 'text/csv' }))
    await vi.waitFor(() => expect(report(wrapper).text()).toContain('3 spacings read from row2.csv'))
    expect(report(wrapper).text()).not.toContain('is not a number')
    expect(save().attributes('disabled')).toBeUndefined()
  })
})
