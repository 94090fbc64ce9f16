import { expect, test } from '@playwright/test'
import { signIn, signOut } from './helpers'

test('the agronomist sets a target, the operator proposes a setup, the agronomist approves and the operator sees the approval', async ({ page }) => {
  await signIn(page, 'agronomist')
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Plans' }).click()
  await expect(page).toHaveURL(/\/plans/)
  await page.getByTestId('column-draft').getByRole('link', { name: /Creek Bottom South/ }).click()
  await expect(page.getByRole('heading', { name: 'Creek Bottom South · corn' })).toBeVisible()
  const planUrl = page.url()

  await page.getByRole('button', { name: 'Change the plan' }).click()
  const dialog = page.getByRole('dialog', { name: 'Change the plan' })
  await dialog.getByLabel('Target final stand').fill('30400')
  // Lot PD-2604-C germinates 94 %, survival 95 %: 30,400 ÷ (0.94 × 0.95) = 34,042.6 seeds/acre.
  await expect(dialog.getByTestId('plan-preview')).toContainText('34,043 seeds/ac')
  await dialog.getByRole('button', { name: 'Save the plan' }).click()
  await expect(page.getByTestId('plan-target')).toHaveText('30,400 plants/ac')
  await expect(page.getByTestId('plan-rate')).toHaveText('34,043 seeds/ac')
  await expect(page.getByTestId('plan-review')).toHaveCount(0)
  await signOut(page)

  await signIn(page, 'operator')
  await page.goto(planUrl)
  const review = page.getByTestId('plan-review')
  await expect(review.getByRole('button', { name: 'Propose this setup' })).toBeDisabled()
  const setupSelect = review.getByLabel('Setup to propose')
  const option = await setupSelect.locator('option', { hasText: 'North 12 · corn 34k' }).getAttribute('value')
  await setupSelect.selectOption(option!)
  await review.getByLabel(/^Comment/).fill('The shop setup, checked on the bench.')
  await review.getByRole('button', { name: 'Propose this setup' }).click()
  await expect(page.getByTestId('plan-status')).toHaveText('Waiting for review')
  await expect(page.getByTestId('plan-review')).toHaveCount(0)
  await signOut(page)

  await signIn(page, 'agronomist')
  await page.goto(planUrl)
  await expect(page.getByTestId('plan-setup-revisions')).toContainText('Revision 3')
  await page.getByRole('button', { name: 'Approve' }).click()
  await expect(page.getByTestId('plan-status')).toHaveText('Approved')
  await signOut(page)

  await signIn(page, 'operator')
  await expect(page.getByTestId('plans-panel')).toContainText('Creek Bottom South')
  await page.getByTestId('plans-panel').getByRole('link', { name: /Creek Bottom South/ }).click()
  await expect(page.getByTestId('plan-status')).toHaveText('Approved')
  await expect(page.getByText(/approved by Priya Okafor \(setup revision 3\)/)).toBeVisible()
  await expect(page.getByTestId('timeline')).toContainText('Waiting for review → Approved')
  await expect(page.getByTestId('plan-review').getByRole('button', { name: 'Mark the planter set' })).toBeVisible()
})

test('the owner reads the season: seed short of plan is flagged and the seed order downloads', async ({ page }) => {
  await signIn(page, 'owner')
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Season' }).click()
  await expect(page.getByRole('heading', { name: /^Season \d{4}$/ })).toBeVisible()
  await expect(page.getByTestId('season-totals')).toContainText('11 plans')
  // Sand Knob: 28,000 ÷ (0.92 × 0.95) × 72.3 ac × 1.05 = 2,432,000 seeds → 31 units; 12 on hand.
  await expect(page.getByTestId('season-lots')).toContainText('19 short')
  await expect(page.getByTestId('planter-boards')).toContainText('North 12')
  const download = page.waitForEvent('download')
  await page.getByTestId('seed-order-csv').click()
  expect((await download).suggestedFilename()).toMatch(/^seed-order-\d{4}\.csv$/)
})
