import { expect, test } from './fixtures'
import type { Page } from '@playwright/test'
import { DEMO, openMapByName, signIn } from './helpers'
import { expectAccessible } from './axe'

/** The demo tipper program's id, from the programs list. */
async function tipperProgram(page: Page): Promise<number> {
  await page.goto('/programs')
  const href = await page.getByRole('link', { name: /Tipper/ }).first().getAttribute('href')
  return Number(href?.split('/')[2])
}

/** Save new ramp limits with every tip-in rate set to `rate` (N·m/s); returns the new version's number. */
async function saveTipIn(page: Page, programId: number, rate: string, reason: string): Promise<number> {
  await page.goto(`/programs/${programId}/ramps`)
  await expectAccessible(page, 'the ramp limits page')
  const inputs = page.getByLabel(/^Tip-in, row \d+$/)
  for (let i = 0; i < (await inputs.count()); i++) await inputs.nth(i).fill(rate)
  await page.getByLabel('Reason for this change').fill(reason)
  await page.getByRole('button', { name: 'Save as a new ramp version' }).click()
  await expect(page.getByRole('status')).toContainText(/Saved as ramp version \d+/)
  return Number((await page.getByRole('status').textContent())?.match(/ramp version (\d+)/)?.[1])
}

/** A set of the program's latest site drive and regen revisions with its latest ramps (made through the API); returns its id. */
async function setWithLatestRamps(page: Page, programId: number): Promise<number> {
  const sets = (await (await page.request.get(`/api/sets?programId=${programId}`)).json()).sets as { driveRevisionId: number; regenRevisionId: number }[]
  const res = await page.request.post('/api/sets', { data: { driveRevisionId: sets[0].driveRevisionId, regenRevisionId: sets[0].regenRevisionId } })
  expect([200, 201]).toContain(res.status())
  return (await res.json()).set.id
}

test('an engineer sharpens the tip-in ramp, sees tip-in break the jerk limit, softens it and sees it pass', async ({ page }) => {
  test.setTimeout(180_000)
  await signIn(page, DEMO.calib)
  const programId = await tipperProgram(page)
  const v = await saveTipIn(page, programId, '60000', 'Try a sharp tip-in')
  const sharp = await setWithLatestRamps(page, programId)
  await page.goto(`/sets/${sharp}/drivability`)
  await expect(page.getByRole('heading', { name: /Drivability of set/ })).toBeVisible()
  await expect(page.getByText(`torque ramp limits v${v}`)).toBeVisible()
  const tipInRows = page.locator('[data-testid^="row-tip-in-"]')
  await expect(tipInRows.first()).toBeVisible()
  await expect(tipInRows.filter({ hasText: 'fails: jerk' }).first()).toBeVisible()
  await expect(page.getByTestId('drivability-plots')).toBeVisible()
  await expectAccessible(page, 'the drivability page')

  // The start grade the program declares shows as a band under the full-pedal row in the editor.
  await page.goto(`/maps/${await openMapByName(page, 'Site drive')}/edit`)
  await expect(page.getByTestId('grade-band')).toContainText('climb 12 % laden')

  await saveTipIn(page, programId, '1500', 'Soften the tip-in for comfort')
  const soft = await setWithLatestRamps(page, programId)
  await page.goto(`/sets/${soft}/drivability`)
  await expect(tipInRows.first()).toBeVisible()
  await expect(tipInRows.filter({ hasText: 'jerk' })).toHaveCount(0)
})

test('a lead replays a report’s log through a candidate set', async ({ page }) => {
  test.setTimeout(120_000)
  await signIn(page, DEMO.lead)
  // A demo report with an analysed log (the demo workflow files some).
  const reports = (await (await page.request.get('/api/reports')).json()).reports as { id: number }[]
  let reportId = 0
  for (const r of reports) {
    const logs = (await (await page.request.get(`/api/reports/${r.id}/logs`)).json()).logs as { status: string }[]
    if (logs.some((l) => l.status === 'done')) { reportId = r.id; break }
  }
  expect(reportId).toBeGreaterThan(0)
  await page.goto(`/reports/${reportId}`)
  await page.getByRole('link', { name: 'Replay this drive through another set' }).click()
  await expect(page).toHaveURL(new RegExp(`/reports/${reportId}/replay`))
  const options = await page.getByLabel('Candidate set').locator('option').allTextContents()
  const candidate = options.findIndex((o) => !o.includes('(driven)'))
  await page.getByLabel('Candidate set').selectOption({ index: candidate >= 0 ? candidate : 0 })
  await page.getByRole('button', { name: 'Replay' }).click()
  await expect(page.getByTestId('replay-summary')).toContainText('samples')
  await expect(page.getByTestId('replay-more')).toContainText('Asks for more than was driven')
  await expect(page.getByTestId('replay-plots')).toBeVisible()
  await expectAccessible(page, 'the replay page')
})

test.describe('on a phone', () => {
  test.use({ viewport: { width: 390, height: 844 }, isMobile: true })
  test('the ramp limits page fits the screen (its table scrolls in its own box) and passes axe', async ({ page }) => {
    await signIn(page, DEMO.calib)
    await page.goto(`/programs/${await tipperProgram(page)}/ramps`)
    await expect(page.getByRole('button', { name: 'Save as a new ramp version' })).toBeVisible()
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390)
    await expectAccessible(page, 'the ramp limits page on a phone')
  })
})
