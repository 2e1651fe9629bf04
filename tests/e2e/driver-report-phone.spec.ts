// A test driver on a phone (390 × 844) reads their report: the slip events as one block per event
// (no sideways scroll), and answers in a labelled multi-line box that keeps the text when the send fails.
import { expect, test } from './fixtures'
import type { Page } from '@playwright/test'
import { expectAccessible } from './axe'
import { DEMO, docShot, signIn } from './helpers'

test.use({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true })

/** The page is no wider than the phone, and axe finds no critical or serious violation. */
async function checkPage(page: Page, what: string) {
  expect(await page.evaluate(() => document.documentElement.scrollWidth), `${what}: page width`).toBeLessThanOrEqual(390)
  expect(await page.evaluate(() => document.body.scrollWidth), `${what}: body width`).toBeLessThanOrEqual(390)
  await expectAccessible(page, what)
}

/** The demo report with an analysed log on a released set (Dara Driver's, on Site drive r2). */
async function openDemoReport(page: Page) {
  await page.goto('/reports')
  const rows = page.locator('[data-testid^="report-row-"]')
  await rows.filter({ hasText: 'Dara Driver' }).filter({ has: page.getByText(/Site drive r2/) }).first().getByRole('link', { name: 'Open' }).click()
  await expect(page).toHaveURL(/\/reports\/\d+$/)
}

test('the slip events of a log fit the phone, one block per event', async ({ page }) => {
  test.setTimeout(90_000)
  await signIn(page, DEMO.driver)
  await openDemoReport(page)
  const list = page.getByTestId('event-list')
  await expect(list).toBeVisible({ timeout: 30_000 })
  await expect(page.getByTestId('event-table')).toBeHidden()
  const blocks = list.getByRole('listitem')
  expect(await blocks.count()).toBeGreaterThan(0)
  await expect(blocks.first()).toContainText(/^(Wheel spin|Lock-up) at \d+\.\d s/)
  await expect(blocks.first()).toContainText('km/h')
  for (let i = 0; i < Math.min(await blocks.count(), 10); i++) {
    const box = await blocks.nth(i).boundingBox()
    expect(box && box.x >= 0 && box.x + box.width <= 390, `event block ${i}`).toBe(true)
  }
  await checkPage(page, 'a report with slip events on a phone')
  await list.screenshot({ path: docShot('driver-events-phone.png') })
})

test('the driver’s answer is a labelled multi-line box that keeps its text when the send fails', async ({ page }) => {
  test.setTimeout(90_000)
  await signIn(page, DEMO.driver)
  await openDemoReport(page)
  const box = page.getByLabel('Answer on this report')
  await expect(box).toBeVisible()
  expect(await box.evaluate((el) => el.tagName)).toBe('TEXTAREA')
  const answer = 'On the ramp, first gear pull-away.\nThe trailer was empty; the spin stopped at 8 km/h.'
  await box.fill(answer)

  // The network drops once: the error is said, and nothing typed is lost.
  await page.route('**/api/reports/*/comments', (route) => (route.request().method() === 'POST' ? route.abort('failed') : route.continue()))
  await page.getByRole('button', { name: 'Answer', exact: true }).click()
  await expect(page.getByRole('alert').filter({ hasText: /connection|offline/i })).toBeVisible()
  await expect(box).toHaveValue(answer)
  await checkPage(page, 'a report after a failed answer')

  await page.unroute('**/api/reports/*/comments')
  await page.getByRole('button', { name: 'Answer', exact: true }).click()
  await expect(page.getByText('The trailer was empty; the spin stopped at 8 km/h.')).toBeVisible()
  await expect(box).toHaveValue('')
  await checkPage(page, 'a report with the driver’s answer')
  await page.locator('section').filter({ has: page.getByRole('heading', { name: 'Discussion' }) }).screenshot({ path: docShot('driver-answer-phone.png') })
})
