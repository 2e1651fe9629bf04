import { expect, test } from './fixtures'
import type { Page } from '@playwright/test'
import { DEMO, mapIdByName, signIn } from './helpers'

/** Open `path` and expect the 404 page inside the signed-in frame (not a 500, not a blank error). */
async function expectNotFound(page: Page, path: string) {
  const res = await page.goto(path)
  expect(res?.status(), path).toBe(404)
  await expect(page.getByRole('heading', { name: 'Page not found' })).toBeVisible()
  await expect(page.getByRole('navigation', { name: 'Main' })).toBeVisible()
}

test.describe('addresses that name nothing', () => {
  test('malformed and out-of-range ids are the 404 page, read with the API rule', async ({ page }) => {
    await signIn(page, DEMO.calib)
    const site = await mapIdByName(page, 'Site drive')
    // 99999999999 does not fit an integer column (the 500 this replaces); the rest are not plain digits.
    for (const path of ['/maps/99999999999', '/maps/abc', '/reports/0x10', '/review/1e3', '/programs/2147483648', '/programs/1.5/physics', `/maps/${site}/revisions/1e3`, `/maps/${site}/edit?from=abc`]) {
      await expectNotFound(page, path)
    }
    // A well-formed id that names no map is the same page.
    await expectNotFound(page, '/maps/2147483647')
    // The same map with a real revision still opens.
    const ok = await page.goto(`/maps/${site}/revisions/1`)
    expect(ok?.status()).toBe(200)
  })

  test('an unknown address is the 404 page with the header of whoever is signed in', async ({ page }) => {
    await signIn(page, DEMO.lead)
    const res = await page.goto('/no-such-page')
    expect(res?.status()).toBe(404)
    await expect(page.getByRole('heading', { name: 'Page not found' })).toBeVisible()
    await expect(page.getByTestId('role-badge')).toHaveText('lead engineer')
  })

  test('a compare reference beyond any id shows the picker with the reason, not an error', async ({ page }) => {
    await signIn(page, DEMO.driver)
    await page.goto('/maps/compare?a=99999999999:1&b=1:1')
    await expect(page.getByRole('heading', { name: 'Compare two revisions' })).toBeVisible()
    await expect(page.getByText('Give both revisions as map:number')).toBeVisible()
  })

  test('signed out, a malformed id still asks for sign-in first', async ({ page }) => {
    await page.goto('/maps/abc')
    await expect(page).toHaveURL(/\/signin/)
    await expect(page.getByRole('link', { name: 'Sign in' })).toBeVisible()
  })
})
