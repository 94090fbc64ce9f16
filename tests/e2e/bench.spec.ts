import { expect, test } from '@playwright/test'
import { signIn } from './helpers'

test('the operator changes a sprocket, applies a suggestion, saves a setup and reads its history', async ({ page }) => {
  await signIn(page, 'operator')
  await page.goto('/bench')
  await page.getByLabel('Planter', { exact: true }).selectOption({ label: 'North 12' })
  const population = page.getByTestId('bench-population')
  // North 12 as installed: 17/23 × 17/26, 30 cells, 86.4 in, 3 % slip → 34,033 (computed).
  await expect(population).toHaveText('34,033')
  await expect(page.getByTestId('bench-check-length')).toHaveText('17 ft 5 in')
  await page.getByLabel('Stage 1 driver', { exact: true }).selectOption('21')
  // 21/23 × 17/26 → 42,041 seeds/acre (computed with the same formula).
  await expect(population).toHaveText('42,041')
  await page.getByLabel('Target seeding rate').fill('32000')
  await page.getByRole('button', { name: 'Find plate and sprockets' }).click()
  const suggestions = page.getByTestId('suggestions')
  await expect(suggestions.getByRole('listitem').first()).toBeVisible()
  await suggestions.getByRole('button', { name: 'Apply' }).first().click()
  const applied = Number((await population.textContent())!.replace(/,/g, ''))
  expect(Math.abs(applied / 32000 - 1)).toBeLessThan(0.02)
  await page.getByLabel('Setup name').fill('North 12 · corn 32k · e2e')
  await page.getByLabel('What changed and why').fill('Lower rate for the light ground')
  await page.getByRole('button', { name: 'Save setup' }).click()
  await expect(page.getByRole('heading', { name: 'North 12 · corn 32k · e2e' })).toBeVisible()
  await expect(page.getByTestId('history').getByRole('listitem')).toHaveCount(1)
  await page.getByRole('link', { name: 'Edit on the bench' }).click()
  await page.getByLabel('Planned speed').fill('6')
  await page.getByLabel('What changed and why').fill('Faster pass')
  await page.getByRole('button', { name: 'Save revision 2' }).click()
  await expect(page.getByTestId('history').getByRole('listitem')).toHaveCount(2)
  await expect(page.getByTestId('diff')).toContainText('Planned speed')
})
