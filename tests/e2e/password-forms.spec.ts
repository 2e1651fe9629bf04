import { expect, test } from './fixtures'
import { DEMO, DEMO_PASSWORD, signIn } from './helpers'

// A submit before the page's scripts run is a plain HTML form submission: with scripts off it is
// exactly that. A form without method="post" would then put the password in the URL.
test.describe('password forms post even before scripts load', () => {
  test('sign-in and set-password pages', async ({ browser }) => {
    const ctx = await browser.newContext({ javaScriptEnabled: false })
    const page = await ctx.newPage()
    const requests: { method: string; url: string }[] = []
    page.on('request', (r) => requests.push({ method: r.method(), url: r.url() }))

    await page.goto('/signin')
    await page.getByLabel('Email').fill(DEMO.lead)
    await page.getByLabel('Password').fill(DEMO_PASSWORD)
    await page.getByRole('button', { name: 'Sign in' }).click()
    await page.waitForLoadState()

    await page.goto('/set-password?token=not-a-real-token')
    await page.getByLabel(/New password/).fill('a secret password 99')
    await page.getByLabel('Repeat it').fill('a secret password 99')
    await page.getByRole('button', { name: 'Set password' }).click()
    await page.waitForLoadState()
    for (const r of requests) {
      expect(r.url).not.toContain(encodeURIComponent(DEMO_PASSWORD))
      expect(r.url).not.toContain('secret')
      expect(r.url).not.toContain(encodeURIComponent(DEMO.lead))
    }
    expect(requests.some((r) => r.method === 'POST')).toBe(true)
    await ctx.close()
  })

  test('the new-user form of the admin page', async ({ page, browser }) => {
    // Sign in with scripts on, then reuse the session cookie in a context without scripts.
    await signIn(page, DEMO.admin)
    const ctx = await browser.newContext({ javaScriptEnabled: false, storageState: await page.context().storageState() })
    const noJs = await ctx.newPage()
    const urls: string[] = []
    noJs.on('request', (r) => urls.push(r.url()))
    await noJs.goto('/admin/users')
    await noJs.getByLabel('Initial password').fill('another secret 1234')
    await noJs.getByRole('button', { name: 'Create user' }).click()
    await noJs.waitForLoadState()
    for (const u of urls) expect(u).not.toContain('another')
    await ctx.close()
  })
})
