import { readFile } from 'node:fs/promises'
import { expect, test } from '@playwright/test'
import { PDFParse } from 'pdf-parse'
import { pngFixture, signIn } from './helpers'

test('the foreman downloads a setup sheet, marks the setup installed and inspects the planter with one item to fix', async ({ page }) => {
  await signIn(page, 'foreman')
  const panel = page.getByTestId('shop-panel')
  await expect(panel).toContainText('North 12: Wheel bearings repacked')
  // More acres planted since the chains were oiled than their 250 ac interval (invented demo seasons).
  await expect(panel).toContainText('North 12: Drive chains cleaned and oiled')
  await expect(panel).toContainText(/Drive chains cleaned and oiled\s*due\s*\d+ ac over/)
  await page.goto('/setups')
  await page.getByRole('table').getByRole('link', { name: 'North 12 · corn 34k · river bottoms' }).click()
  await expect(page.getByRole('heading', { name: 'North 12 · corn 34k · river bottoms' })).toBeVisible()

  const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Sheet (PDF)' }).click()])
  expect(download.suggestedFilename()).toBe('setup-sheet-north-12-corn-34k-river-bottoms-rev3.pdf')
  const parser = new PDFParse({ data: new Uint8Array(await readFile((await download.path())!)) })
  const { text } = await parser.getText()
  await parser.destroy()
  expect(text).toContain('CF-C30')
  expect(text).toContain('17/23 · 17/26')
  expect(text).toContain('Cottonwood Flats Farm')

  await page.getByRole('button', { name: 'Parts to pull' }).click()
  const dialog = page.getByRole('dialog', { name: 'Parts to pull for revision 3' })
  await expect(dialog.getByTestId('pick-list')).toContainText('Depth: 1.75 in → 2 in on rows 1, 2, 3')
  await dialog.getByRole('button', { name: 'Mark revision 3 installed' }).click()
  await expect(page.getByText('revision 3 is on the planter')).toBeVisible()

  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Shop' }).click()
  await page.getByLabel('Planter', { exact: true }).selectOption({ label: 'North 12' })
  await page.getByLabel('Checklist').selectOption({ label: 'Pre-season planter check' })
  await page.getByRole('button', { name: 'Start' }).click()
  await expect(page.getByRole('heading', { name: 'North 12: Pre-season planter check' })).toBeVisible()
  const items = page.locator('[data-item]')
  const n = await items.count()
  expect(n).toBe(13)
  for (let i = 1; i <= n; i++) {
    const item = page.locator(`[data-item="${i}"]`)
    const choice = item.getByRole('radio', { name: i === 3 ? 'Needs fixing' : 'OK' })
    await choice.click()
    await expect(choice).toHaveAttribute('aria-checked', 'true')
    if (i === 3) {
      await item.getByRole('textbox').fill('Drive tire at 24 psi; reseat the valve stem.')
      // Two photos from the phone's camera; the second is taken again by mistake and removed.
      const camera = item.getByLabel('Add photo to “Drive tire pressure”')
      await expect(camera).toHaveAttribute('capture', 'environment')
      await camera.setInputFiles({ name: 'valve-stem.png', mimeType: 'image/png', buffer: pngFixture([20, 120, 110]) })
      const first = item.getByRole('img', { name: 'Photo 1 of “Drive tire pressure”' })
      await expect(first).toBeVisible()
      await expect.poll(() => first.evaluate((img: HTMLImageElement) => img.naturalWidth)).toBe(8)
      await camera.setInputFiles({ name: 'again.png', mimeType: 'image/png', buffer: pngFixture([200, 200, 200]) })
      await expect(item.getByRole('img', { name: 'Photo 2 of “Drive tire pressure”' })).toBeVisible()
      await item.getByRole('button', { name: 'Remove photo 2 of “Drive tire pressure”' }).click()
      await expect(item.getByRole('img', { name: /Photo \d of “Drive tire pressure”/ })).toHaveCount(1)
    }
  }
  await page.reload()
  await expect(page.locator('[data-item="3"]').getByRole('img', { name: 'Photo 1 of “Drive tire pressure”' })).toBeVisible()
  await expect(page.getByTestId('progress')).toHaveText('13 of 13 checked')
  await page.getByRole('button', { name: 'Complete the inspection' }).click()
  await expect(page.getByTestId('completed')).toBeVisible()

  await page.getByRole('link', { name: 'See the work board' }).click()
  const todo = page.locator('[data-column="open"]')
  await expect(todo).toContainText('Drive: Drive tire pressure')
  await expect(todo).toContainText('Drive tire at 24 psi; reseat the valve stem.')
  const boardPhoto = todo.getByRole('img', { name: 'Photo 1 of “Drive: Drive tire pressure”' })
  await expect(boardPhoto).toBeVisible()
  await expect.poll(() => boardPhoto.evaluate((img: HTMLImageElement) => img.naturalWidth)).toBe(8)
})
