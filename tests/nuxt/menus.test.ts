import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { h } from 'vue'
import type { VueWrapper } from '@vue/test-utils'
import { mountSuspended, registerEndpoint } from '@nuxt/test-utils/runtime'
import DefaultLayout from '../../layouts/default.vue'
import AppTopBar from '../../components/app/TopBar.vue'
import { signInAs } from './signed-in'

registerEndpoint('/api/auth/logout', { method: 'POST', handler: () => ({ ok: true }) })
registerEndpoint('/api/_auth/session', { method: 'DELETE', handler: () => ({ loggedOut: true }) })
registerEndpoint('/api/auth/switch-farm', { method: 'POST', handler: () => ({ ok: true }) })
registerEndpoint('/api/auth/me', () => ({ user: { id: 3, email: 'owner@example.test', name: 'Test owner' }, farms: [{ id: 1, name: 'Test Farm', role: 'owner' }, { id: 2, name: 'Second Farm', role: 'agronomist' }], farmId: 2, role: 'agronomist', farmName: 'Second Farm' }))

const escape = () => document.dispatchEvent(new KeyboardEvent('keydown', { key: 'Escape', bubbles: true }))
let wrapper: VueWrapper | null = null
afterEach(() => {
  wrapper?.unmount()
  wrapper = null
})
beforeEach(() => signInAs('owner'))

describe('the phone side menu', () => {
  it('is invisible while closed, takes focus when opened, and gives it back on Escape', async () => {
    wrapper = await mountSuspended(DefaultLayout, { slots: { default: () => h('p', 'Page') }, attachTo: document.body })
    const nav = () => wrapper!.find('nav#main-nav')
    const toggle = wrapper.find('button[aria-controls="main-nav"]')
    // Closed: off-screen and invisible below the desktop width (visibility:hidden leaves the tab order).
    expect(nav().classes()).toEqual(expect.arrayContaining(['invisible', '-translate-x-full', 'md:visible']))
    expect(toggle.attributes('aria-expanded')).toBe('false')

    await toggle.trigger('click')
    await vi.waitFor(() => expect(document.activeElement).toBe(nav().find('a').element))
    expect(nav().classes()).toContain('visible')
    expect(nav().classes()).not.toContain('invisible')
    expect(toggle.attributes('aria-expanded')).toBe('true')

    escape()
    await vi.waitFor(() => expect(nav().classes()).toContain('invisible'))
    expect(document.activeElement).toBe(toggle.element)
    expect(toggle.attributes('aria-expanded')).toBe('false')
  })

  it('closes on a tap on the shade beside it', async () => {
    wrapper = await mountSuspended(DefaultLayout, { slots: { default: () => h('p', 'Page') }, attachTo: document.body })
    await wrapper.find('button[aria-controls="main-nav"]').trigger('click')
    await wrapper.find('div[aria-hidden="true"].fixed').trigger('click')
    expect(wrapper.find('nav#main-nav').classes()).toContain('invisible')
  })
})

describe('the user menu', () => {
  it('opens on its first item, closes on Escape and gives focus back to its button', async () => {
    wrapper = await mountSuspended(AppTopBar, { attachTo: document.body })
    const button = wrapper.find('[data-testid="user-menu"]')
    await button.trigger('click')
    const item = wrapper.find('[role="menu"] [role="menuitem"]')
    expect(item.text()).toBe('Sign out')
    await vi.waitFor(() => expect(document.activeElement).toBe(item.element))
    expect(button.attributes('aria-expanded')).toBe('true')

    escape()
    await vi.waitFor(() => expect(wrapper!.find('[role="menu"]').exists()).toBe(false))
    expect(document.activeElement).toBe(button.element)
    expect(button.attributes('aria-expanded')).toBe('false')
  })

  it('closes on a press outside it and stays open on a press inside it', async () => {
    wrapper = await mountSuspended(AppTopBar, { attachTo: document.body })
    await wrapper.find('[data-testid="user-menu"]').trigger('click')
    wrapper.find('[role="menu"]').element.dispatchEvent(new PointerEvent('pointerdown', { bubbles: true }))
    await wrapper.vm.$nextTick()
    expect(wrapper.find('[role="menu"]').exists()).toBe(true)
    document.body.dispatchEvent(new PointerEvent('pointerdown', { bubbles: true }))
    await vi.waitFor(() => expect(wrapper!.find('[role="menu"]').exists()).toBe(false))
  })

  it('forgets the bench work and the unit preference on sign-out', async () => {
    const bench = useBenchStore()
    bench.start({ planterId: 1, config: { crop: 'corn' } as never, setupId: 7, owner: '3:1' })
    bench.metric = true
    wrapper = await mountSuspended(AppTopBar, { attachTo: document.body })
    await wrapper.find('[data-testid="user-menu"]').trigger('click')
    await wrapper.find('[role="menuitem"]').trigger('click')
    await vi.waitFor(() => expect(useRouter().currentRoute.value.path).toBe('/login'))
    expect([bench.planterId, bench.setupId, bench.config, bench.metric]).toEqual([null, null, null, false])
    expect(useAccountStore().me).toBeNull()
  })

  it('forgets the bench work, but not the unit preference, on a farm switch', async () => {
    useAccountStore().me!.farms.push({ id: 2, name: 'Second Farm', role: 'agronomist' })
    const bench = useBenchStore()
    bench.start({ planterId: 1, config: { crop: 'corn' } as never, setupId: 7, owner: '3:1' })
    bench.metric = true
    wrapper = await mountSuspended(AppTopBar, { attachTo: document.body })
    await wrapper.find('[data-testid="farm-switcher"]').setValue('2')
    await vi.waitFor(() => expect(useAccountStore().farmName).toBe('Second Farm'))
    await vi.waitFor(() => expect(bench.config).toBeNull())
    expect([bench.planterId, bench.setupId, bench.metric]).toEqual([null, null, true])
  })
})
