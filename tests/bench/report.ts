/**
 * Shared reporter for the benchmarks: one printed line per figure, and the figures written to
 * docs/benchmarks.json. A benchmark only prints and records; it never fails a run.
 */
import fs from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { fileURLToPath, pathToFileURL } from 'node:url'

/** A target: the value must be at most / at least `limit`. */
export interface Target { op: '<=' | '<' | '>=' | '>'; limit: number }

/** One measured figure. */
export interface Figure {
  bench: string
  name: string
  value: number
  unit: string
  target?: Target
  met?: boolean
  note?: string
}

export interface BenchResult { bench: string; figures: Figure[]; notes?: string[] }

export const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..')
/** The production build's folder (NEXT_DIST_DIR lets several worktrees' builds live side by side, as next.config.ts does). */
export const DIST_DIR = path.join(ROOT, process.env.NEXT_DIST_DIR || '.next')
export const RESULTS_FILE = path.join(ROOT, 'docs', 'benchmarks.json')

function meets(value: number, t: Target): boolean {
  switch (t.op) {
    case '<=': return value <= t.limit
    case '<': return value < t.limit
    case '>=': return value >= t.limit
    case '>': return value > t.limit
  }
}

/** Builds a figure, deciding met/missed when there is a target. */
export function figure(bench: string, name: string, value: number, unit: string, target?: Target, note?: string): Figure {
  const f: Figure = { bench, name, value: round(value), unit }
  if (target) { f.target = target; f.met = meets(value, target) }
  if (note) f.note = note
  return f
}

/** Four significant digits are plenty on a shared, noisy machine. */
export function round(x: number): number {
  if (!Number.isFinite(x) || x === 0) return x
  const d = Math.max(0, 3 - Math.floor(Math.log10(Math.abs(x))))
  return Number(x.toFixed(Math.min(d, 9)))
}

export function median(xs: readonly number[]): number {
  if (xs.length === 0) return NaN
  const s = [...xs].sort((a, b) => a - b)
  const m = s.length >> 1
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2
}

/** The p-th percentile (0–100) by nearest rank. */
export function percentile(xs: readonly number[], p: number): number {
  if (xs.length === 0) return NaN
  const s = [...xs].sort((a, b) => a - b)
  return s[Math.min(s.length - 1, Math.max(0, Math.ceil((p / 100) * s.length) - 1))]
}

export function formatFigure(f: Figure): string {
  const t = f.target ? `  (target ${f.target.op} ${f.target.limit} ${f.unit}: ${f.met ? 'target met' : 'target missed'})` : ''
  return `${f.bench.padEnd(16)} ${f.name.padEnd(44)} ${String(f.value).padStart(12)} ${f.unit}${t}${f.note ? `  — ${f.note}` : ''}`
}

export function printResult(r: BenchResult): void {
  for (const f of r.figures) console.log(formatFigure(f))
  for (const n of r.notes ?? []) console.log(`${r.bench.padEnd(16)} note: ${n}`)
}

interface ResultsFile { generatedAt: string; node: string; platform: string; cpus: number; benches: Record<string, BenchResult & { ranAt: string }> }

/** Merges results into docs/benchmarks.json (a benchmark run alone replaces only its own entry). */
export function writeResults(results: readonly BenchResult[]): void {
  let file: ResultsFile | null = null
  try { file = JSON.parse(fs.readFileSync(RESULTS_FILE, 'utf8')) as ResultsFile } catch { file = null }
  const now = new Date().toISOString()
  const benches = { ...(file?.benches ?? {}) }
  for (const r of results) benches[r.bench] = { ...r, ranAt: now }
  const out: ResultsFile = { generatedAt: now, node: process.version, platform: `${process.platform}-${process.arch}`, cpus: availableCpus(), benches }
  fs.mkdirSync(path.dirname(RESULTS_FILE), { recursive: true })
  fs.writeFileSync(RESULTS_FILE, JSON.stringify(out, null, 2) + '\n')
}

function availableCpus(): number {
  return os.availableParallelism()
}

/** True when the module at `metaUrl` is the script node was started with. */
export function isMain(metaUrl: string): boolean {
  const entry = process.argv[1]
  return !!entry && pathToFileURL(path.resolve(entry)).href === metaUrl
}

/** Runs one benchmark as a script: print, record, always exit 0 (a failure to measure is printed, not thrown). */
export async function runStandalone(bench: string, run: () => Promise<BenchResult>): Promise<void> {
  try {
    const r = await run()
    printResult(r)
    writeResults([r])
  } catch (e) {
    console.error(`${bench}: could not measure: ${e instanceof Error ? e.stack ?? e.message : String(e)}`)
  }
  process.exit(0)
}

/** Wall-clock milliseconds. */
export const now = (): number => performance.now()
