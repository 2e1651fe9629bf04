/**
 * `npm run bench`: every benchmark in one run, one printed line per figure, all figures written to
 * docs/benchmarks.json. Always exits 0: a missed target or a benchmark that could not run is printed.
 * `npm run bench -- api-load plot-pages` runs only the named ones (and writes only their figures).
 */
import os from 'node:os'
import { runApiLoad } from './api-load'
import { runEditorPage } from './editor-page'
import { runHistoryGrowth } from './history-growth'
import { runLogIngest } from './log-ingest'
import { runPlotPages } from './plot-pages'
import { runReplay } from './replay'
import { printResult, writeResults, type BenchResult } from './report'
import { startServer, type BenchServer } from './server'
import { runSlipSweep } from './slip-sweep'

const only = process.argv.slice(2)
const SERVER_BENCHES = ['editor-page', 'plot-pages', 'api-load']

async function attempt(name: string, run: () => Promise<BenchResult>, out: BenchResult[]): Promise<void> {
  if (only.length > 0 && !only.includes(name)) return
  const t0 = performance.now()
  try {
    const r = await run()
    r.notes = [...(r.notes ?? []), `load average at end ${os.loadavg().map((x) => x.toFixed(1)).join(' ')} on ${os.availableParallelism()} CPUs; ${((performance.now() - t0) / 1000).toFixed(0)} s`]
    printResult(r)
    out.push(r)
  } catch (e) {
    console.error(`${name}: could not measure: ${e instanceof Error ? e.message : String(e)}`)
  }
}

/** The benchmarks that drive the production server share one server. */
async function serverBenches(results: BenchResult[]): Promise<void> {
  let server: BenchServer | null = null
  try {
    server = await startServer()
    const s = server
    await attempt('editor-page', () => runEditorPage(s), results)
    await attempt('plot-pages', () => runPlotPages(s), results)
    await attempt('api-load', () => runApiLoad(s), results)
  } catch (e) {
    console.error(`server benchmarks: could not start the server: ${e instanceof Error ? e.message : String(e)}`)
  } finally {
    await server?.stop()
  }
}

async function main(): Promise<void> {
  const results: BenchResult[] = []
  await attempt('slip-sweep', runSlipSweep, results)
  await attempt('log-ingest', runLogIngest, results)
  await attempt('replay', runReplay, results)
  await attempt('history-growth', runHistoryGrowth, results)
  if (only.length === 0 || only.some((n) => SERVER_BENCHES.includes(n))) await serverBenches(results)
  writeResults(results)
  const figures = results.flatMap((r) => r.figures).filter((f) => f.target)
  console.log(`\n${figures.filter((f) => f.met).length} of ${figures.length} targets met; figures written to docs/benchmarks.json`)
}

main().catch((e: unknown) => console.error(e)).finally(() => process.exit(0))
