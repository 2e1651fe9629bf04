/**
 * The compare and physics pages in Chromium against the production server, like the editor-page
 * benchmark: navigation → usable, median of LOADS fresh pages after one warm-up load (a returning
 * user: the browser has the scripts cached, each page starts fresh). For each page the time to its
 * first 2-D view and the time to everything drawn are reported, with where the time went in the
 * median load: the HTML, the plot library's chunk (fetch and run), and the plots after it.
 *
 * - compare (two revisions of one drive map, empty on gravel): 2-D = the change table and both slip
 *   heat maps drawn; usable = that plus the difference heat map and the surfaces A and B drawn in WebGL.
 * - physics (the first demo program): usable = the traction table and the first plot drawn.
 */
import type { Browser, Page } from 'playwright-core'
import { launchChromium } from './browser'
import { figure, isMain, median, runStandalone, type BenchResult, type Figure } from './report'
import { signIn, startServer, type BenchServer } from './server'

const BENCH = 'plot-pages'
const LOADS = 5

/** What the page waits for: CSS selectors that must all match, each at least `count` times. */
interface Goal { name: string; all: { sel: string; count: number }[] }

interface Load { ms: Record<string, number>; htmlMs: number; plotChunk: { startMs: number; endMs: number; kB: number } | null }

/** Navigates in a fresh page and records, per goal, ms from navigation start until it is met. */
async function timeLoad(page: Page, url: string, goals: Goal[]): Promise<Load> {
  await page.goto(url, { waitUntil: 'commit' })
  const h = await page.waitForFunction((gs: Goal[]) => {
    const w = window as unknown as { __goals?: Record<string, number> }
    const met = (w.__goals ??= {})
    for (const g of gs) if (!(g.name in met) && g.all.every((c) => document.querySelectorAll(c.sel).length >= c.count)) met[g.name] = performance.now()
    if (gs.some((g) => !(g.name in met))) return null
    const nav = performance.getEntriesByType('navigation')[0] as PerformanceNavigationTiming | undefined
    const js = (performance.getEntriesByType('resource') as PerformanceResourceTiming[]).filter((e) => e.name.includes('.js'))
    // The plot library is by far the largest script the app loads.
    const big = js.sort((a, b) => (b.decodedBodySize || 0) - (a.decodedBodySize || 0))[0]
    return {
      ms: met,
      htmlMs: nav ? nav.responseEnd : NaN,
      plotChunk: big && big.decodedBodySize > 1_000_000 ? { startMs: big.startTime, endMs: big.responseEnd, kB: big.decodedBodySize / 1000 } : null,
    }
  }, goals, { polling: 'raf', timeout: 90_000 })
  return (await h.jsonValue()) as Load
}

async function measure(browser: Browser, baseUrl: string, cookies: { name: string; value: string }[], url: string, goals: Goal[]): Promise<Load[]> {
  const context = await browser.newContext({ baseURL: baseUrl, viewport: { width: 1400, height: 900 } })
  await context.addInitScript('globalThis.__name = (f) => f') // tsx keeps function names with a helper the page lacks
  await context.addCookies(cookies.map((c) => ({ ...c, domain: '127.0.0.1', path: '/' })))
  try {
    const warm = await context.newPage()
    await timeLoad(warm, url, goals) // warms the server's routes and the browser's cache
    await warm.close()
    const loads: Load[] = []
    for (let i = 0; i < LOADS; i++) {
      const p = await context.newPage()
      loads.push(await timeLoad(p, url, goals))
      await p.close()
    }
    return loads
  } finally {
    await context.close()
  }
}

/** The load whose last goal is the median one, with its breakdown as a note. */
function breakdown(loads: Load[], last: string): string {
  const sorted = [...loads].sort((a, b) => a.ms[last] - b.ms[last])
  const m = sorted[sorted.length >> 1]
  const chunk = m.plotChunk ? `plot chunk ${m.plotChunk.kB.toFixed(0)} kB fetched ${m.plotChunk.startMs.toFixed(0)}–${m.plotChunk.endMs.toFixed(0)} ms` : 'plot chunk not among the scripts'
  return `median load: HTML done at ${m.htmlMs.toFixed(0)} ms, ${chunk}, ` + Object.entries(m.ms).map(([k, v]) => `${k} at ${v.toFixed(0)} ms`).join(', ')
}

export async function runPlotPages(shared?: BenchServer): Promise<BenchResult> {
  const server = shared ?? (await startServer())
  let browser: Browser | null = null
  try {
    const { baseUrl } = server
    const { cookie, cookies } = await signIn(baseUrl)
    const maps = (await (await fetch(`${baseUrl}/api/maps`, { headers: { cookie } })).json()) as { maps: { id: number; kind: string; name: string; programId: number; latestNumber: number | null }[] }
    const pair = maps.maps.find((m) => m.kind === 'drive' && (m.latestNumber ?? 0) >= 3) ?? maps.maps.find((m) => m.kind === 'drive' && (m.latestNumber ?? 0) >= 2)
    if (!pair) throw new Error('no demo drive map with two revisions')
    const last = pair.latestNumber ?? 2
    browser = await launchChromium()

    const compareUrl = `/maps/compare?a=${pair.id}:${last - 1}&b=${pair.id}:${last}&loadCase=empty&surface=gravel`
    const twoD: Goal = { name: '2-D views', all: [{ sel: '[data-testid="change-table"] tbody tr', count: 1 }, { sel: '[data-testid="slip-heatmap-a"] .main-svg', count: 1 }, { sel: '[data-testid="slip-heatmap-b"] .main-svg', count: 1 }] }
    const surfaces: Goal = { name: 'surfaces', all: [{ sel: '[data-testid="compare-surfaces"] .js-plotly-plot .gl-container canvas', count: 2 }, { sel: '[data-testid="difference-heatmap"] .main-svg', count: 1 }] }
    const compare = await measure(browser, baseUrl, cookies, compareUrl, [twoD, surfaces])
    const compareAll = compare.map((l) => Math.max(l.ms[twoD.name], l.ms[surfaces.name]))

    const physicsUrl = `/programs/${pair.programId}/physics`
    const table: Goal = { name: 'traction table', all: [{ sel: '[data-testid="traction-table"] tbody tr', count: 1 }] }
    const plot: Goal = { name: 'first plot', all: [{ sel: '.js-plotly-plot .main-svg', count: 1 }] }
    const physics = await measure(browser, baseUrl, cookies, physicsUrl, [table, plot])
    const physicsAll = physics.map((l) => Math.max(l.ms[table.name], l.ms[plot.name]))

    const figures: Figure[] = [
      figure(BENCH, 'compare: navigation → change table and slip heat maps', median(compare.map((l) => l.ms[twoD.name])), 'ms', undefined, `median of ${LOADS}`),
      figure(BENCH, 'compare: navigation → both surfaces, the difference and the slip maps', median(compareAll), 'ms', { op: '<=', limit: 1500 }, `median of ${LOADS}`),
      figure(BENCH, 'physics: navigation → traction table', median(physics.map((l) => l.ms[table.name])), 'ms', undefined, `median of ${LOADS}`),
      figure(BENCH, 'physics: navigation → traction table and first plot', median(physicsAll), 'ms', { op: '<=', limit: 1000 }, `median of ${LOADS}`),
    ]
    return {
      bench: BENCH,
      figures,
      notes: [
        `compare ${compareUrl}: ${breakdown(compare, surfaces.name)}`,
        `physics ${physicsUrl}: ${breakdown(physics, plot.name)}`,
        'Chromium headless with --disable-gpu: the 3-D surfaces are drawn by software WebGL',
      ],
    }
  } finally {
    await browser?.close()
    if (!shared) await server.stop()
  }
}

if (isMain(import.meta.url)) void runStandalone(BENCH, () => runPlotPages())
