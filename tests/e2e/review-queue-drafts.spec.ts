// The calibration engineer's own drafts in the review queue, submitted from there; the lead's
// send-back comment beside the revision on the engineer's overview; and the loading pages of the
// report, replay and review pages still answering 404 and 307 before anything streams.
import { expect, test } from './fixtures'
import { expectAccessible } from './axe'
import { DEMO, docShot, editAndSave, openMapByName, signedInPage, signIn } from './helpers'

test.use({ viewport: { width: 1440, height: 900 } })

test('an engineer submits a draft from the review queue, and reads the lead’s send-back comment on the overview', async ({ browser }) => {
  test.setTimeout(180_000)
  const engineer = await signedInPage(browser, DEMO.calib)
  const mapId = await openMapByName(engineer, 'Road regen')
  const n = await editAndSave(engineer, mapId, 2, 6, '650', 'Softer lift-off regen at 15 km/h')

  await engineer.goto('/review')
  const drafts = engineer.getByTestId('your-drafts')
  const row = drafts.getByRole('listitem').filter({ hasText: `Road regen r${n}` })
  await expect(row).toContainText('“Softer lift-off regen at 15 km/h”')
  await expectAccessible(engineer, 'the review queue with the engineer’s drafts')
  await drafts.screenshot({ path: docShot('review-queue-drafts.png') })
  const href = await row.getByRole('link').getAttribute('href')

  await row.getByRole('button', { name: /^Submit for review: .* Road regen r\d+$/ }).click()
  // The row moves to the waiting list; the status line says so and holds the focus the button had.
  const status = drafts.getByRole('status')
  await expect(status).toContainText(`Road regen r${n} for review`)
  await expect(status).toBeFocused()
  await expect(drafts.getByRole('listitem').filter({ hasText: `Road regen r${n}` })).toHaveCount(0)
  await expect(engineer.getByRole('link', { name: new RegExp(`Road regen r${n}$`) })).toHaveAttribute('href', href!)
  await expectAccessible(engineer, 'the review queue after a submit')

  const lead = await signedInPage(browser, DEMO.lead)
  await lead.goto(href!)
  await expect(lead.getByTestId('revision-state')).toHaveText('Waiting for review')
  await lead.getByLabel('Comment (required to send back)').fill('**Halve** the step at 15 km/h; see the gravel report')
  await lead.getByRole('button', { name: 'Send back' }).click()
  await expect(lead.getByTestId('revision-state')).toHaveText('Sent back')
  await lead.context().close()

  await engineer.goto('/')
  const back = engineer.getByTestId('waiting-returned').getByRole('listitem').filter({ hasText: `Road regen r${n}` })
  await expect(back).toContainText('sent back by')
  // Rendered as markdown, not shown raw.
  await expect(back.locator('strong')).toHaveText('Halve')
  await expect(back).not.toContainText('**')
  await expectAccessible(engineer, 'the engineer’s overview with a sent-back comment')
  await engineer.getByTestId('waiting-returned').screenshot({ path: docShot('overview-sent-back.png') })
  await engineer.context().close()
})

test('the report, replay and review pages decide 404 and sign-in before their loading text', async ({ page }) => {
  await signIn(page, DEMO.driver)
  for (const path of ['/reports/2147483647', '/reports/2147483647/replay', '/review/2147483647', '/reports/abc/replay']) {
    const res = await page.goto(path)
    expect(res?.status(), path).toBe(404)
    await expect(page.getByRole('heading', { name: 'Page not found' })).toBeVisible()
    await expect(page.getByRole('status').filter({ hasText: /^Loading / })).toHaveCount(0)
  }
  // A driver may not open the queue: a real redirect, not a streamed one.
  const queue = await page.request.get('/review', { maxRedirects: 0 })
  expect(queue.status()).toBe(307)
  expect(queue.headers().location).toContain('/not-allowed')
  // Signed out, each asks for sign-in with a real redirect too.
  await page.context().clearCookies()
  for (const path of ['/reports/1', '/reports/1/replay', '/review/1', '/review']) {
    const res = await page.request.get(path, { maxRedirects: 0 })
    expect(res.status(), path).toBe(307)
    expect(res.headers().location, path).toContain('/signin')
  }
})

test('a lead opens a report, its replay and a review page, each complete after its loading text', async ({ page }) => {
  test.setTimeout(120_000)
  await signIn(page, DEMO.lead)
  await page.goto('/reports')
  await page.locator('[data-testid^="report-row-"]').first().getByRole('link', { name: 'Open' }).click()
  await expect(page).toHaveURL(/\/reports\/\d+$/)
  await expect(page.getByRole('heading', { name: 'Discussion' })).toBeVisible()
  await expectAccessible(page, 'a drive report')
  await page.getByRole('link', { name: 'Replay this drive through another set' }).click()
  await expect(page).toHaveURL(/\/reports\/\d+\/replay/)
  await expect(page.getByRole('heading', { level: 1 })).toBeVisible()
  await expect(page.getByRole('status').filter({ hasText: /^Loading / })).toHaveCount(0, { timeout: 30_000 })
  await expectAccessible(page, 'a replay')
  await page.goto('/review')
  await expect(page.getByTestId('your-drafts')).toBeVisible()
  await page.locator('[data-testid^="queue-"]').first().getByRole('link').click()
  await expect(page.getByTestId('revision-state')).toBeVisible()
  await expectAccessible(page, 'a review page')
})
