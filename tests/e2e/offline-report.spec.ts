import { expect, test } from './fixtures'
import type { Page } from '@playwright/test'
import { DEMO, openMapByName, signIn } from './helpers'

/** Open a new report from the demo's site drive map (its program), pick a set and fill what the form requires. */
async function fillReport(page: Page, route: string) {
  await openMapByName(page, 'Site drive')
  await page.getByRole('link', { name: 'File a drive report' }).click()
  await page.getByLabel('Set flashed').selectOption({ index: 1 })
  await page.getByLabel('Vehicle unit').fill('BX-09')
  await page.getByLabel('Route or course').fill(route)
  await page.getByLabel('Weather').fill('fog')
  await page.getByLabel('Ambient temperature (°C)').fill('3')
  for (const r of ['Launch', 'Tip-in', 'Steady pedal control', 'Lift-off regen', 'Brake blending']) await page.getByLabel(`${r} 3`).check({ force: true })
}

const myReports = async (page: Page) => (await (await page.request.get('/api/reports?mine=1')).json()).reports as { id: number; route: string }[]

test('offline: the report form says it was not sent, keeps the draft, and files it once back online', async ({ page, context }) => {
  await signIn(page, DEMO.driver)
  const route = `Offline ramp ${Date.now()}`
  await fillReport(page, route)
  await context.setOffline(true)
  await expect(page.getByText('You are offline. Keep writing')).toBeVisible()
  await page.getByRole('button', { name: 'File report' }).click()
  await expect(page.getByTestId('send-state')).toContainText('You are offline, so the report was not sent')
  await expect(page.getByLabel('Route or course')).toHaveValue(route)
  await context.setOffline(false)
  await page.getByRole('button', { name: 'File report' }).click()
  await expect(page.getByText('Report filed.')).toBeVisible()
  expect((await myReports(page)).filter((r) => r.route === route)).toHaveLength(1)
})

test('an answer lost on the way back: the form is unsure, and sending again files one report', async ({ page }) => {
  await signIn(page, DEMO.driver)
  const route = `Lost answer ramp ${Date.now()}`
  await fillReport(page, route)
  // The request reaches the server (the report is filed), then the connection drops before the answer.
  await page.route('**/api/reports', async (r) => {
    if (r.request().method() !== 'POST') return r.continue()
    await r.fetch()
    await r.abort('connectionreset')
  })
  await page.getByRole('button', { name: 'File report' }).click()
  await expect(page.getByTestId('send-state')).toContainText('not known whether the report arrived')
  expect((await myReports(page)).filter((r) => r.route === route)).toHaveLength(1)

  // A reload restores the draft with its id; filing again leads to the first report.
  await page.unroute('**/api/reports')
  await page.reload()
  await expect(page.getByText(/Restored your unsent report/)).toBeVisible()
  await page.getByRole('button', { name: 'File report' }).click()
  await expect(page.getByText('Report filed.')).toBeVisible()
  const mine = (await myReports(page)).filter((r) => r.route === route)
  expect(mine).toHaveLength(1)
  await expect(page).toHaveURL(new RegExp(`/reports/${mine[0].id}`))
})
