/**
 * Editor page: the first-load JavaScript of /maps/[id]/edit (gzip, from the build's route bundle
 * stats, plot code excluded), and in Chromium against the production server: navigation → an
 * editable grid cell, and a cell edit (Enter) → the findings list and the small plot updated.
 */
import fs from 'node:fs'
import path from 'node:path'
import zlib from 'node:zlib'
import type { Page } from 'playwright-core'
import { launchChromium } from './browser'
import { DIST_DIR, figure, isMain, median, ROOT, runStandalone, type BenchResult, type Figure } from './report'
import { signIn, startServer, type BenchServer } from './server'

const BENCH = 'editor-page'
const ROUTE = '/maps/[id]/edit'
const LOADS = 5
const EDITS = 7
const CELL = '.ht_master [data-cell="3-3"]'
const PLOT = 'figure[aria-label="Plot of the selected row or column"]'
const isPlotCode = (src: Buffer) => /plotly/i.test(src.toString('latin1'))

interface RouteStats { route: string; firstLoadChunkPaths: string[] }

/** Gzip bytes of the route's first-load chunks, plot chunks left out. */
export function firstLoadGzip(): { bytes: number; chunks: number; plotChunks: number } {
  const file = path.join(DIST_DIR, 'diagnostics', 'route-bundle-stats.json')
  const stats = JSON.parse(fs.readFileSync(file, 'utf8')) as RouteStats[]
  const route = stats.find((r) => r.route === ROUTE)
  if (!route) throw new Error(`${ROUTE} not in ${file}`)
  let bytes = 0
  let plotChunks = 0
  for (const p of route.firstLoadChunkPaths) {
    const src = fs.readFileSync(path.join(ROOT, p))
    if (isPlotCode(src)) { plotChunks++; continue }
    bytes += zlib.gzipSync(src, { level: 9 }).length
  }
  return { bytes, chunks: route.firstLoadChunkPaths.length - plotChunks, plotChunks }
}

/** Navigates and returns ms from navigation start until the cell is present and editable, and the JS transferred by then. */
async function loadEditor(page: Page, url: string): Promise<{ ms: number; jsBytes: number }> {
  await page.goto(url, { waitUntil: 'commit' })
  const handle = await page.waitForFunction((sel) => {
    const td = document.querySelector(sel)
    if (!td || td.classList.contains('htDimmed')) return null
    const js = performance.getEntriesByType('resource').filter((e) => e.name.includes('.js')) as PerformanceResourceTiming[]
    return { ms: performance.now(), jsBytes: js.reduce((a, e) => a + (e.encodedBodySize || e.transferSize), 0) }
  }, CELL, { polling: 'raf', timeout: 60_000 })
  return (await handle.jsonValue()) as { ms: number; jsBytes: number }
}

interface EditTiming { both: number; findings: number; plot: number }

/** Types a value into the cell; returns ms from the committing Enter keydown to the first change of the findings list and of the plot. */
async function editCell(page: Page, value: string): Promise<EditTiming> {
  // The grid takes two clicks on one cell within 500 ms as a double click (which opens the editor, so the
  // Enter below would commit at once and Ctrl+A select the whole grid): let the previous click age first.
  await page.waitForTimeout(600)
  await page.locator(CELL).click()
  await page.evaluate(({ plot }) => {
    const w = window as unknown as { __bench: { t0: number; findings: number; plot: number } }
    w.__bench = { t0: 0, findings: 0, plot: 0 }
    const watch = (el: Element | null, key: 'findings' | 'plot') => {
      if (!el) return
      new MutationObserver((_, obs) => { if (w.__bench.t0 && !w.__bench[key]) { w.__bench[key] = performance.now(); obs.disconnect() } })
        .observe(el, { subtree: true, childList: true, attributes: true, characterData: true })
    }
    watch(document.querySelector('[data-testid="findings-list"]')?.closest('section') ?? null, 'findings')
    watch(document.querySelector(plot), 'plot')
  }, { plot: PLOT })
  await page.keyboard.press('Enter') // open the editor
  await page.locator('.handsontableInputHolder:not(.ht_editor_hidden)').waitFor()
  await page.keyboard.press('ControlOrMeta+A')
  await page.keyboard.type(value)
  // The clock starts at the committing Enter: a listener taken before the opening Enter (the editor's
  // field exists from the first selection) started it there, and counted the typing too.
  await page.evaluate(() => {
    const w = window as unknown as { __bench: { t0: number } }
    window.addEventListener('keydown', (e) => { if (e.key === 'Enter') w.__bench.t0 = e.timeStamp }, { capture: true, once: true })
  })
  await page.keyboard.press('Enter') // commit: the timed edit
  const h = await page.waitForFunction(() => {
    const b = (window as unknown as { __bench: { t0: number; findings: number; plot: number } }).__bench
    return b.t0 && b.findings && b.plot ? { both: Math.max(b.findings, b.plot) - b.t0, findings: b.findings - b.t0, plot: b.plot - b.t0 } : null
  }, undefined, { polling: 'raf', timeout: 30_000 })
  return (await h.jsonValue()) as EditTiming
}

/** One more edit under the CDP profiler: where the main thread spends the edit, by script (top 5). */
async function traceEdit(page: Page): Promise<string> {
  const cdp = await page.context().newCDPSession(page)
  await cdp.send('Profiler.enable')
  await cdp.send('Profiler.setSamplingInterval', { interval: 100 })
  await cdp.send('Profiler.start')
  await editCell(page, '12345')
  const { profile } = await cdp.send('Profiler.stop')
  const self = new Map<string, number>()
  const dt = new Map<number, number>()
  profile.samples?.forEach((id, i) => dt.set(id, (dt.get(id) ?? 0) + (profile.timeDeltas?.[i] ?? 0)))
  for (const n of profile.nodes) {
    const url = n.callFrame.url.split('/').pop() || n.callFrame.functionName || '(native)'
    self.set(url, (self.get(url) ?? 0) + (dt.get(n.id) ?? 0))
  }
  await cdp.detach()
  return [...self].filter(([k]) => k !== '(idle)' && k !== '(program)').sort((a, b) => b[1] - a[1]).slice(0, 5).map(([k, us]) => `${k} ${(us / 1000).toFixed(0)} ms`).join(', ')
}

export async function runEditorPage(shared?: BenchServer): Promise<BenchResult> {
  const bundle = firstLoadGzip()
  const figures: Figure[] = [
    figure(BENCH, 'first-load JS, gzip (build stats)', bundle.bytes / 1000, 'kB', { op: '<', limit: 400 }, `${bundle.chunks} chunks${bundle.plotChunks ? `, ${bundle.plotChunks} plot chunks left out` : ', no plot code among them'}`),
  ]
  const server = shared ?? (await startServer())
  // The e2e suite's choice of browser: CHROMIUM_PATH, Debian's, else the one inside @sparticuz/chromium.
  const browser = await launchChromium()
  try {
    const { baseUrl } = server
    const { cookie, cookies } = await signIn(baseUrl)
    const maps = (await (await fetch(`${baseUrl}/api/maps`, { headers: { cookie } })).json()) as { maps: { id: number; kind: string; name: string }[] }
    const map = maps.maps.filter((m) => m.kind === 'drive').at(-1)
    if (!map) throw new Error('no demo drive map')
    const context = await browser.newContext({ baseURL: baseUrl })
    await context.addInitScript('globalThis.__name = (f) => f') // tsx keeps function names with a helper the page lacks
    await context.addCookies(cookies.map((c) => ({ ...c, domain: '127.0.0.1', path: '/' })))
    const page = await context.newPage()
    const url = `/maps/${map.id}/edit`
    await loadEditor(page, url) // warm the server's route and the browser's cache once, like a returning user … 
    const loads: number[] = []
    let jsBytes = 0
    for (let i = 0; i < LOADS; i++) {
      await context.clearCookies()
      await context.addCookies(cookies.map((c) => ({ ...c, domain: '127.0.0.1', path: '/' })))
      const fresh = await context.newPage() // … but each timed load starts a fresh page
      await fresh.evaluate(() => localStorage.clear()).catch(() => undefined)
      const r = await loadEditor(fresh, url)
      loads.push(r.ms)
      jsBytes = r.jsBytes
      await fresh.close()
    }
    const edits: EditTiming[] = []
    for (let i = 0; i < EDITS; i++) edits.push(await editCell(page, String(9000 + i * 500)))
    const trace = await traceEdit(page)
    figures.push(
      figure(BENCH, 'JS loaded before the grid is editable', jsBytes / 1000, 'kB', undefined, 'compressed bytes on the wire, incl. the lazy grid chunk'),
      figure(BENCH, 'navigation → editable grid', median(loads), 'ms', { op: '<', limit: 1500 }, `median of ${LOADS}`),
      figure(BENCH, 'cell edit → findings and plot updated', median(edits.map((e) => e.both)), 'ms', { op: '<=', limit: 30 }, `median of ${EDITS}`),
      figure(BENCH, 'cell edit → findings list changed', median(edits.map((e) => e.findings)), 'ms'),
      figure(BENCH, 'cell edit → small plot changed', median(edits.map((e) => e.plot)), 'ms'),
    )
    await context.close()
    return { bench: BENCH, figures, notes: [`map ${map.id} "${map.name}"`, `one traced edit, main-thread self time by script: ${trace}`] }
  } finally {
    await browser.close()
    if (!shared) await server.stop()
  }
}

if (isMain(import.meta.url)) void runStandalone(BENCH, () => runEditorPage())
