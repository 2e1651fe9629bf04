import { expect, test } from './fixtures'
import { DEMO, signIn } from './helpers'

const NAV = (page: import('@playwright/test').Page) => page.getByRole('navigation', { name: 'Main' })

test.describe('signing in', () => {
  for (const [who, email, badge, seesUsers] of [
    ['an admin', DEMO.admin, 'admin', true],
    ['a lead engineer', DEMO.lead, 'lead engineer', false],
    ['a calibration engineer', DEMO.calib, 'calibration engineer', false],
    ['a test driver', DEMO.driver, 'test driver', false],
  ] as const) {
    test(`${who} signs in and sees that role's navigation`, async ({ page }) => {
      await signIn(page, email)
      await expect(page.getByTestId('role-badge')).toHaveText(badge)
      await expect(NAV(page).getByRole('link', { name: 'Vehicle programs' })).toBeVisible()
      await expect(NAV(page).getByRole('link', { name: 'Users' })).toHaveCount(seesUsers ? 1 : 0)
    })
  }

  test('a wrong password shows an error and stays on the sign-in page', async ({ page }) => {
    await page.goto('/signin')
    await page.getByLabel('Email').fill(DEMO.lead)
    await page.getByLabel('Password').fill('not the password')
    await page.getByRole('button', { name: 'Sign in' }).click()
    await expect(page.getByRole('alert').filter({ hasText: /Wrong email or password/ })).toBeVisible()
    await expect(page).toHaveURL(/\/signin/)
  })

  test('a page needs a session: anonymous visitors are sent to sign in', async ({ page }) => {
    await page.goto('/programs')
    await expect(page).toHaveURL(/\/signin/)
  })
})

test('an admin creates a user who then signs in', async ({ page, browser }) => {
  await signIn(page, DEMO.admin)
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Users' }).click()
  const email = `new.driver.${Date.now()}@brackwater.example`
  await page.getByLabel('Name').fill('New Test Driver')
  await page.getByLabel('Email').fill(email)
  await page.getByLabel('Role', { exact: true }).selectOption('test_driver')
  await page.getByLabel('Initial password').fill('a fresh password 42')
  await page.getByRole('button', { name: 'Create user' }).click()
  await expect(page.getByRole('status').filter({ hasText: 'Created' })).toHaveText(`Created ${email}.`)
  await expect(page.getByTestId(`user-row-${email}`)).toBeVisible()

  const other = await browser.newContext()
  const page2 = await other.newPage()
  await signIn(page2, email, 'a fresh password 42')
  await expect(page2.getByTestId('role-badge')).toHaveText('test driver')
  await other.close()
})

test('a test driver is refused the admin API with 403 and the admin page', async ({ page }) => {
  await signIn(page, DEMO.driver)
  const res = await page.request.get('/api/users')
  expect(res.status()).toBe(403)
  const body = await res.json()
  expect(body.error.code).toBe('forbidden')
  await page.goto('/admin/users')
  await expect(page.getByRole('heading', { name: 'Not allowed for your role' })).toBeVisible()
})

test('an engineer is told clearly when a vehicle program is out of range', async ({ page }) => {
  await signIn(page, DEMO.calib)
  await page.goto('/programs')
  await page.getByRole('link', { name: 'BX-64 Tipper' }).click()
  const mass = page.getByLabel('Empty (kerb) mass')
  await mass.fill('-100')
  await mass.blur()
  await page.getByRole('button', { name: 'Save program' }).click()
  await expect(page.getByText('Empty mass must be greater than 0 kg')).toBeVisible()
})
