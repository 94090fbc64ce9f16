import { expect, test } from '@playwright/test'
import { signIn, signOut } from './helpers'

// What each role finds in the main navigation (and what it must not find).
const expectations = {
  owner: { sees: ['Today', 'People', 'Mailbox'], hidden: [], badge: 'Owner' },
  agronomist: { sees: ['Today'], hidden: ['People', 'Mailbox'], badge: 'Agronomist' },
  operator: { sees: ['Today'], hidden: ['People', 'Mailbox'], badge: 'Operator' },
  foreman: { sees: ['Today'], hidden: ['People', 'Mailbox'], badge: 'Shop foreman' },
} as const

for (const [role, want] of Object.entries(expectations)) {
  test(`${role} signs in, sees their navigation and signs out`, async ({ page }, info) => {
    await signIn(page, role as keyof typeof expectations)
    await expect(page.getByTestId('role-badge')).toHaveText(want.badge)
    await expect(page.getByTestId('farm-name')).toHaveText('Cottonwood Flats Farm')
    const nav = page.getByRole('navigation', { name: 'Main' })
    for (const label of want.sees) await expect(nav.getByRole('link', { name: label, exact: true })).toBeVisible()
    for (const label of want.hidden) await expect(nav.getByRole('link', { name: label, exact: true })).toHaveCount(0)
    await page.screenshot({ path: info.outputPath(`${role}.png`), fullPage: true })
    await signOut(page)
    await page.goto('/')
    await expect(page).toHaveURL(/\/login/)
  })
}

test('a signed-out visitor is sent to sign-in', async ({ page }) => {
  await page.goto('/members')
  await expect(page).toHaveURL(/\/login\?next=(%2F|\/)members/)
})

test('the owner switches farms from the top bar', async ({ page }) => {
  await signIn(page, 'owner')
  await page.getByTestId('farm-switcher').selectOption({ label: 'Sandridge Acres' })
  await expect(page.getByTestId('farm-name')).toHaveText('Sandridge Acres')
  await expect(page.getByTestId('farm-switcher')).toHaveValue(/\d+/)
})
