import { expect, test } from '@playwright/test'
import { LAST_SEASON, pngFixture, signIn } from './helpers'

// A phone held in the field.
test.use({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true })

test('an operator on a phone enters a stand count and a spacing run and sees the indices and the histogram', async ({ page }) => {
  await signIn(page, 'operator')
  await page.goto('/checks')
  await page.getByLabel('Setup on the planter').selectOption({ label: 'North 12 · corn 34k · river bottoms (North 12)' })
  await expect(page.getByTestId('check-context')).toContainText('30 in rows')
  const noSideScroll = async () => expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390)

  // Two counts over 1/1000 acre at 30 in (17.424 ft): 31 and 33 → 31,000 and 33,000, mean 32,000 (computed).
  const counts = page.getByRole('group', { name: 'Plants counted' })
  await expect(page.getByLabel('Length counted')).toHaveValue('17.424')
  for (const n of ['31', '33']) {
    for (const d of n) await counts.getByRole('button', { name: d, exact: true }).tap()
    await counts.getByRole('button', { name: 'Add count' }).tap()
  }
  await expect(page.getByTestId('stand-mean')).toHaveText('32,000 /ac')
  await noSideScroll()
  await page.getByRole('button', { name: 'Save stand count' }).tap()
  await expect(page.getByRole('heading', { name: /Stand count/ })).toBeVisible()
  await expect(page.getByTestId('stand-result')).toContainText('32,000 /ac')
  await expect(page.getByTestId('replant-aid')).toContainText('The agronomist decides')
  // A photo of the gap in the stand, added to the saved check from the phone's camera.
  await expect(page.getByTestId('photo-count')).toHaveText('(0)')
  await page.getByLabel('Add photos to this check').setInputFiles({ name: 'gap.png', mimeType: 'image/png', buffer: pngFixture([90, 140, 60]) })
  await expect(page.getByTestId('photo-count')).toHaveText('(1)')
  const photo = page.getByRole('img', { name: 'Photo 1 of the check' })
  await expect(photo).toBeVisible()
  await expect.poll(() => photo.evaluate((img: HTMLImageElement) => img.naturalWidth)).toBe(8)

  await page.goto('/checks')
  await page.getByLabel('Setup on the planter').selectOption({ label: 'North 12 · corn 34k · river bottoms (North 12)' })
  await page.getByRole('tab', { name: 'Spacing run' }).tap()
  await page.getByLabel('Theoretical spacing').fill('6')
  // xref 6 in: 2 and 3 are multiples, 12 and 9.5 misses (Kachman & Smith 1995; ISO 7256-1) → 20 %, 20 %, quality of feed 60 % (by hand).
  const pad = page.getByRole('group', { name: 'Spacing' })
  for (const v of ['5', '6', '7', '6', '6', '6', '2', '3', '12', '9.5']) {
    for (const d of v) await pad.getByRole('button', { name: d === '.' ? 'Decimal point' : d, exact: true }).tap()
    await pad.getByRole('button', { name: 'Add spacing' }).tap()
  }
  await expect(page.getByTestId('typed-spacings').getByRole('listitem')).toHaveCount(10)
  await expect(page.getByTestId('qfi')).toHaveText('60.0 %')
  await expect(page.getByTestId('multiples')).toHaveText('20.0 %')
  await expect(page.getByTestId('misses')).toHaveText('20.0 %')
  await expect(page.getByTestId('spacing-histogram').locator('canvas')).toBeVisible()
  await expect(page.getByTestId('histogram-summary')).toContainText('20.0 % at or below 0.5 ×, 20.0 % above 1.5 ×')
  await expect(page.getByTestId('corn-yield-effect')).toContainText('Nielsen 1991')
  await noSideScroll()
  await page.getByRole('button', { name: 'Save spacing run' }).tap()
  await expect(page.getByRole('heading', { name: /Spacing uniformity/ })).toBeVisible()
  await expect(page.getByTestId('qfi')).toHaveText('60.0 %')
  await expect(page.getByTestId('spacing-histogram').locator('canvas')).toBeVisible()
})

test('an operator reads a spacing CSV with junk lines and sees them by line number', async ({ page }) => {
  await signIn(page, 'operator')
  await page.goto('/checks')
  await page.getByRole('tab', { name: 'Spacing run' }).tap()
  await page.getByLabel('Theoretical spacing').fill('6')
  await page.getByLabel('Or read a CSV file of spacings').setInputFiles({ name: 'row6.csv', mimeType: 'text/csv', buffer: Buffer.from('spacing\n6.1\nabc\n5.9\n0\n6.2\n') })
  const report = page.getByTestId('csv-report')
  await expect(report).toContainText('3 spacings read from row6.csv')
  await expect(report).toContainText('Line 3: "abc" is not a number')
  await expect(report).toContainText('Line 5: A spacing must be more than 0')
  await expect(page.getByRole('button', { name: 'Save spacing run' })).toBeDisabled()
})

test('the agronomist reviews a stand count from the plan\'s page and weighs a replant', async ({ page }) => {
  await signIn(page, 'agronomist')
  // Last season's Schoolhouse 80, planted on revision 2 of the corn setup, carries the demo checks.
  await page.goto(`/plans?season=${LAST_SEASON}`)
  await page.getByRole('link', { name: /Schoolhouse 80/ }).first().click()
  const linked = page.getByTestId('linked-checks')
  await expect(linked.getByRole('listitem')).toHaveCount(3)
  await linked.getByRole('link', { name: 'Stand count · revision 2' }).click()
  // Six demo counts over 1/1000 acre: 31, 33, 30, 32, 29, 32 thousand → mean 31,167 (computed).
  await expect(page.getByTestId('stand-result')).toContainText('31,167 /ac')
  await expect(page.getByLabel('Stand found')).toHaveValue('31167')
  await expect(page.getByTestId('replant-advice')).toContainText('The agronomist decides')
  await page.getByLabel('Decision').selectOption({ label: 'Replant considered' })
  await page.getByLabel('Comment').fill('Even stand; keep it.')
  await page.getByRole('button', { name: 'Save review' }).click()
  await expect(page.getByTestId('review-status')).toContainText('Replant considered')
  await expect(page.getByTestId('review-status')).toContainText('Priya Okafor')
})

test('an operator saves a seed-drop check and reads the slip it implies and the corrected choice', async ({ page }) => {
  await signIn(page, 'operator')
  await page.goto('/checks')
  await page.getByLabel('Setup on the planter').selectOption({ label: 'North 12 · corn 34k · river bottoms (North 12)' })
  await page.getByRole('tab', { name: 'Seed drop' }).tap()
  await expect(page.getByLabel('Working safely during a seed check')).toContainText('Treated seed carries pesticide')
  await expect(page.getByLabel('Length of row')).toHaveValue('17.424')
  await page.getByLabel('Seeds (entry 1)').fill('33')
  // 33 seeds over 1/1000 acre → 33,000 seeds/acre against the setup's 34,033 → −3.0 % (computed).
  await expect(page.getByTestId('seed-drop-preview')).toContainText('33,000 /ac')
  await expect(page.getByTestId('seed-drop-preview')).toContainText('-3.0 %')
  await page.getByRole('button', { name: 'Save seed-drop check' }).tap()
  await expect(page.getByRole('heading', { name: /Seed-drop check/ })).toBeVisible()
  // (1 − 33,000 ÷ (34,033 ÷ 0.97)) × 100 = 5.95 % (meter formula, computed).
  await expect(page.getByTestId('implied-slip')).toHaveText('5.95 %')
  await expect(page.getByTestId('fix-choices').getByRole('listitem').first()).toBeVisible()
  await expect(page.getByTestId('seed-drop-result')).toContainText('The owner or the shop foreman can store this slip')
})
