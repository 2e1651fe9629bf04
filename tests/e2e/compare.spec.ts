import { expect, test } from './fixtures'
import type { Page } from '@playwright/test'
import { DEMO, docShot, expectEveryTraceDrawable, mapIdByName, signIn } from './helpers'

const PLOT_WAIT = 30_000

type GraphDiv = HTMLElement & { _fullLayout?: { scene?: { camera?: { eye?: { x: number; y: number; z: number } } } } }
const eyeOf = (page: Page, i: number) =>
  page.locator('[data-testid="compare-surfaces"] .js-plotly-plot').nth(i).evaluate((el) => (el as GraphDiv)._fullLayout?.scene?.camera?.eye ?? null)

test.describe('comparing two revisions', () => {
  test.use({ viewport: { width: 1400, height: 900 } })

  test('shows both surfaces, the difference and the changes, and the slip heat map follows the load case', async ({ page }) => {
    await signIn(page, DEMO.calib)
    const site = await mapIdByName(page, 'Site drive')
    await page.goto(`/maps/compare?a=${site}:2&b=${site}:3&loadCase=empty&surface=gravel`)
    await expect(page.getByRole('heading', { name: 'Compare two revisions' })).toBeVisible()
    await expect(page.getByRole('note')).toContainText('closed course')

    // Two surfaces and the difference (WebGL canvases), and two heat maps.
    // The plot library is a large chunk fetched after the page loads; give it time on a cold server.
    const surfaces = page.locator('[data-testid="compare-surfaces"] .js-plotly-plot')
    await expect(surfaces).toHaveCount(2, { timeout: PLOT_WAIT })
    await expect(page.locator('.js-plotly-plot')).toHaveCount(5)
    await expect(page.locator('.js-plotly-plot .gl-container canvas').first()).toBeVisible()
    await expect(page.getByText('Difference B − A')).toBeVisible()
    expect(await expectEveryTraceDrawable(page)).toEqual(expect.arrayContaining(['heatmap', 'surface']))

    // Revision 3 capped launch torque below 10 km/h: 13 cells, the 100 % / 0 km/h cell by 1,800 N·m first
    // (the demo tipper's 3,400 N·m envelope down to the 1,600 N·m cap; recomputed from db/demo/maps.ts).
    const rows = page.getByTestId('change-table').locator('tbody tr')
    await expect(rows).toHaveCount(13)
    await expect(rows.first()).toContainText('-1,800')

    // Empty on gravel: r3 still spins 14 cells (r2: 20; the tipper's open inter-axle differential is limited by the
    // lighter tandem axle); laden puts enough load on the tandem that none spins.
    const heatB = page.getByTestId('slip-heatmap-b')
    await expect(heatB).toHaveAttribute('data-spin-count', '14')
    await expect(page.getByTestId('slip-heatmap-a')).toHaveAttribute('data-spin-count', '20')
    await expect(heatB.locator('.main-svg').first()).toBeVisible()
    await page.screenshot({ path: docShot('compare.png'), fullPage: true })

    await page.getByRole('combobox', { name: 'Load case' }).selectOption('laden')
    await expect(heatB).toHaveAttribute('data-spin-count', '0', { timeout: PLOT_WAIT })
    await expect(page.getByTestId('slip-heatmap-b-caption')).toHaveText(/No cell beyond the tyre peak/)
    await expect(page).toHaveURL(/loadCase=laden/)
    await page.getByRole('combobox', { name: 'Surface' }).selectOption('ice')
    await expect(heatB).not.toHaveAttribute('data-spin-count', '0', { timeout: PLOT_WAIT })
    await expect(page).toHaveURL(/surface=ice/)

    // Units: the change table follows the switch.
    await page.getByRole('combobox', { name: 'Units' }).selectOption('imperial')
    await expect(page.getByTestId('change-table').locator('thead')).toContainText('lbf·ft')
    await expect(rows.first()).toContainText('-1,327.6', { timeout: PLOT_WAIT }) // −1,800 N·m ÷ 1.3558179 N·m per lbf·ft
  })

  test('dragging one surface turns the other with it', async ({ page }) => {
    // WebGL runs in software in headless Chromium, so every drag step redraws slowly.
    test.setTimeout(120_000)
    await signIn(page, DEMO.lead)
    const site = await mapIdByName(page, 'Site drive')
    await page.goto(`/maps/compare?a=${site}:1&b=${site}:3`)
    const first = page.locator('[data-testid="compare-surfaces"] .js-plotly-plot').first()
    await expect(first.locator('.gl-container canvas')).toBeVisible({ timeout: PLOT_WAIT })
    const before = await eyeOf(page, 1)
    const box = await first.boundingBox()
    if (!box) throw new Error('no plot box')
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2)
    await page.mouse.down()
    await page.mouse.move(box.x + box.width / 2 + 160, box.y + box.height / 2 + 40, { steps: 4 })
    await page.mouse.up()
    await expect.poll(async () => JSON.stringify(await eyeOf(page, 1)), { timeout: PLOT_WAIT }).not.toBe(JSON.stringify(before))
    const [a, b] = [await eyeOf(page, 0), await eyeOf(page, 1)]
    expect(b?.x).toBeCloseTo(a?.x ?? NaN, 6)
    expect(b?.y).toBeCloseTo(a?.y ?? NaN, 6)
  })

  test('refuses to compare a drive map with a regen map, with the reason', async ({ page }) => {
    await signIn(page, DEMO.driver)
    const drive = await mapIdByName(page, 'Site drive')
    const regen = await mapIdByName(page, 'Site regen')
    await page.goto(`/maps/compare?a=${drive}:1&b=${regen}:1`)
    await expect(page.getByRole('alert').filter({ hasText: 'is a drive map' })).toContainText('is a drive map and “Site regen” is a regen map')
    await expect(page.locator('.js-plotly-plot')).toHaveCount(0)
  })

  test('an engineer proposes a traction-safe draft and saves it as a new revision', async ({ page }) => {
    await signIn(page, DEMO.calib)
    const road = await mapIdByName(page, 'Road drive')
    await page.goto(`/maps/compare?a=${road}:1&b=${road}:2&loadCase=empty&surface=gravel`)
    await page.getByRole('button', { name: 'Propose a traction-safe draft' }).click()
    await expect(page.getByTestId('proposal-summary')).toContainText('cells lowered')
    await expect(page.getByTestId('proposal-table').locator('tbody tr').first()).toContainText('above the limit')
    const save = page.getByRole('button', { name: 'Save as new revision' })
    await expect(save).toBeDisabled()
    await page.getByRole('textbox', { name: 'Why (required)' }).fill('Keep the solo tractor within grip on gravel')
    await save.click()
    // The new number is whatever comes next (a retry of this test finds one more revision).
    const status = page.getByRole('status').filter({ hasText: /Saved as r\d+/ })
    await expect(status).toBeVisible({ timeout: 20_000 })
    const saved = Number(/Saved as r(\d+)/.exec((await status.textContent()) ?? '')?.[1])
    expect(saved).toBeGreaterThanOrEqual(3)
    await page.getByRole('link', { name: `Compare r2 with r${saved}` }).click()
    await expect(page).toHaveURL(new RegExp(`a=${road}(%3A|:)2&b=${road}(%3A|:)${saved}`), { timeout: 30_000 })
    await expect(page.getByTestId('slip-heatmap-b')).toHaveAttribute('data-spin-count', '0', { timeout: PLOT_WAIT })
  })
})
