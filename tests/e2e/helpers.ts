import { expect, type Page } from '@playwright/test'

export const DEMO_PASSWORD = 'rowbench-demo'

export async function signIn(page: Page, role: 'owner' | 'agronomist' | 'operator' | 'foreman') {
  await page.goto('/login')
  await page.getByLabel('E-mail').fill(`${role}@demo.test`)
  await page.getByLabel('Password').fill(DEMO_PASSWORD)
  await page.getByRole('button', { name: 'Sign in' }).click()
  await expect(page.getByTestId('role-badge')).toBeVisible()
}

export async function signOut(page: Page) {
  await page.getByTestId('user-menu').click()
  await page.getByRole('menuitem', { name: 'Sign out' }).click()
  await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible()
}
