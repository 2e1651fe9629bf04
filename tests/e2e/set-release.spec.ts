import { createHash } from 'node:crypto'
import { expect, test } from './fixtures'
import type { Page } from '@playwright/test'
import { strFromU8, unzipSync } from 'fflate'
import { DEMO, editAndSave, fillDriveConditions, openMapByName, openReview, signedInPage, signIn } from './helpers'

const sha256 = (b: Uint8Array) => createHash('sha256').update(b).digest('hex')

/** Save a new revision of a demo map, submit it, and return its revision row id (from the review page's URL). */
async function savedAndSubmitted(engineer: Page, name: string, row: number, col: number, value: string, message: string) {
  const mapId = await openMapByName(engineer, name)
  const n = await editAndSave(engineer, mapId, row, col, value, message)
  await openReview(engineer, mapId, n)
  await engineer.getByRole('button', { name: 'Submit for review' }).click()
  await expect(engineer.getByTestId('revision-state')).toHaveText('Waiting for review')
  return { n, revisionId: Number(new URL(engineer.url()).pathname.split('/')[2]) }
}

test('a set from build to frozen release: test package, a report from a phone, a release with an acknowledged exception', async ({ browser }) => {
  test.setTimeout(240_000)
  const engineer = await signedInPage(browser, DEMO.calib)
  const drive = await savedAndSubmitted(engineer, 'Road drive', 3, 3, '90', 'A little more tip-in at 10 % pedal, 6 km/h, for the set test')
  const regen = await savedAndSubmitted(engineer, 'Road regen', 2, 3, '450', 'Lighter regen at 10 % brake, 6 km/h, for the set test')

  // The engineer builds the set from the two revisions (drafts or in review may be driven) and takes its test package.
  await engineer.goto(`/sets/new?drive=${drive.revisionId}&regen=${regen.revisionId}`)
  await engineer.getByRole('button', { name: 'Make the set' }).click()
  await expect(engineer).toHaveURL(/\/sets\/\d+$/)
  const setId = Number(new URL(engineer.url()).pathname.split('/')[2])
  await expect(engineer.getByTestId('set-part-drive')).toContainText(`Road drive`)
  await expect(engineer.getByTestId('set-status')).toHaveText('Not released')
  const testPkg = await engineer.request.get((await engineer.getByTestId('test-package-link').getAttribute('href'))!)
  expect(testPkg.status()).toBe(200)
  const testFiles = unzipSync(new Uint8Array(await testPkg.body()))
  for (const [name, bytes] of Object.entries(testFiles)) expect(strFromU8(bytes), name).toContain('TEST PACKAGE - NOT FOR RELEASE')

  // A driver on a phone files a report on exactly this set, from the set's own link.
  const phone = await (await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true })).newPage()
  await signIn(phone, DEMO.driver)
  await phone.goto(`/sets/${setId}`)
  await phone.getByTestId('file-report-link').tap()
  await expect(phone).toHaveURL(new RegExp(`/reports/new\\?set=${setId}$`))
  await expect(phone.getByTestId('set-summary')).toContainText(`Drive map: Road drive r${drive.n}`)
  await fillDriveConditions(phone, { unit: 'BX-T4', route: 'Demo test track, wet pad', surface: 'wet-asphalt', weather: 'rain', tempC: '6', rating: 4 })
  expect(await phone.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390)
  await phone.getByRole('button', { name: 'File report' }).click()
  await expect(phone.getByText('Report filed.')).toBeVisible()

  // The lead approves both revisions, then releases the set, acknowledging each traction exception with a reason.
  const lead = await signedInPage(browser, DEMO.lead)
  for (const r of [drive, regen]) {
    await lead.goto(`/review/${r.revisionId}`)
    await lead.getByRole('button', { name: 'Approve', exact: true }).click()
    await lead.getByRole('button', { name: 'Yes, approve' }).click()
    await expect(lead.getByTestId('revision-state')).toHaveText('Approved')
  }
  await lead.goto(`/sets/${setId}`)
  await expect(lead.getByTestId('set-gate-drive-report')).toHaveAttribute('data-met', 'true')
  const acks = await lead.locator('[data-testid^="ack-traction:"]').all()
  expect(acks.length).toBeGreaterThan(0)
  for (const a of acks) await a.fill('Closed-course running only for this build; drivers briefed')
  // One report covers one surface × load case; the lead waives the other release conditions, each with a reason.
  await expect(lead.getByTestId('set-gate-coverage')).toHaveAttribute('data-met', 'false')
  const waivers = await lead.locator('[data-testid^="waive-coverage:"]').all()
  expect(waivers.length).toBeGreaterThan(0)
  for (const w of waivers) await w.fill('Only the wet pad was open; snow runs are booked for the next build')
  await lead.getByRole('button', { name: /^Release Set \d+$/ }).click()
  await expect(lead.getByTestId('confirm-step')).toContainText("go to the program's trucks")
  await lead.getByRole('button', { name: /^Yes, release Set \d+$/ }).click()
  await expect(lead.getByTestId('set-status')).toHaveText('Released', { timeout: 30_000 })
  await expect(lead.getByTestId('set-acknowledgements')).toContainText('Closed-course running only for this build')
  await expect(lead.getByTestId('set-coverage')).toContainText('waived: “Only the wet pad was open')

  // The release package: the manifest's hashes match its files; two downloads are the same bytes, the SHA-256 shown.
  const href = (await lead.getByTestId('release-package-link').getAttribute('href'))!
  const first = new Uint8Array(await (await lead.request.get(href)).body())
  const second = new Uint8Array(await (await engineer.request.get(href)).body())
  expect(sha256(second)).toBe(sha256(first))
  await expect(lead.getByTestId('package-sha256').last()).toHaveText(sha256(first))
  const files = unzipSync(first)
  const manifest = JSON.parse(strFromU8(files['manifest.json']))
  expect(manifest).toMatchObject({ package: 'release', set: { id: setId }, evidenceReports: expect.arrayContaining([expect.any(Number)]) })
  expect(manifest.acknowledgements.length).toBe(acks.length)
  for (const f of manifest.files) expect(sha256(files[f.name]), f.name).toBe(f.sha256)
  expect(manifest.files.map((f: { name: string }) => f.name).sort()).toEqual(Object.keys(files).filter((n) => n !== 'manifest.json').sort())
})
