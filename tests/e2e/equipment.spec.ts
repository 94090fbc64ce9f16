import { expect, test } from '@playwright/test'
import { signIn } from './helpers'

test('the foreman picks two row units on the toolbar and sets their depth at once', async ({ page }) => {
  await signIn(page, 'foreman')
  await expect(page.getByTestId('setups-panel')).toContainText('Creek 15 · soybeans 140k · 15 in')
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Equipment' }).click()
  await expect(page).toHaveURL(/\/planters$/)
  await page.getByRole('link', { name: /^North 12 Folding/ }).click()
  await expect(page.getByRole('heading', { name: 'North 12' })).toBeVisible()
  const row = (n: number) => page.locator(`[data-row-unit="${n}"]`)
  await row(4).click()
  await row(5).click({ modifiers: ['Control'] })
  await expect(row(4)).toHaveAttribute('aria-pressed', 'true')
  await expect(row(5)).toHaveAttribute('aria-pressed', 'true')
  await expect(row(6)).toHaveAttribute('aria-pressed', 'false')
  await page.getByLabel('Depth', { exact: true }).fill('2.25')
  await page.getByRole('button', { name: 'Apply to 2 rows' }).click()
  await expect(row(4)).toContainText('2.25″')
  await expect(row(5)).toContainText('2.25″')
  await expect(row(6)).toContainText('1.75″')

  // On a touch screen the switch makes every tap add a unit.
  await page.getByTestId('pick-several').check()
  await row(8).click()
  await row(9).click()
  await expect(page.getByRole('button', { name: 'Apply to 4 rows' })).toBeVisible()
})

test('the agronomist filters the setup list by planter and reads a setup without edit rights', async ({ page }) => {
  await signIn(page, 'agronomist')
  await page.goto('/setups')
  await page.getByLabel('Planter', { exact: true }).selectOption({ label: 'Creek 15' })
  await expect(page).toHaveURL(/planterId=\d+/)
  const table = page.getByRole('table')
  await expect(table.getByRole('link', { name: 'Creek 15 · soybeans 140k · 15 in' })).toBeVisible()
  await expect(table.getByRole('link', { name: /North 12/ })).toHaveCount(0)
  await table.getByRole('link', { name: 'Creek 15 · soybeans 140k · 15 in' }).click()
  await expect(page.getByRole('heading', { name: 'Creek 15 · soybeans 140k · 15 in' })).toBeVisible()
  await expect(page.getByRole('link', { name: 'Edit on the bench' })).toHaveCount(0)
  await page.getByLabel('Add a comment').fill('Check the split bar chains before the first field.')
  await page.getByRole('button', { name: 'Post' }).click()
  await expect(page.getByText('Check the split bar chains before the first field.')).toBeVisible()
})
