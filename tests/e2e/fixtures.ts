// Every spec imports `test` from here, so every page any role's walk reaches gets the axe check:
// each page a test navigates to (in any of its browser contexts) is noted, and when the test has
// passed each one not yet checked in this run is opened again in the same context (same person,
// same viewport) and scanned; a critical or serious violation fails the test. Pages are told
// apart by route (ids collapsed), query keys, role and phone or desktop width, so a route is
// scanned once per role and width rather than once per visit. States a revisit cannot reach
// (an open dialog, a conflict) get explicit `expectAccessible` calls in their specs.
import { test as base, expect, type Browser, type BrowserContext, type Page } from '@playwright/test'
import { accessibilityProblems } from './axe'

export { expect }

const scanned = new Set<string>()

export const test = base.extend<{ axeEveryPage: void }>({
  axeEveryPage: [
    async ({ page, browser }, use, testInfo) => {
      const walk = new Walk()
      walk.watch(page.context())
      const restore = watchNewContexts(browser, walk)
      // The scans run after the test body; give them time of their own.
      testInfo.setTimeout(testInfo.timeout + 90_000)
      await use()
      restore()
      // Scan only after a body that passed (a failure already says what is wrong).
      if (testInfo.status !== 'passed') return
      const problems = await walk.scanNew()
      expect(problems, 'axe on every page of this walk').toEqual([])
    },
    { auto: true },
  ],
})

function watchNewContexts(browser: Browser, walk: Walk): () => void {
  const original = browser.newContext.bind(browser)
  browser.newContext = async (...args: Parameters<Browser['newContext']>) => {
    const context = await original(...args)
    walk.watch(context)
    return context
  }
  return () => {
    browser.newContext = original
  }
}

class Walk {
  private visits = new Map<BrowserContext, Set<string>>()
  private closed = new Set<BrowserContext>()

  watch(context: BrowserContext) {
    if (this.visits.has(context)) return
    const urls = new Set<string>()
    this.visits.set(context, urls)
    const follow = (p: Page) =>
      p.on('framenavigated', (frame) => {
        if (frame === p.mainFrame() && isAppPage(frame.url())) urls.add(frame.url())
      })
    context.pages().forEach(follow)
    context.on('page', follow)
    context.on('close', () => this.closed.add(context))
  }

  async scanNew(): Promise<string[]> {
    const problems: string[] = []
    for (const [context, urls] of this.visits) {
      if (urls.size === 0 || this.closed.has(context)) continue
      const page = await context.newPage()
      try {
        const who = await roleOf(context, [...urls][0])
        for (const url of urls) {
          const width = page.viewportSize()?.width ?? 1280
          const key = `${routeKey(url)} as ${who} on ${width < 600 ? 'phone' : 'desktop'}`
          if (scanned.has(key)) continue
          scanned.add(key)
          if (process.env.AXE_WALK_LOG) console.log('axe:', key)
          if (!(await reached(page, url))) continue
          for (const p of await accessibilityProblems(page)) problems.push(`${key} (${url}): ${p}`)
        }
      } finally {
        await page.close().catch(() => {})
      }
    }
    return problems
  }
}

/** Pages of the app, not its API answers, downloads or the browser's own pages. */
function isAppPage(url: string): boolean {
  if (!url.startsWith('http')) return false
  const path = new URL(url).pathname
  return !path.startsWith('/api/') && !path.startsWith('/_next/')
}

/** `/maps/12?saved=3` and `/maps/40?saved=7` are one page: ids collapse, query values drop. */
export function routeKey(url: string): string {
  const u = new URL(url)
  const path = u.pathname.replace(/\/\d+(?=\/|$)/g, '/:id')
  const keys = [...new Set(u.searchParams.keys())].sort()
  return keys.length ? `${path}?${keys.join('&')}` : path
}

async function roleOf(context: BrowserContext, someUrl: string): Promise<string> {
  try {
    const res = await context.request.get(new URL('/api/session', someUrl).toString())
    if (!res.ok()) return 'signed out'
    const body = (await res.json()) as { user?: { role?: string } }
    return body.user?.role ?? 'signed out'
  } catch {
    return 'signed out'
  }
}

/** Open the page again and let its client parts settle; false when the URL is a download. */
async function reached(page: Page, url: string): Promise<boolean> {
  try {
    await page.goto(url, { waitUntil: 'load' })
  } catch (e) {
    if (String(e).includes('Download is starting')) return false
    throw e
  }
  await page.waitForLoadState('networkidle', { timeout: 3_000 }).catch(() => {})
  return true
}
