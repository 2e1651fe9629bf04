// Everything the e2e specs share: demo accounts, signing in, finding demo maps, driving the grid editor.
import { expect, type Browser, type Page } from '@playwright/test'

export const DEMO_PASSWORD = 'mapwright-demo'

export const DEMO = {
  admin: 'admin@brackwater.example',
  lead: 'lead@brackwater.example',
  calib: 'calib@brackwater.example',
  driver: 'driver@brackwater.example',
} as const

/** Sign in through the real form and wait for the overview. */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto('/signin')
  await page.getByLabel('Email').fill(email)
  await page.getByLabel('Password').fill(password)
  await page.getByRole('button', { name: 'Sign in' }).click()
  await expect(page.getByRole('heading', { name: /^Welcome,/ })).toBeVisible({ timeout: 20_000 })
}

/** A page in a browser context of its own (its own cookies), signed in as `email`: a second person at work. */
export async function signedInPage(browser: Browser, email: string): Promise<Page> {
  const page = await (await browser.newContext()).newPage()
  await signIn(page, email)
  return page
}

/**
 * A grid cell of the map editor by grid coordinates (row 0 = speed breakpoints, column 0 = pedal
 * breakpoints). The breakpoint row and column stay in view while scrolling, so they are drawn in
 * the grid's frozen overlays rather than the main table.
 */
export function gridCell(page: Page, row: number, col: number) {
  const layer = row === 0 && col === 0 ? 'ht_clone_top_inline_start_corner' : row === 0 ? 'ht_clone_top' : col === 0 ? 'ht_clone_inline_start' : 'ht_master'
  return page.locator(`.${layer} [data-cell="${row}-${col}"]`)
}

/** A demo map's id from the maps list without opening it (ids depend on the seed order). */
export async function mapIdByName(page: Page, name: string): Promise<number> {
  await page.goto('/maps')
  const href = await page.getByRole('link', { name, exact: true }).first().getAttribute('href')
  return Number(href?.split('/')[2])
}

/** Open a map's notebook from the maps list; returns its id. */
export async function openMapByName(page: Page, name: string): Promise<number> {
  await page.goto('/maps')
  await page.getByRole('link', { name, exact: true }).first().click()
  await expect(page).toHaveURL(/\/maps\/\d+$/)
  return Number(new URL(page.url()).pathname.split('/')[2])
}

/** Open the grid editor of a demo map; returns the map id and the revision the draft starts from. */
export async function openEditor(page: Page, name: string): Promise<{ id: number; base: number }> {
  const id = await openMapByName(page, name)
  await page.goto(`/maps/${id}/edit`)
  await expect(gridCell(page, 1, 1)).toBeVisible()
  const base = Number(await page.getByTestId('base-revision').textContent())
  return { id, base }
}

/** Select a cell, type a value and confirm it, as a calibrator does. */
export async function typeInto(page: Page, row: number, col: number, value: string) {
  await gridCell(page, row, col).click()
  await page.keyboard.type(value)
  await page.keyboard.press('Enter')
}

/** Paste tab-separated text at the selected cell through a real paste event. */
export async function paste(page: Page, text: string) {
  await page.evaluate((t) => {
    const dt = new DataTransfer()
    dt.setData('text/plain', t)
    const target = document.activeElement ?? document.body
    target.dispatchEvent(new ClipboardEvent('paste', { clipboardData: dt, bubbles: true, cancelable: true }))
  }, text)
}

/** In the editor: change one cell and save a revision with a message; returns the new revision number. */
export async function editAndSave(page: Page, mapId: number, row: number, col: number, value: string, message: string): Promise<number> {
  await page.goto(`/maps/${mapId}/edit`)
  await expect(gridCell(page, row, col)).toBeVisible()
  const base = Number(await page.getByTestId('base-revision').textContent())
  await typeInto(page, row, col, value)
  await page.getByLabel('Message (why)').fill(message)
  await page.getByRole('button', { name: 'Save revision' }).click()
  await expect(page).toHaveURL(new RegExp(`/maps/${mapId}\\?saved=${base + 1}$`))
  return base + 1
}

/** The review page of revision `n` of a map, through the notebook's history table. */
export async function openReview(page: Page, mapId: number, n: number) {
  await page.goto(`/maps/${mapId}`)
  await page.getByTestId(`history-row-${n}`).getByRole('link', { name: 'Review' }).click()
  await expect(page.getByRole('heading', { level: 1 })).toContainText(`r${n}`)
}

/** From the overview's first "Drive this set" link to a filed report; returns the report's id. */
export async function fileReportFromOverview(page: Page): Promise<number> {
  await page.goto('/')
  const drive = page.getByRole('link', { name: /^Drive this set: / }).first()
  const setName = ((await drive.getAttribute('aria-label')) ?? '').replace('Drive this set: ', '')
  const setNumber = setName.split('Set ')[1]
  await drive.click()
  await expect(page).toHaveURL(/\/reports\/new\?set=\d+$/)
  // The set the link named is chosen: its summary shows, naming it.
  await expect(page.getByTestId('set-summary')).toContainText(`set ${setNumber}`)
  await fillDriveConditions(page)
  await page.getByRole('button', { name: 'File report' }).click()
  await expect(page.getByText('Report filed.')).toBeVisible()
  return Number(new URL(page.url()).pathname.split('/')[2])
}

/** Where a guide's screenshot goes: docs/ when DOCS_SCREENSHOTS=1 (to refresh the guides), else test-results/. */
export function docShot(name: string): string {
  return process.env.DOCS_SCREENSHOTS === '1' ? `docs/${name}` : `test-results/docs/${name}`
}

/** The report form's conditions and ratings (every rating the same), as a driver fills them after a drive. */
export async function fillDriveConditions(
  page: Page,
  c = { unit: 'BX-07', route: 'Demo quarry, ramp 3', surface: 'gravel', weather: 'damp', tempC: '5', rating: 3 },
) {
  await page.getByLabel('Vehicle unit').fill(c.unit)
  await page.getByLabel('Route or course').fill(c.route)
  await page.getByLabel('Road surface').selectOption(c.surface)
  await page.getByLabel('Weather').fill(c.weather)
  await page.getByLabel('Ambient temperature (°C)').fill(c.tempC)
  for (const r of ['Launch', 'Tip-in', 'Steady pedal control', 'Lift-off regen', 'Brake blending']) await page.getByLabel(`${r} ${c.rating}`).check({ force: true })
}

/**
 * Every trace of every figure on the page is drawn as the type it asked for, and the types drawn.
 * The app's Plotly holds only the trace types it registers (app/_components/plots/plotly-component.ts);
 * Plotly turns a trace of any other type into an empty scatter, without an error.
 */
export async function expectEveryTraceDrawable(page: Page): Promise<string[]> {
  const traces = await page.evaluate(() =>
    [...document.querySelectorAll('.js-plotly-plot')].flatMap((el) => {
      const gd = el as unknown as { data?: { type?: string }[]; _fullData?: { type: string; index: number; _module?: unknown }[] }
      return (gd._fullData ?? []).map((t) => ({ asked: gd.data?.[t.index]?.type ?? 'scatter', drawn: t.type, module: Boolean(t._module) }))
    }),
  )
  expect(traces.length).toBeGreaterThan(0)
  expect(traces.filter((t) => t.asked !== t.drawn || !t.module)).toEqual([])
  return [...new Set(traces.map((t) => t.drawn))].sort()
}
