import fs from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { expect, test } from './fixtures'
import { generateLog } from '../support/log-generator'
import { DEMO, fillDriveConditions, openMapByName, signIn } from './helpers'

test.use({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true })

test('a test driver on a phone files a report on a set with a flagged point and a log, sees the progress and the plots', async ({ page }) => {
  test.setTimeout(150_000)
  await signIn(page, DEMO.driver)
  const mapId = await openMapByName(page, 'Site drive')
  await page.getByRole('link', { name: 'File a drive report' }).click()
  await expect(page).toHaveURL(new RegExp(`/reports/new\\?map=${mapId}$`))
  // The map's page names its program; the driver picks the set the truck was flashed with and compares the checksums.
  await page.getByLabel('Set flashed').selectOption({ index: 1 })
  await expect(page.getByTestId('set-summary')).toContainText('Drive map: Site drive r')
  await expect(page.getByTestId('set-summary')).toContainText('checksum')
  await fillDriveConditions(page)
  // Tap the map cell where the truck spun, and say what happened.
  await page.getByRole('button', { name: 'Flag 60 % pedal at 3 km/h' }).tap()
  await page.getByLabel('What happened').fill('tandem spun on the ramp, empty')
  await page.getByLabel('Severity').selectOption('3')
  await expect(page.getByLabel('Map', { exact: true })).toHaveValue('drive')
  // The form fits the phone: no sideways scroll of the page itself.
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390)
  await page.getByRole('button', { name: 'File report' }).click()
  await expect(page.getByText('Report filed.')).toBeVisible()
  await expect(page.getByText('tandem spun on the ramp, empty')).toBeVisible()
  // The report names its set, both its revisions and the parameter version.
  await expect(page.getByRole('link', { name: /^Set \d+$/ })).toBeVisible()
  await expect(page.getByTestId('report-set')).toContainText('Site drive r')
  await expect(page.getByTestId('report-set')).toContainText('Parameters')

  const file = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'mw-log-')), 'shift-log.csv')
  fs.writeFileSync(file, generateLog({ seed: 5, durationS: 300, rateHz: 50 }).csv)
  await page.getByLabel('Attach the vehicle’s data log (CSV, up to 200 MB)').setInputFiles(file)
  await expect(page.getByTestId('log-status')).toHaveText('done', { timeout: 60_000 })
  await expect(page.getByTestId('log-summary')).toBeVisible()
  expect(Number(await page.getByTestId('spin-count').textContent())).toBeGreaterThan(0)
  await expect(page.locator('.js-plotly-plot').first()).toBeVisible({ timeout: 30_000 })
  await expect(page.getByTestId('occupancy-grid')).toBeVisible()
  await expect(page.getByTestId('analysis-basis')).toContainText('Analysed against set')
})

test('a malformed log is refused with the line and column, and the report keeps its data', async ({ page }) => {
  await signIn(page, DEMO.driver)
  await page.goto('/reports')
  // A report of this driver's own (the demo data has one): only the filing driver may attach logs.
  await page.locator('[data-testid^="report-row-"]', { hasText: 'Dara Driver' }).first().getByRole('link', { name: 'Open' }).click()
  const file = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'mw-log-')), 'bad.csv')
  fs.writeFileSync(file, 'time_s,road_speed_kmh,wheel_speed_kmh,accel_pedal_pct\n0,0,0,0\n0.02,abc,0.1,5\n')
  await page.getByLabel('Attach the vehicle’s data log (CSV, up to 200 MB)').setInputFiles(file)
  await expect(page.getByRole('alert').filter({ hasText: /line 3, column 2/ })).toBeVisible({ timeout: 30_000 })
  await expect(page.getByText('Flagged points')).toBeVisible()
})
