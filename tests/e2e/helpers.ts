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
  await expect(page.getByRole('heading', { name: /^Welcome,/ })).toBeVisible()
}
