import { beforeEach, describe, expect, it, vi } from 'vitest'
import type { VueWrapper } from '@vue/test-utils'
import { mountSuspended, registerEndpoint } from '@nuxt/test-utils/runtime'
import { readBody } from 'h3'
import MembersPage from '../../pages/members.vue'
import { signInAs } from './signed-in'

const patches: { id: string, body: unknown }[] = []
let myRole = 'owner'
registerEndpoint('/api/members', () => [
  { id: 11, userId: 3, name: 'Test owner', email: 'owner@example.test', role: myRole, since: '2026-01-01T00:00:00Z' },
  { id: 12, userId: 4, name: 'Other owner', email: 'other@example.test', role: 'owner', since: '2026-01-01T00:00:00Z' },
])
for (const id of ['11', '12']) {
  registerEndpoint(`/api/members/${id}`, {
    method: 'PATCH',
    handler: async (event) => {
      const body = await readBody<{ role: string }>(event)
      patches.push({ id, body })
      if (id === '11') myRole = body.role
      return { id: Number(id), role: body.role }
    },
  })
}
registerEndpoint('/api/auth/me', () => ({ user: { id: 3, email: 'owner@example.test', name: 'Test owner' }, farms: [{ id: 1, name: 'Test Farm', role: myRole }], farmId: 1, role: myRole, farmName: 'Test Farm' }))

const ownRoleDialog = (w: VueWrapper) => w.find('dialog[aria-label="Change your own role"]').element as HTMLDialogElement
const roleSelect = (w: VueWrapper, name: string) => w.find(`select[id="${w.findAll('label').find((l) => l.text() === `Role of ${name}`)!.attributes('for')}"]`)

describe('People page', () => {
  beforeEach(() => {
    signInAs('owner')
    patches.length = 0
    myRole = 'owner'
  })

  it('asks before an owner gives up their own role, and keeps it on "Stay owner"', async () => {
    const wrapper = await mountSuspended(MembersPage, { route: '/members' })
    await roleSelect(wrapper, 'Test owner').setValue('agronomist')
    expect(ownRoleDialog(wrapper).open).toBe(true)
    expect(ownRoleDialog(wrapper).textContent).toContain('Make yourself agronomist on Test Farm?')
    await wrapper.findAll('button').find((b) => b.text() === 'Stay owner')!.trigger('click')
    expect(patches).toEqual([])
    expect(ownRoleDialog(wrapper).open).toBe(false)
    expect((roleSelect(wrapper, 'Test owner').element as HTMLSelectElement).value).toBe('owner')
  })

  it('reloads the account after changing one\'s own role and leaves the owner-only page', async () => {
    const wrapper = await mountSuspended(MembersPage, { route: '/members' })
    await roleSelect(wrapper, 'Test owner').setValue('agronomist')
    await wrapper.findAll('button').find((b) => b.text() === 'Change my role')!.trigger('click')
    await vi.waitFor(() => expect(useAccountStore().role).toBe('agronomist'))
    expect(patches).toEqual([{ id: '11', body: { role: 'agronomist' } }])
    await vi.waitFor(() => expect(useRouter().currentRoute.value.path).toBe('/'))
  })

  it('changes another member\'s role without asking or reloading one\'s own account', async () => {
    const wrapper = await mountSuspended(MembersPage, { route: '/members' })
    await roleSelect(wrapper, 'Other owner').setValue('operator')
    await vi.waitFor(() => expect(patches).toEqual([{ id: '12', body: { role: 'operator' } }]))
    expect(ownRoleDialog(wrapper).open).toBe(false)
    expect(useAccountStore().role).toBe('owner')
  })
})
