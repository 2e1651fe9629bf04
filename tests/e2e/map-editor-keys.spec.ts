import { expect, test } from './fixtures'
import { expectAccessible } from './axe'
import { DEMO, gridCell, openEditor, paste, signIn, typeInto } from './helpers'

test.describe('map grid like a spreadsheet', () => {
  test('arrows move inside the grid, Ctrl+D fills down, Delete clears to 0 and Ctrl+Z undoes', async ({ page }) => {
    await signIn(page, DEMO.calib)
    await openEditor(page, 'Road drive')
    await expectAccessible(page, 'the map editor')

    // Arrow down from (2,2), then type: the value lands one row lower.
    await gridCell(page, 2, 2).click()
    await page.keyboard.press('ArrowDown')
    await page.keyboard.type('77')
    await page.keyboard.press('Enter')
    await expect(gridCell(page, 3, 2)).toHaveText('77')

    // Ctrl+D copies the top row of the selection into the rows below it.
    const top = (await gridCell(page, 2, 1).textContent()) ?? ''
    await gridCell(page, 2, 1).click()
    await gridCell(page, 4, 1).click({ modifiers: ['Shift'] })
    await page.keyboard.press('Control+d')
    await expect(gridCell(page, 3, 1)).toHaveText(top)
    await expect(gridCell(page, 4, 1)).toHaveText(top)

    // Delete clears to 0 N·m; undo brings the value back.
    const before = (await gridCell(page, 5, 3).textContent()) ?? ''
    expect(before).not.toBe('0')
    await gridCell(page, 5, 3).click()
    await page.keyboard.press('Delete')
    await expect(gridCell(page, 5, 3)).toHaveText('0')
    await page.keyboard.press('Control+z')
    await expect(gridCell(page, 5, 3)).toHaveText(before)

    // Delete on breakpoints alone says why it does nothing.
    await gridCell(page, 0, 3).click()
    await page.keyboard.press('Delete')
    await expect(page.getByTestId('editor-message')).toContainText('Breakpoints cannot be cleared')
  })

  test('the grid is one Tab stop: Tab enters it on a cell, arrows move inside, Tab and Shift+Tab leave it', async ({ page }) => {
    await signIn(page, DEMO.calib)
    await openEditor(page, 'Road drive')
    const grid = page.getByTestId('map-grid')
    await expect(grid).toHaveAccessibleName('Map grid: arrow keys move, Enter edits')
    // Where the focus is, seen from the grid: inside it (and which cell), before it or after it.
    const where = () =>
      page.evaluate(() => {
        const box = document.querySelector('[data-testid="map-grid"]')!
        const el = document.activeElement
        if (!el || el === document.body) return { at: 'body' }
        if (box.contains(el)) return { at: 'grid', cell: el.getAttribute('data-cell') }
        return { at: box.compareDocumentPosition(el) & Node.DOCUMENT_POSITION_FOLLOWING ? 'after' : 'before', name: el.textContent?.trim() }
      })

    await gridCell(page, 2, 2).click()
    expect(await where()).toEqual({ at: 'grid', cell: '2-2' })
    await page.keyboard.press('ArrowRight')
    expect(await where()).toEqual({ at: 'grid', cell: '2-3' })
    // One Tab leaves the grid for the next control after it …
    await page.keyboard.press('Tab')
    const after = await where()
    expect(after.at).toBe('after')
    // … and Shift+Tab from there comes back into the grid, on a cell.
    await page.keyboard.press('Shift+Tab')
    expect((await where()).at).toBe('grid')
    await expect(page.locator('.ht_master td.current')).toHaveCount(1)
    // Shift+Tab from inside goes to the control before the grid, and Tab from there enters it again.
    await gridCell(page, 3, 3).click()
    await page.keyboard.press('Shift+Tab')
    const before = await where()
    expect(before.at).toBe('before')
    await page.keyboard.press('Tab')
    const back = await where()
    expect(back.at).toBe('grid')
    expect(back.cell).toMatch(/^\d+-\d+$/)
    // The arrows still move inside: the grid has the keyboard again.
    await page.keyboard.press('ArrowDown')
    const moved = await where()
    expect(moved.at).toBe('grid')
    expect(moved.cell).not.toBe(back.cell)
  })

  test('a paste wider than the grid keeps what fits and says what was left out', async ({ page }) => {
    await signIn(page, DEMO.calib)
    await openEditor(page, 'Road drive')
    const lastCol = await page.evaluate(() => Math.max(...[...document.querySelectorAll('.ht_clone_top [data-cell^="0-"]')].map((td) => Number(td.getAttribute('data-cell')?.split('-')[1]))))
    await gridCell(page, 2, lastCol).click()
    await paste(page, '111\t222\t333')
    await expect(gridCell(page, 2, lastCol)).toHaveText('111')
    await expect(page.getByTestId('editor-message')).toContainText('2 columns (pasted columns 2–3) were left out')
  })

  test('traction shading has its own key and gives each cell its share of the grip', async ({ page }) => {
    await signIn(page, DEMO.calib)
    await openEditor(page, 'Site drive')
    await page.getByLabel('Shade by traction margin').check()
    const key = page.getByTestId('traction-legend')
    await expect(key).toContainText('within margin')
    await expect(key).toContainText('near the limit')
    await expect(key).toContainText('beyond the tyre peak')
    await expect(gridCell(page, 2, 2)).toHaveAttribute('title', /Traction: uses \d+ % of the available grip/)
    await expectAccessible(page, 'the map editor with traction shading')
  })
})

test.describe('a save that lost the race', () => {
  test('merges cell by cell: cells one side changed are taken, a cell both changed is chosen', async ({ page, browser }) => {
    await signIn(page, DEMO.calib)
    const { id, base } = await openEditor(page, 'Road regen')
    await typeInto(page, 2, 2, String(300 + base)) // both sides change this cell
    await typeInto(page, 3, 3, String(400 + base)) // only mine
    // A colleague saves first.
    const other = await browser.newContext()
    const lead = await other.newPage()
    await signIn(lead, DEMO.lead)
    const latest = await lead.request.get(`/api/maps/${id}/revisions/latest`)
    const { revision } = (await latest.json()) as { revision: { table: { values: number[][] } } }
    revision.table.values[0][0] += 1 // only theirs: grid cell (1,1)
    revision.table.values[1][1] = 350 + base // grid cell (2,2), differently from mine
    const saved = await lead.request.post(`/api/maps/${id}/revisions`, { data: { parentNumber: base, message: 'Lead tweak', notes: '', table: revision.table } })
    expect(saved.status()).toBe(201)
    await other.close()
    const theirs11 = String(revision.table.values[0][0])

    await page.getByLabel('Message (why)').fill('Softer regen mid brake')
    await page.getByRole('button', { name: 'Save revision' }).click()
    const choices = page.getByTestId('merge-choices')
    await expect(choices).toContainText('1 cell(s) changed on both sides need your choice')
    await expect(page.getByText(/Rebase/)).toHaveCount(0)
    await expectAccessible(page, 'the editor with the merge choices')
    await choices.getByRole('button', { name: 'All theirs' }).click()
    await choices.getByRole('button', { name: `Merge onto revision ${base + 1}` }).click()
    await expect(gridCell(page, 2, 2)).toHaveText(String(350 + base))
    await expect(gridCell(page, 3, 3)).toHaveText(String(400 + base))
    await expect(gridCell(page, 1, 1)).toHaveText(theirs11)
    await page.getByRole('button', { name: 'Save revision' }).click()
    await expect(page).toHaveURL(new RegExp(`/maps/${id}\\?saved=${base + 2}$`))

    // Straight from the saved message to review.
    await page.getByRole('button', { name: `Submit for review: r${base + 2}` }).click()
    await expect(page.getByTestId(`state-${base + 2}`)).toHaveText('Waiting for review')
    await expect(page).toHaveTitle(/Map notebook/) // the refresh streams the title back in
    await expectAccessible(page, 'the map page after a save')
  })
})
