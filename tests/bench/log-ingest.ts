/**
 * Log ingest: a seeded 2-hour, 50 Hz drive log (360,001 rows, ≈ 30 MB) parsed and analysed end to
 * end as the upload path does (`ingestLog` over a file stream), against papaparse alone streaming
 * the same file (header: false, no analysis), interleaved in one run; peak memory growth measured
 * in a child process with --expose-gc.
 */
import { execFile } from 'node:child_process'
import fs from 'node:fs'
import path from 'node:path'
import { promisify } from 'node:util'
import Papa from 'papaparse'
import { ingestLog } from '@/app/_lib/reports/log-ingest'
import { INGEST_OPTIONS, writeBenchLog } from './log-file'
import type { MemoryReport } from './log-ingest-memory'
import { figure, isMain, median, now, ROOT, runStandalone, type BenchResult } from './report'

const BENCH = 'log-ingest'
const ROUNDS = 3

/** papaparse alone: streaming, header false, every row delivered to a chunk callback and counted. */
function bareParse(file: string): Promise<number> {
  return new Promise((resolve, reject) => {
    let rows = 0
    Papa.parse<string[], NodeJS.ReadableStream>(fs.createReadStream(file, { encoding: 'utf8' }), {
      header: false,
      delimiter: ',',
      skipEmptyLines: false,
      chunk(results) { rows += results.data.length },
      complete() { resolve(rows) },
      error(e: Error) { reject(e) },
    })
  })
}

async function timed<T>(f: () => Promise<T>): Promise<{ ms: number; value: T }> {
  const t0 = now()
  const value = await f()
  return { ms: now() - t0, value }
}

async function memoryInChild(file: string): Promise<MemoryReport> {
  const { stdout } = await promisify(execFile)(process.execPath, ['--expose-gc', '--conditions=react-server', '--import', 'tsx', path.join(ROOT, 'tests/bench/log-ingest-memory.ts'), file], { cwd: ROOT, maxBuffer: 1 << 20 })
  const last = stdout.trim().split('\n').pop() ?? ''
  return JSON.parse(last) as MemoryReport
}

export async function runLogIngest(): Promise<BenchResult> {
  const log = await writeBenchLog()
  try {
    const mb = log.bytes / 1e6
    await bareParse(log.file) // warm the page cache and both code paths
    await ingestLog(fs.createReadStream(log.file), INGEST_OPTIONS)
    const bare: number[] = []
    const full: number[] = []
    let rows = 0
    for (let i = 0; i < ROUNDS; i++) {
      bare.push((await timed(() => bareParse(log.file))).ms)
      const r = await timed(() => ingestLog(fs.createReadStream(log.file), INGEST_OPTIONS))
      full.push(r.ms)
      rows = r.value.samples
    }
    const bareRate = mb / (median(bare) / 1000)
    const fullRate = mb / (median(full) / 1000)
    const mem = await memoryInChild(log.file)
    return {
      bench: BENCH,
      figures: [
        figure(BENCH, 'log size', mb, 'MB', undefined, `${rows} data rows analysed`),
        figure(BENCH, 'end to end (ingestLog)', fullRate, 'MB/s', undefined, `median of ${ROUNDS}`),
        figure(BENCH, 'papaparse alone (streaming, header:false)', bareRate, 'MB/s', undefined, `median of ${ROUNDS}, interleaved`),
        figure(BENCH, 'end to end / bare parse', fullRate / bareRate, '×', { op: '>=', limit: 0.7 }),
        figure(BENCH, 'peak RSS growth', mem.rssGrowthMB, 'MB', { op: '<', limit: 150 }, 'child process, after gc'),
        figure(BENCH, 'peak heap growth', mem.heapGrowthMB, 'MB', undefined, 'same run'),
      ],
    }
  } finally { log.remove() }
}

if (isMain(import.meta.url)) void runStandalone(BENCH, runLogIngest)
