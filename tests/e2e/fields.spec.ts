import { expect, test } from '@playwright/test'
import { signIn } from './helpers'

// Invented field names; line 3 of the first file has acres that are not a number.
const bad = ['name,acres,soil texture,tillage', 'Ridge Pasture,44,loam,no-till', 'Gravel Pit Corner,forty,sandy loam,', 'Lone Oak,61.5,silt loam,minimum'].join('\n')

test('the agronomist imports a field list, fixes the bad line it names, and opens a field with its outline', async ({ page }, info) => {
  await signIn(page, 'agronomist')
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Fields', exact: true }).click()
  await expect(page.getByRole('heading', { name: 'Fields' })).toBeVisible()
  // The demo farm's fields with outlines show a thumbnail.
  await expect(page.getByRole('img', { name: 'Outline of Schoolhouse 80' })).toBeVisible()
  await page.screenshot({ path: info.outputPath('fields.png'), fullPage: true })

  await page.getByRole('button', { name: 'Import CSV' }).click()
  const dialog = page.getByRole('dialog', { name: 'Import a field list' })
  await dialog.getByLabel('Or paste the text').fill(bad)
  await dialog.getByRole('button', { name: 'Check' }).click()
  const problems = dialog.getByRole('list', { name: 'Lines that need attention' })
  await expect(problems.getByRole('listitem')).toHaveText(['Line 3: acres: "forty" is not a number'])
  await page.screenshot({ path: info.outputPath('import.png') })
  await expect(dialog.getByRole('button', { name: 'Import', exact: true })).toBeDisabled()

  await dialog.getByLabel('Or paste the text').fill(bad.replace('forty', '40'))
  await dialog.getByRole('button', { name: 'Check' }).click()
  await expect(dialog.getByText('All 3 lines are good.')).toBeVisible()
  await dialog.getByRole('button', { name: 'Import', exact: true }).click()
  await expect(page.getByText('3 fields imported')).toBeVisible()
  await expect(dialog).toBeHidden()

  await page.getByLabel('Search').fill('gravel')
  const link = page.getByRole('link', { name: 'Gravel Pit Corner' })
  await expect(link).toBeVisible()
  await expect(page.getByRole('link', { name: 'Lone Oak' })).toHaveCount(0)
  await link.click()
  await expect(page.getByRole('heading', { name: 'Gravel Pit Corner' })).toBeVisible()
  await expect(page.getByText('sandy loam')).toBeVisible()

  // An outline that crosses itself is refused with the reason; a square one is drawn and measured.
  await page.getByText('or paste it').click()
  await page.getByLabel('GeoJSON text').fill(JSON.stringify({ type: 'Polygon', coordinates: [[[-97.6, 40.88], [-97.59, 40.89], [-97.59, 40.88], [-97.6, 40.89], [-97.6, 40.88]]] }))
  await page.getByRole('button', { name: 'Use this outline' }).click()
  // The form's own message beside the field (the error toast says it too).
  await expect(page.getByRole('main').getByRole('alert')).toContainText('crosses itself')
  await page.getByLabel('GeoJSON text').fill(JSON.stringify({ type: 'Polygon', coordinates: [[[-97.6, 40.88], [-97.595, 40.88], [-97.595, 40.885], [-97.6, 40.885], [-97.6, 40.88]]] }))
  await page.getByRole('button', { name: 'Use this outline' }).click()
  await expect(page.getByRole('img', { name: 'Outline of Gravel Pit Corner, north up' })).toBeVisible()
  // A quarter of the 0.01° square at this latitude: 230.99 ÷ 4 ≈ 57.7 ac (computed with @turf/area in the API tests).
  await page.screenshot({ path: info.outputPath('field.png'), fullPage: true })
  await page.getByRole('button', { name: /Use 57\.\d ac as the field's acres/ }).click()
  await expect(page.getByRole('button', { name: /as the field's acres/ })).toHaveCount(0)
})

test('the foreman counts seed units but cannot edit lots; the unit weight shows', async ({ page }, info) => {
  await signIn(page, 'foreman')
  await page.goto('/seed-lots')
  const row = page.getByRole('row').filter({ hasText: 'ML-28-0417' })
  // 140,000 seeds at 2,800 seeds/lb = 50 lb (University of Missouri IPM, Wiebold 2008).
  await expect(row).toContainText('140,000 seeds')
  await expect(row).toContainText('50.0 lb')
  await page.screenshot({ path: info.outputPath('seed-lots.png'), fullPage: true })
  await expect(page.getByRole('button', { name: 'Add a lot' })).toHaveCount(0)
  await expect(page.getByRole('button', { name: /Edit lot/ })).toHaveCount(0)
  const units = page.getByLabel('Units on hand of lot ML-28-0417')
  await units.fill('176')
  // Wait for the save before reloading; a reload that races the PATCH reads the old count.
  const saved = page.waitForResponse((r) => r.url().includes('/api/seed-lots/') && r.request().method() === 'PATCH')
  await units.blur()
  await saved
  await page.reload()
  await expect(page.getByLabel('Units on hand of lot ML-28-0417')).toHaveValue('176')
})

test('the agronomist adds a soybean lot sold by weight, sees the unit in seeds, and deletes it', async ({ page }) => {
  await signIn(page, 'agronomist')
  await page.goto('/seed-lots')
  await page.getByRole('button', { name: 'Add a lot' }).click()
  const dialog = page.getByRole('dialog', { name: 'Add a seed lot' })
  await dialog.getByLabel('Crop').selectOption('soybeans')
  await dialog.getByLabel('Variety').fill('CF 2.6 Killdeer')
  await dialog.getByLabel('Lot number').fill('KD-26-0101')
  await dialog.getByLabel('Seeds per lb').fill('2750')
  await dialog.getByLabel('Germination').fill('92')
  await dialog.getByLabel('Sold by').selectOption('lb')
  await dialog.getByLabel('Unit size').fill('50')
  // 50 lb × 2,750 seeds/lb = 137,500 seeds (computed).
  await expect(dialog.getByText('One unit: 137,500 seeds, 50.0 lb')).toBeVisible()
  await dialog.getByRole('button', { name: 'Add lot' }).click()
  const row = page.getByRole('row').filter({ hasText: 'KD-26-0101' })
  await expect(row).toContainText('50 lb')
  await row.getByRole('button', { name: 'Delete lot KD-26-0101' }).click()
  await page.getByRole('dialog', { name: 'Delete this seed lot?' }).getByRole('button', { name: 'Delete' }).click()
  await expect(page.getByText('Lot KD-26-0101 deleted')).toBeVisible()
  await expect(page.getByRole('row').filter({ hasText: 'KD-26-0101' })).toHaveCount(0)
})
