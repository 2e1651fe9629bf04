import { expect, type Page } from '@playwright/test'

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

/** A grid cell of the map editor by grid coordinates (row 0 = speed breakpoints, column 0 = pedal breakpoints). */
export function gridCell(page: Page, row: number, col: number) {
  const layer = row === 0 && col === 0 ? 'ht_clone_top_inline_start_corner' : row === 0 ? 'ht_clone_top' : col === 0 ? 'ht_clone_inline_start' : 'ht_master'
  return page.locator(`.${layer} [data-cell="${row}-${col}"]`)
}

/** Open a map's notebook from the maps list; returns its id. */
export async function openMapByName(page: Page, name: string): Promise<number> {
  await page.goto('/maps')
  await page.getByRole('link', { name, exact: true }).first().click()
  await expect(page).toHaveURL(/\/maps\/\d+$/)
  return Number(new URL(page.url()).pathname.split('/')[2])
}

/** In the editor: change one cell and save a revision with a message; returns the new revision number. */
export async function editAndSave(page: Page, mapId: number, row: number, col: number, value: string, message: string): Promise<number> {
  await page.goto(`/maps/${mapId}/edit`)
  await expect(gridCell(page, row, col)).toBeVisible()
  const base = Number(await page.getByTestId('base-revision').textContent())
  await gridCell(page, row, col).click()
  await page.keyboard.type(value)
  await page.keyboard.press('Enter')
  await page.getByLabel('Message (why)').fill(message)
  await page.getByRole('button', { name: 'Save revision' }).click()
  await expect(page).toHaveURL(new RegExp(`/maps/${mapId}\\?saved=${base + 1}$`))
  return base + 1
}
