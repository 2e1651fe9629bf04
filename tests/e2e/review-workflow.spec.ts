import { expect, test, type Browser, type Page } from '@playwright/test'
import { strFromU8, unzipSync } from 'fflate'
import { DEMO, editAndSave, openMapByName, signIn } from './helpers'

async function as(browser: Browser, email: string): Promise<Page> {
  const page = await (await browser.newContext()).newPage()
  await signIn(page, email)
  return page
}

/** The review page of revision `n` of a map, through the notebook's history table. */
async function openReview(page: Page, mapId: number, n: number) {
  await page.goto(`/maps/${mapId}`)
  await page.getByTestId(`history-row-${n}`).getByRole('link', { name: 'Review' }).click()
  await expect(page.getByRole('heading', { level: 1 })).toContainText(`r${n}`)
}

test('through three roles: submit, send back, resubmit, drive report, approve, release, package', async ({ browser }) => {
  test.setTimeout(180_000)
  const engineer = await as(browser, DEMO.calib)
  const mapId = await openMapByName(engineer, 'Road regen')
  const first = await editAndSave(engineer, mapId, 2, 6, '700', 'More lift-off regen at 15 km/h')
  await openReview(engineer, mapId, first)
  await engineer.getByRole('button', { name: 'Submit for review' }).click()
  await expect(engineer.getByTestId('revision-state')).toHaveText('Waiting for review')

  const lead = await as(browser, DEMO.lead)
  await lead.goto('/review')
  await lead.getByRole('link', { name: new RegExp(`Road regen r${first}$`) }).click()
  await lead.getByRole('button', { name: 'Send back' }).click()
  await expect(lead.getByRole('alert').filter({ hasText: 'needs a comment' })).toBeVisible()
  await lead.getByLabel('Comment (required to send back or withdraw)').fill('Too much at 15 km/h on gravel; halve the step')
  await lead.getByRole('button', { name: 'Send back' }).click()
  await expect(lead.getByTestId('revision-state')).toHaveText('Sent back')

  const second = await editAndSave(engineer, mapId, 2, 6, '600', 'Halved the lift-off step at 15 km/h, as asked')
  await openReview(engineer, mapId, second)
  await engineer.getByRole('button', { name: 'Submit for review' }).click()
  await expect(engineer.getByTestId('revision-state')).toHaveText('Waiting for review')

  const driver = await as(browser, DEMO.driver)
  await driver.goto(`/reports/new?map=${mapId}`)
  const option = driver.locator('#revision option', { hasText: new RegExp(`^r${second} `) })
  await expect(option).toHaveCount(1)
  await driver.getByLabel('Revision flashed').selectOption((await option.getAttribute('value'))!)
  await expect(driver.getByTestId('revision-checksum')).toBeVisible()
  await driver.getByLabel('Vehicle unit').fill('BX-T2')
  await driver.getByLabel('Route or course').fill('Demo test track, handling loop')
  await driver.getByLabel('Weather').fill('dry, cold')
  await driver.getByLabel('Ambient temperature (°C)').fill('3')
  for (const r of ['Launch', 'Tip-in', 'Steady pedal control', 'Lift-off regen', 'Brake blending']) await driver.getByLabel(`${r} 4`).check({ force: true })
  await driver.getByRole('button', { name: 'File report' }).click()
  await expect(driver.getByText('Report filed.')).toBeVisible()

  await lead.goto('/review')
  await lead.getByRole('link', { name: new RegExp(`Road regen r${second}$`) }).click()
  await expect(lead.getByTestId('gate-drive-report')).toHaveAttribute('data-met', 'true')
  await lead.getByRole('button', { name: 'Approve' }).click()
  await expect(lead.getByTestId('revision-state')).toHaveText('Approved')
  // Acknowledge any traction exception the gate lists, with a reason, then release.
  for (const ack of await lead.locator('input[id^="ack-"]').all()) await ack.fill('Closed-course running only for this build')
  await lead.getByRole('button', { name: 'Release to the vehicles' }).click()
  await expect(lead.getByTestId('revision-state')).toHaveText('Released')

  const href = await lead.getByTestId('package-link').getAttribute('href')
  const res = await lead.request.get(href!)
  expect(res.status()).toBe(200)
  const files = unzipSync(new Uint8Array(await res.body()))
  const manifest = JSON.parse(strFromU8(files['manifest.json']))
  expect(manifest).toMatchObject({ map: 'Road regen', revision: second })
  expect(res.headers()['x-revision-checksum']).toBe(manifest.checksum)
  const shown = await lead.locator('h1 + p .font-mono').textContent()
  expect(manifest.checksum.startsWith(shown!.trim())).toBe(true)
})
