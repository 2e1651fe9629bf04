// The test driver's walk on a phone (390 × 844): from the overview's "Drive this set" to a filed report,
// a log whose columns carry other names mapped from its own header, a failed log read again with
// corrected columns and removed, every table on screen, and an answer on a report a lead has read.
// Each page gets the accessibility scan and must not scroll sideways.
import fs from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { expect, test } from './fixtures'
import type { Page } from '@playwright/test'
import { generateLog } from '../support/log-generator'
import { expectAccessible } from './axe'
import { DEMO, docShot, fileReportFromOverview, mapIdByName, signIn, signedInPage } from './helpers'

test.use({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true })

/** The page is no wider than the phone, and axe finds no critical or serious violation. */
async function checkPage(page: Page, what: string) {
  expect(await page.evaluate(() => document.documentElement.scrollWidth), `${what}: page width`).toBeLessThanOrEqual(390)
  await expectAccessible(page, what)
}

/** The file's own header names (invented, as a logger might name them), in the generator's column order. */
const THEIRS = ['t', 'VehSpd', 'WhlSpdL', 'WhlSpdR', 'AccPed', 'BrkPed', 'MotTrq', 'MotSpd', 'BatI', 'BatU']

function logFile(name: string): string {
  const file = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'mw-driver-')), name)
  fs.writeFileSync(file, generateLog({ seed: 5, durationS: 60, rateHz: 20, header: THEIRS }).csv)
  return file
}

test('"Drive this set" on the overview opens the report form with that set chosen; a severity label stays whole', async ({ page }) => {
  await signIn(page, DEMO.driver)
  await checkPage(page, 'the driver’s overview')
  const drive = page.getByRole('link', { name: /^Drive this set: / }).first()
  await expect(drive).toBeInViewport()
  const setNumber = ((await drive.getAttribute('aria-label')) ?? '').split('Set ')[1]
  await drive.tap()
  await expect(page).toHaveURL(/\/reports\/new\?set=\d+$/)
  await expect(page.getByTestId('set-summary')).toContainText(`set ${setNumber}`)
  await page.getByRole('button', { name: 'Add a flag by hand' }).click()
  const severity = page.getByLabel('Severity')
  await severity.selectOption('4')
  // The chosen option's text fits its box (less the arrow): measured with the select's own font.
  const fits = await severity.evaluate((el) => {
    const s = el as HTMLSelectElement
    const probe = document.createElement('span')
    probe.style.font = getComputedStyle(s).font
    probe.style.whiteSpace = 'nowrap'
    probe.textContent = s.options[s.selectedIndex].text
    document.body.append(probe)
    const w = probe.getBoundingClientRect().width
    probe.remove()
    return { text: w, box: s.clientWidth - 32 }
  })
  expect(fits.text).toBeLessThanOrEqual(fits.box)
  await checkPage(page, 'the report form with a set chosen')
})

test('a log with other column names is mapped from its own header; a failed log is read again with corrected columns and removed', async ({ page }) => {
  test.setTimeout(150_000)
  await signIn(page, DEMO.driver)
  const reportId = await fileReportFromOverview(page)
  await checkPage(page, 'a filed report')

  // Picking the file reads its first line on the phone and asks which column is which.
  await page.getByLabel('Attach the vehicle’s data log (CSV, up to 200 MB)').setInputFiles(logFile('theirs.csv'))
  const form = page.getByRole('form', { name: 'Columns of theirs.csv' })
  await expect(form).toBeVisible()
  await expect(form.getByText('(required)', { exact: true })).toHaveCount(3)
  await checkPage(page, 'the column mapping form')
  await form.screenshot({ path: docShot('driver-column-mapping.png') })
  // Sending it short of a required column says what is missing and sends nothing.
  await form.getByRole('button', { name: 'Upload with these columns' }).click()
  await expect(form.getByRole('alert')).toContainText('Time is required')
  const pick = async (label: string, header: string) => form.getByLabel(label, { exact: true }).selectOption(header)
  await pick('Time (required)', 't')
  await pick('Road speed (non-driven axle or satellite) (required)', 'VehSpd')
  await pick('Accelerator pedal (required)', 'AccPed')
  await pick('Left drive wheel speed (one wheel speed required)', 'WhlSpdL')
  await pick('Right drive wheel speed (one wheel speed required)', 'WhlSpdR')
  await form.getByRole('button', { name: 'Upload with these columns' }).click()
  const first = page.getByTestId(/^log-\d+$/).filter({ hasText: 'theirs.csv' })
  await expect(first.getByTestId('log-status')).toHaveText('done', { timeout: 60_000 })
  // About 60 kB: shown in kB, not as "0.1 MB".
  await expect(first).toContainText(/theirs\.csv · \d+\.\d kB/)

  // A log sent with a wrong mapping (as an older page could) fails, naming the header it could not find …
  const status = await page.evaluate(async ({ id, csv }) => {
    const q = new URLSearchParams({ name: 'wrong.csv', mapping: JSON.stringify({ time_s: 'Zeit' }) })
    return (await fetch(`/api/reports/${id}/logs?${q}`, { method: 'POST', headers: { 'content-type': 'text/csv' }, body: csv })).status
  }, { id: reportId, csv: fs.readFileSync(logFile('wrong.csv'), 'utf8') })
  expect(status).toBe(201)
  await page.reload()
  const wrong = page.getByTestId(/^log-\d+$/).filter({ hasText: 'wrong.csv' })
  await expect(wrong.getByTestId('log-status')).toHaveText('failed', { timeout: 60_000 })
  await expect(wrong.getByRole('alert')).toContainText('"Zeit", which is not in the header')
  // … and is mapped again from the stored file's header, keeping what still fits.
  await wrong.getByRole('button', { name: 'Map the columns again' }).click()
  const again = wrong.getByRole('form', { name: 'Columns of wrong.csv' })
  await expect(again).toBeVisible()
  await checkPage(page, 'mapping a failed log again')
  for (const [label, header] of [['Time (required)', 't'], ['Road speed (non-driven axle or satellite) (required)', 'VehSpd'], ['Accelerator pedal (required)', 'AccPed'], ['Drive-wheel speed (one value for the axle) (one wheel speed required)', 'WhlSpdL']])
    await again.getByLabel(label, { exact: true }).selectOption(header)
  await again.getByRole('button', { name: 'Analyse again with these columns' }).click()
  await expect(wrong.getByTestId('log-status')).toHaveText('done', { timeout: 60_000 })

  // Removed, after a confirmation.
  page.once('dialog', (d) => void d.accept())
  await wrong.getByRole('button', { name: 'Remove this log' }).click()
  await expect(page.getByTestId(/^log-\d+$/).filter({ hasText: 'wrong.csv' })).toHaveCount(0)
  await checkPage(page, 'the report with its log analysed')
})

test('every table and list fits the phone: reports list, measured against predicted, the log plot, the compare page', async ({ page }) => {
  test.setTimeout(120_000)
  await signIn(page, DEMO.driver)
  await page.goto('/reports')
  const rows = page.locator('[data-testid^="report-row-"]')
  await expect(rows.first()).toBeVisible()
  // Each row's Open link is within the screen's width (no sideways scroll inside the table to reach it).
  for (let i = 0; i < (await rows.count()); i++) {
    const open = await rows.nth(i).getByRole('link', { name: 'Open' }).boundingBox()
    expect(open && open.x >= 0 && open.x + open.width <= 390, `Open link of row ${i}`).toBe(true)
  }
  await checkPage(page, 'the reports list')
  await page.screenshot({ path: docShot('driver-reports-phone.png') })

  // The demo report with a log on a released set: the prediction, one block per event, and the plot.
  await rows.filter({ hasText: 'Dara Driver' }).filter({ has: page.getByText(/Site drive r2/) }).first().getByRole('link', { name: 'Open' }).click()
  await expect(page.getByTestId('prediction-list')).toBeVisible({ timeout: 30_000 })
  const list = await page.getByTestId('prediction-list').boundingBox()
  expect((list?.x ?? 0) + (list?.width ?? 999)).toBeLessThanOrEqual(390)
  const plot = page.locator('.js-plotly-plot').first()
  await expect(plot.locator('.legend')).toBeVisible({ timeout: 30_000 })
  const [legend, title] = await Promise.all([plot.locator('.legend').boundingBox(), plot.locator('.g-xtitle').first().boundingBox()])
  // The legend is clear of the time axis title.
  expect(legend && title && (legend.y + legend.height <= title.y || title.y + title.height <= legend.y)).toBe(true)
  expect((legend?.x ?? 0) + (legend?.width ?? 999)).toBeLessThanOrEqual(390)
  await checkPage(page, 'a report with an analysed log')

  const site = await mapIdByName(page, 'Site drive')
  await page.goto(`/maps/compare?a=${site}:2&b=${site}:3`)
  await expect(page.getByRole('heading', { name: 'Compare two revisions' })).toBeVisible()
  await expect(page.locator('[data-testid="compare-surfaces"] .js-plotly-plot')).toHaveCount(2, { timeout: 30_000 })
  await checkPage(page, 'the compare page')
})

test('the driver answers a lead’s question on their report after the lead has read it', async ({ page, browser }) => {
  test.setTimeout(120_000)
  await signIn(page, DEMO.driver)
  const reportId = await fileReportFromOverview(page)
  const lead = await signedInPage(browser, DEMO.lead)
  await lead.goto(`/reports/${reportId}`)
  await lead.getByRole('button', { name: 'Mark as read' }).click()
  await expect(lead.getByText(/^Read by a lead engineer on/)).toBeVisible()
  await lead.getByLabel('Comment on this report').fill('Was the spin on the ramp or on the flat?')
  await lead.getByRole('button', { name: 'Comment' }).click()
  await expect(lead.getByText('Was the spin on the ramp or on the flat?')).toBeVisible()
  await lead.context().close()

  await page.reload()
  await expect(page.getByText('Was the spin on the ramp or on the flat?')).toBeVisible()
  await expect(page.getByRole('link', { name: 'Edit' })).toHaveCount(0)
  await page.getByLabel('Answer on this report').fill('On the ramp, first gear pull-away')
  await page.getByRole('button', { name: 'Answer', exact: true }).click()
  await expect(page.getByText('On the ramp, first gear pull-away')).toBeVisible()
  await checkPage(page, 'a read report with the driver’s answer')
})
