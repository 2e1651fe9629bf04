import { expect, test } from './fixtures'
import type { Page } from '@playwright/test'
import { DEMO, fileReportFromOverview, signIn } from './helpers'

// The pages no other walk reaches — forms for new things, the report editor, the password pages —
// opened by the roles that use them, on a desktop and on a phone. The fixture scans each with axe.

async function opens(page: Page, path: string, heading: RegExp) {
  await page.goto(path)
  await expect(page.getByRole('heading', { level: 1 })).toContainText(heading)
}

test.describe('pages outside the other walks', () => {
  test('signed out: sign-in help and the set-password page', async ({ page }) => {
    await opens(page, '/forgot-password', /password/i)
    await page.goto('/set-password?token=not-a-real-token')
    await expect(page.getByLabel(/New password/)).toBeVisible()
  })

  for (const viewport of [{ width: 1440, height: 900 }, { width: 390, height: 844 }]) {
    test.describe(`at ${viewport.width} px`, () => {
      test.use({ viewport })

      test('a calibration engineer starts a new map and a new set', async ({ page }) => {
        await signIn(page, DEMO.calib)
        await opens(page, '/maps/new', /map/i)
        await opens(page, '/sets/new', /set/i)
        await opens(page, '/review', /review/i)
      })

      test('a lead starts a new vehicle program', async ({ page }) => {
        await signIn(page, DEMO.lead)
        await opens(page, '/programs/new', /program/i)
        await opens(page, '/not-allowed', /.+/)
      })

      test('a test driver files a report and opens it for editing', async ({ page }) => {
        await signIn(page, DEMO.driver)
        await opens(page, '/reports/new', /report/i)
        const reportId = await fileReportFromOverview(page)
        await page.getByRole('link', { name: 'Edit', exact: true }).click()
        await expect(page).toHaveURL(new RegExp(`/reports/${reportId}/edit$`))
        await expect(page.getByRole('heading', { level: 1 })).toBeVisible()
      })
    })
  }
})
