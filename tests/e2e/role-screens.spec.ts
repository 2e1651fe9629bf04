import { expect, test } from './fixtures'
import type { Page } from '@playwright/test'
import { expectAccessible } from './axe'
import { DEMO, docShot, editAndSave, gridCell, openMapByName, openReview, signIn, typeInto } from './helpers'

/**
 * A one-newton-metre cut of a cell that keeps the map valid for the specs that build on it: the
 * first cell down the column that is above the cell before it (a map must not fall as the pedal
 * rises, and the low-pedal rows may all hold the same creep torque).
 */
async function nudge(page: Page, mapId: number, col: number): Promise<{ row: number; value: string }> {
  await page.goto(`/maps/${mapId}/edit`)
  await expect(gridCell(page, 1, col)).toBeVisible()
  const read = async (r: number) => Number(((await gridCell(page, r, col).textContent()) ?? '').replace(/[^0-9.-]/g, ''))
  for (let row = 2; (await gridCell(page, row, col).count()) > 0; row++) {
    const [above, here] = [await read(row - 1), await read(row)]
    if (here - 1 >= above) return { row, value: String(here - 1) }
  }
  throw new Error(`no cell of column ${col} can be cut by 1 N·m`)
}

test.describe('every role, smooth in the browser', () => {
  test('an address that names nothing is a 404 page and a 404 answer; the app has its own icon', async ({ page }) => {
    await signIn(page, DEMO.driver)
    for (const path of ['/maps/99999999999999999999', '/sets/abc', '/reports/0', '/programs/1e30', '/programs/1e30/physics']) {
      const res = await page.goto(path)
      expect(res?.status(), path).toBe(404)
      await expect(page.getByRole('heading', { name: 'Page not found' })).toBeVisible()
    }
    await expectAccessible(page, 'the 404 page')
    for (const path of ['/api/maps/99999999999999999999', '/api/sets/abc', '/api/reports/0', '/api/programs/1e30']) {
      const res = await page.request.get(path)
      expect(res.status(), path).toBe(404)
      expect((await res.json()).error.code).toBe('not_found')
    }
    const icon = await page.locator('link[rel="icon"]').first().getAttribute('href')
    expect(icon).toMatch(/^\/icon\.svg/)
    const svg = await page.request.get(icon!)
    expect(svg.headers()['content-type']).toContain('image/svg+xml')
  })

  test('a driver reads a program as plain text and sees labels, never ids', async ({ page }) => {
    await signIn(page, DEMO.driver)
    await page.goto('/programs')
    await page.getByRole('link', { name: 'BX-64 Tipper' }).first().click()
    await expect(page).toHaveURL(/\/programs\/\d+$/)
    const details = page.getByTestId('program-details')
    await expect(details).toContainText('Gross vehicle mass')
    await expect(details).toContainText('Packed snow')
    await expect(page.locator('main').getByRole('textbox')).toHaveCount(0)
    await expect(page.locator('main').getByRole('spinbutton')).toHaveCount(0)
    await expect(page.locator('main').getByRole('checkbox')).toHaveCount(0)
    await expectAccessible(page, 'a program, read-only')
    await page.goto('/reports')
    const text = await page.locator('main').innerText()
    for (const id of ['packed-snow', 'wet-asphalt', 'dry-asphalt', 'trailer-laden', 'trailer-empty']) expect(text, id).not.toContain(id)
    await expect(page.locator('main')).toContainText(/empty|laden/i)
    await expectAccessible(page, 'the reports list')
  })

  test('a lead sees the released set against the release before it, and confirms a withdrawal first', async ({ page }) => {
    await signIn(page, DEMO.lead)
    await page.goto('/sets')
    // The demo's Set 2 of the tipper is in the trucks; Set 1 was released before it and withdrawn.
    await page.locator('tr', { hasText: 'BX-64 Tipper' }).getByRole('link', { name: 'Set 2', exact: true }).click()
    await expect(page).toHaveURL(/\/sets\/\d+$/)
    const cmp = page.getByTestId('release-comparison')
    await expect(cmp).toContainText('The release before it was Set 1')
    await expect(cmp).toContainText('Site drive r1 → r2')
    await expect(cmp).toContainText(/cells changed/)
    await expectAccessible(page, 'a released set')
    await page.setViewportSize({ width: 1440, height: 900 })
    await cmp.screenshot({ path: docShot('release-comparison.png') })

    await page.getByLabel('Reason (required)').fill('Checking the confirmation only')
    await page.getByRole('button', { name: 'Withdraw the release' }).click()
    const confirm = page.getByTestId('confirm-step')
    await expect(confirm).toContainText('Withdraw the release of Set 2: everyone is told not to use it')
    await expect(page.getByRole('button', { name: 'Yes, withdraw Set 2' })).toBeFocused()
    await expectAccessible(page, 'the withdrawal confirmation')
    await page.getByRole('button', { name: 'Cancel' }).click()
    await expect(confirm).toHaveCount(0)
    await expect(page.getByTestId('set-status')).toHaveText('Released')

    // Each changed map links to the surfaces compared.
    await cmp.getByRole('link', { name: 'compare' }).first().click()
    await expect(page).toHaveURL(/\/maps\/compare\?a=\d+:1&b=\d+:2/)
  })

  test('a lead on their own revision is told why approving is not open to them', async ({ page }) => {
    await signIn(page, DEMO.lead)
    // The lead saves and submits a revision of their own.
    const mapId = await openMapByName(page, 'Road drive')
    const cell = await nudge(page, mapId, 2)
    const n = await editAndSave(page, mapId, cell.row, 2, cell.value, 'Lead tries a small change of their own')
    await openReview(page, mapId, n)
    await page.getByRole('button', { name: 'Submit for review' }).click()
    await expect(page.getByTestId('revision-state')).toHaveText('Waiting for review')
    await expect(page.getByRole('button', { name: 'Approve', exact: true })).toHaveCount(0)
    await expect(page.getByTestId('blocked-approve')).toContainText('cannot approve their own revision; another lead must review it')
    await expectAccessible(page, 'a review page of the lead’s own revision')
  })

  test('an admin sees an invitee as invited, sends again, reads the mail, the saved role and a readable audit trail', async ({ page }) => {
    await signIn(page, DEMO.admin)
    await page.goto('/admin/users')
    const email = `invitee-${Date.now()}@example.org`
    await page.getByLabel('Name').fill('New Invitee')
    await page.getByLabel('Email').fill(email)
    await page.getByRole('checkbox', { name: /Invite by e-mail/ }).check()
    await page.getByRole('button', { name: 'Send invitation' }).click()
    const row = page.getByTestId(`user-row-${email}`)
    await expect(row.getByTestId('invited-badge')).toHaveText('Invited')
    await row.getByRole('button', { name: /^Send again/ }).click()
    await expect(page.getByTestId('users-saved')).toContainText(`A new invitation is on its way to ${email}`)
    await row.getByLabel(`Role of ${email}`).selectOption('calibration_engineer')
    await expect(page.getByTestId('users-saved')).toContainText(`Saved: ${email} is now calibration engineer`)
    await expectAccessible(page, 'the users page')

    await page.goto('/admin/mail')
    const message = page.getByTestId('outbox-message').filter({ hasText: 'Your Mapwright invitation' }).first()
    await message.locator('summary').click()
    await expect(message).toContainText('/set-password?token=')
    await expectAccessible(page, 'the e-mail page')

    await page.goto('/admin/audit?entityType=user')
    const first = page.getByTestId('audit-row').first()
    await expect(page.getByTestId('audit-table')).toContainText('Invitation sent again')
    await expect(page.getByTestId('audit-table')).toContainText('New Invitee')
    // Plain words in the What column; the stored action id only under Raw data.
    for (const what of await page.getByTestId('audit-row').locator('td:nth-child(3)').allInnerTexts()) expect(what).not.toMatch(/^[a-z]+\.[a-z-]+$/)
    await first.locator('summary').first().click()
    await expect(first.locator('pre')).toBeVisible()
    await expect(page.getByTestId('audit-paging')).toContainText(/Page 1 of \d+/)
    await expectAccessible(page, 'the audit trail')
    await page.setViewportSize({ width: 1440, height: 900 })
    await page.screenshot({ path: docShot('audit-trail.png') })
    // Five to a page, so there is an older page whatever ran before.
    await page.goto('/admin/audit?limit=5')
    await page.getByRole('link', { name: 'Older' }).click()
    await expect(page).toHaveURL(/page=2/)
    await expect(page.getByTestId('audit-paging')).toContainText('Page 2 of')
    await expect(page.getByRole('link', { name: 'Newer' })).toBeVisible()
  })

  test('notes render as markdown with tables', async ({ page }) => {
    await signIn(page, DEMO.calib)
    const mapId = await openMapByName(page, 'Road regen')
    const cell = await nudge(page, mapId, 2)
    await page.goto(`/maps/${mapId}/edit`)
    await expect(page.getByTestId('base-revision')).toBeVisible()
    const base = Number(await page.getByTestId('base-revision').textContent())
    await typeInto(page, cell.row, 2, cell.value)
    await page.getByLabel('Message (why)').fill('Notes with a table')
    await page.getByLabel(/^Notes/).fill('| Speed | Change |\n| --- | --- |\n| 6 km/h | -5 N·m |\n\n<b>not bold</b>')
    await page.getByRole('button', { name: 'Save revision' }).click()
    await expect(page).toHaveURL(new RegExp(`/maps/${mapId}\\?saved=${base + 1}$`))
    const notes = page.getByTestId(`notebook-${base + 1}`).getByTestId('markdown-notes')
    await expect(notes.getByRole('table')).toBeVisible()
    await expect(notes.getByRole('cell', { name: '6 km/h' })).toBeVisible()
    await expect(notes.locator('b')).toHaveCount(0)
    await expectAccessible(page, 'a map notebook with markdown notes')
  })
})
