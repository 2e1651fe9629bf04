/**
 * Child process of the log-ingest benchmark (run with --expose-gc): ingests one file end to end and
 * prints, as JSON on the last line, the peak growth of RSS and heap over the settled baseline.
 */
import fs from 'node:fs'
import { ingestLog } from '@/app/_lib/reports/log-ingest'
import { INGEST_OPTIONS } from './log-file'

export interface MemoryReport { rssGrowthMB: number; heapGrowthMB: number; rows: number; ms: number }

async function main(file: string): Promise<MemoryReport> {
  const gc = (globalThis as { gc?: () => void }).gc
  if (!gc) throw new Error('run with --expose-gc')
  // Load the modules and JIT the path on a small prefix first, so the baseline is the steady state.
  await ingestLog(fs.createReadStream(file, { end: 1 << 20 }), INGEST_OPTIONS).catch(() => undefined)
  gc(); gc()
  const base = process.memoryUsage()
  let peakRss = base.rss
  let peakHeap = base.heapUsed
  const sample = () => {
    const m = process.memoryUsage()
    if (m.rss > peakRss) peakRss = m.rss
    if (m.heapUsed > peakHeap) peakHeap = m.heapUsed
  }
  const timer = setInterval(sample, 5)
  const t0 = performance.now()
  const r = await ingestLog(fs.createReadStream(file), { ...INGEST_OPTIONS, onProgress: sample })
  const ms = performance.now() - t0
  clearInterval(timer)
  sample()
  return { rssGrowthMB: (peakRss - base.rss) / 2 ** 20, heapGrowthMB: (peakHeap - base.heapUsed) / 2 ** 20, rows: r.samples, ms }
}

const file = process.argv[2]
if (!file) { console.error('usage: log-ingest-memory.ts <file>'); process.exit(2) }
main(file).then((r) => { console.log(JSON.stringify(r)); process.exit(0) }, (e: unknown) => { console.error(e); process.exit(1) })
