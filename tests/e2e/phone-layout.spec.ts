import { expect, test } from './fixtures'
import { DEMO, openEditor, signIn } from './helpers'

test.use({ viewport: { width: 390, height: 844 } })

test('on a phone the map editor page fits the screen width (the grid scrolls inside its own box)', async ({ page }) => {
  await signIn(page, DEMO.calib)
  await openEditor(page, 'Site drive')
  await expect(page.getByRole('toolbar', { name: 'Map operations' })).toBeVisible()
  // The breakpoint group once ran 50 px past a 390 px screen, hiding "Remove speed column".
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth)
  expect(overflow).toBe(0)
  await expect(page.getByRole('button', { name: 'Remove speed column' })).toBeInViewport()
})
