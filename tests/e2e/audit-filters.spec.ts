import { expect, test } from './fixtures'
import { DEMO, signIn } from './helpers'

test.describe('audit trail filters', () => {
  test('an out-of-range date or an unknown filter is said on the page, not a server error', async ({ page }) => {
    await signIn(page, DEMO.admin)
    // Year 0 parses in JavaScript and 275760 does not: both once reached the query (the second as a 500).
    for (const since of ['0000-01-01', '275760-01-01']) {
      const res = await page.goto(`/admin/audit?since=${since}`)
      expect(res?.status(), since).toBe(200)
      await expect(page.getByTestId('audit-filter-problems')).toContainText('since must be a date from 1970-01-01 to 9999-12-31')
      await expect(page.getByTestId('audit-table').locator('tbody tr')).toHaveCount(0)
    }
    await page.goto('/admin/audit?programId=abc')
    await expect(page.getByTestId('audit-filter-problems')).toContainText('programId')
  })

  test('a valid filter lists the matching entries', async ({ page }) => {
    await signIn(page, DEMO.admin)
    await page.goto('/admin/audit?entityType=map&since=2000-01-01')
    await expect(page.getByTestId('audit-filter-problems')).toHaveCount(0)
    await expect(page.getByTestId('audit-table').locator('tbody tr').first()).toBeVisible()
    for (const cell of await page.getByTestId('audit-table').locator('tbody tr td:nth-child(4)').allTextContents()) expect(cell).toMatch(/^map/)
  })
})
