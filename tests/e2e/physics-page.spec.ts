import { expect, test } from './fixtures'
import { expectAccessible } from './axe'
import { DEMO, expectEveryTraceDrawable, signIn } from './helpers'

test('a test driver runs a launch and a lift-off on the program physics page', async ({ page }) => {
  await signIn(page, DEMO.driver)
  await page.goto('/programs')
  const href = await page.getByRole('link', { name: 'BX-64 Tipper' }).first().getAttribute('href')
  await page.goto(`${href}/physics`)
  await expect(page.getByRole('heading', { name: 'Physics of BX-64 Tipper' })).toBeVisible()
  await expect(page.getByRole('note')).toContainText('closed course')
  await expect(page.getByTestId('traction-table').locator('tbody tr')).toHaveCount(10) // 5 surfaces × empty, laden

  await page.getByRole('combobox', { name: 'Surface', exact: true }).selectOption('wet-asphalt')
  await page.getByRole('button', { name: 'Run launch' }).click()
  const summary = page.getByTestId('simulation-summary')
  await expect(summary).toContainText(/Time to 30 km\/h\s*\d+\.\d\d s/)
  await expect(summary).toContainText('Peak jerk')
  await expect(page.getByTestId('simulation-plots').locator('.js-plotly-plot')).toHaveCount(6, { timeout: 30_000 })
  expect(await expectEveryTraceDrawable(page)).toEqual(expect.arrayContaining(['heatmap', 'scatter']))
  await expect(page.getByRole('button', { name: 'Propose a traction-safe draft' })).toHaveCount(0) // drivers do not edit

  await page.getByRole('combobox', { name: 'Map', exact: true }).selectOption({ label: 'Site regen (regen)' })
  await page.getByRole('combobox', { name: 'Surface', exact: true }).selectOption('ice')
  await expect(page).toHaveURL(/surface=ice/)
  await page.getByRole('button', { name: 'Run lift-off' }).click()
  await expect(summary).toContainText(/Drive axle locks\s*yes/)
  await expect(page.getByTestId('slip-heatmap')).not.toHaveAttribute('data-spin-count', '0', { timeout: 30_000 })
})

test.describe('on a phone', () => {
  test.use({ viewport: { width: 390, height: 844 }, isMobile: true })
  test('the physics page fits the screen, and each battery corner table that scrolls sideways is reachable by keyboard', async ({ page }) => {
    await signIn(page, DEMO.calib)
    await page.goto('/programs')
    const href = await page.getByRole('link', { name: 'BX-64 Tipper' }).first().getAttribute('href')
    await page.goto(`${href}/physics`)
    await expect(page.getByTestId('battery-corners')).toBeVisible()
    await expect(page.getByTestId('slip-heatmap').locator('.main-svg').first()).toBeVisible({ timeout: 30_000 })
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390)
    // A box that scrolls must take focus, or a keyboard user cannot scroll it (axe: scrollable-region-focusable).
    await expectAccessible(page, 'the physics page on a phone')
  })
})
