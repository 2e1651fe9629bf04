import { test } from './fixtures'

// The fixture itself: a page with an image without a text alternative (axe's critical `image-alt`)
// must fail the test that visited it. `test.fail` turns that expected failure into a pass, so this
// test fails if the fixture ever stops scanning.
test.fail('a visited page with a critical violation fails its test', async ({ page }) => {
  await page.context().route('**/axe-fixture-check', (route) =>
    route.fulfill({ contentType: 'text/html', body: '<!doctype html><html lang="en"><title>check</title><main><img src="/icon.svg"></main></html>' }),
  )
  await page.goto('/axe-fixture-check')
})
