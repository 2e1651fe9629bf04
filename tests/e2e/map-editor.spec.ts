import { expect, test } from './fixtures'
import { DEMO, gridCell, openEditor, openMapByName, paste, signIn, typeInto } from './helpers'

test.describe('map grid editor', () => {
  test('a calibration engineer edits a cell, saves with a message and sees the revision in the history', async ({ page }) => {
    await signIn(page, DEMO.calib)
    const { id, base } = await openEditor(page, 'Site drive')
    const value = String(600 + base) // differs from the stored value whatever ran before
    await typeInto(page, 12, 13, value)
    await expect(gridCell(page, 12, 13)).toHaveText(value)
    await expect(page.getByTestId('draft-state')).toHaveText(`Unsaved edits on top of revision ${base}`)
    await page.getByRole('button', { name: 'Save revision' }).click()
    await expect(page.getByText('A message saying why is required')).toBeVisible()
    await page.getByLabel('Message (why)').fill('Trim top-speed torque at full pedal')
    await page.getByLabel('Notes (markdown, optional)').fill('Checked on the **quarry loop**.')
    await page.getByRole('button', { name: 'Save revision' }).click()
    await expect(page).toHaveURL(new RegExp(`/maps/${id}\\?saved=${base + 1}$`))
    await expect(page.getByTestId(`history-row-${base + 1}`)).toContainText('Trim top-speed torque at full pedal')
  })

  test('pasting a block (with a pedal breakpoint) changes those cells, and Ctrl+Z undoes the paste', async ({ page }) => {
    await signIn(page, DEMO.calib)
    await openEditor(page, 'Road drive')
    const before = [await gridCell(page, 4, 0).textContent(), await gridCell(page, 4, 1).textContent(), await gridCell(page, 5, 2).textContent()]
    await gridCell(page, 4, 0).click()
    await paste(page, '25\t311\t322\n31\t333\t344')
    await expect(gridCell(page, 4, 0)).toHaveText('25')
    await expect(gridCell(page, 4, 1)).toHaveText('311')
    await expect(gridCell(page, 5, 0)).toHaveText('31')
    await expect(gridCell(page, 5, 2)).toHaveText('344')
    await page.locator('body').click({ position: { x: 5, y: 5 } })
    await page.keyboard.press('Control+z')
    await expect(gridCell(page, 4, 0)).toHaveText(before[0] ?? '')
    await expect(gridCell(page, 4, 1)).toHaveText(before[1] ?? '')
    await expect(gridCell(page, 5, 2)).toHaveText(before[2] ?? '')
    await page.keyboard.press('Control+Shift+z')
    await expect(gridCell(page, 4, 1)).toHaveText('311')
  })

  test('a value above the motor envelope is marked and listed as a finding', async ({ page }) => {
    await signIn(page, DEMO.calib)
    await openEditor(page, 'Site drive')
    await typeInto(page, 6, 4, '9999')
    const finding = page.getByTestId('findings-list').getByText(/9,999 N·m exceeds the motor envelope/)
    await expect(finding).toBeVisible()
    await expect(gridCell(page, 6, 4)).toHaveClass(/mw-error/)
    await expect(gridCell(page, 6, 4)).toHaveAttribute('title', /exceeds the motor envelope/)
    // The same finding in imperial units, converted for display only.
    await page.getByText('lbf·ft, mph').click()
    await expect(page.getByTestId('findings-list').getByText(/7,374\.\d lbf·ft exceeds the motor envelope/)).toBeVisible()
    await expect(gridCell(page, 6, 4)).toHaveText('7374.9')
  })

  test('unsaved edits survive a reload and can be discarded', async ({ page }) => {
    await signIn(page, DEMO.calib)
    await openEditor(page, 'Road regen')
    const original = await gridCell(page, 3, 5).textContent()
    await typeInto(page, 3, 5, '321')
    await expect(gridCell(page, 3, 5)).toHaveText('321')
    await page.reload()
    await expect(page.getByText(/Restored unsaved edits from/)).toBeVisible()
    await expect(gridCell(page, 3, 5)).toHaveText('321')
    page.once('dialog', (d) => void d.accept())
    await page.getByRole('button', { name: 'Discard edits' }).click()
    await expect(gridCell(page, 3, 5)).toHaveText(original ?? '')
    await page.reload()
    await expect(gridCell(page, 1, 1)).toBeVisible()
    await expect(page.getByText(/Restored unsaved edits from/)).toHaveCount(0)
  })

  test('a save on a stale revision keeps the edits, compares, and saves after a merge', async ({ page, browser }) => {
    await signIn(page, DEMO.calib)
    const { id, base } = await openEditor(page, 'Site regen')
    const value = String(200 + base)
    await typeInto(page, 2, 6, value)
    // Someone else saves first.
    const other = await browser.newContext()
    const lead = await other.newPage()
    await signIn(lead, DEMO.lead)
    const latest = await lead.request.get(`/api/maps/${id}/revisions/latest`)
    const { revision } = (await latest.json()) as { revision: { table: { values: number[][] } } }
    revision.table.values[1][1] += 10
    const saved = await lead.request.post(`/api/maps/${id}/revisions`, { data: { parentNumber: base, message: 'Lead tweak', notes: '', table: revision.table } })
    expect(saved.status()).toBe(201)
    await other.close()

    await page.getByLabel('Message (why)').fill('More regen at 50 % brake')
    await page.getByRole('button', { name: 'Save revision' }).click()
    const conflict = page.getByRole('alert', { name: 'Save conflict' })
    await expect(conflict).toContainText(`Revision ${base + 1} was saved after`)
    await expect(conflict).toContainText('changes 1 of')
    await expect(gridCell(page, 2, 6)).toHaveText(value)
    await page.getByRole('button', { name: `Merge onto revision ${base + 1}` }).click()
    await expect(gridCell(page, 2, 6)).toHaveText(value)
    await page.getByRole('button', { name: 'Save revision' }).click()
    await expect(page).toHaveURL(new RegExp(`/maps/${id}\\?saved=${base + 2}$`))
  })

  test('a test driver sees a revision read-only, and the API refuses a save', async ({ page }) => {
    await signIn(page, DEMO.driver)
    const id = await openMapByName(page, 'Site drive')
    await expect(page.getByRole('link', { name: 'Edit', exact: true })).toHaveCount(0)
    await page.getByTestId('history-row-1').getByRole('link', { name: 'Open' }).click()
    await expect(page).toHaveURL(new RegExp(`/maps/${id}/revisions/1$`))
    await expect(gridCell(page, 1, 1)).toBeVisible()
    await expect(page.getByRole('link', { name: 'Start a new draft from this revision' })).toHaveCount(0)
    await expect(page.getByRole('button', { name: 'Save revision' })).toHaveCount(0)
    await expect(page.getByRole('toolbar', { name: 'Map operations' })).toHaveCount(0)
    await expect(page.getByRole('link', { name: 'CSV' })).toBeVisible()
    // Typing into the read-only grid changes nothing.
    const before = await gridCell(page, 2, 2).textContent()
    await typeInto(page, 2, 2, '777')
    await expect(gridCell(page, 2, 2)).toHaveText(before ?? '')
    const res = await page.request.post(`/api/maps/${id}/revisions`, {
      data: { parentNumber: 1, message: 'not allowed', notes: '', table: { kind: 'drive', rowAxis: [0, 100], colAxis: [0, 10], values: [[0, 0], [1, 1]] } },
    })
    expect(res.status()).toBe(403)
    await page.goto(`/maps/${id}/edit`)
    await expect(page).toHaveURL(/\/not-allowed/)
  })
})
