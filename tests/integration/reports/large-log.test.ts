import { Readable } from 'node:stream'
import { describe, expect, it } from 'vitest'
import { analyse } from '@/app/_lib/reports/log-jobs'
import { putObjectStream } from '@/app/_lib/storage/object-store'
import { createLog, getLog } from '@/db/queries/logs'
import { generateLogChunks } from '@/tests/support/log-generator'
import { filedReport } from '@/tests/support/report-fixtures'

describe('a large log', () => {
  it('is parsed from storage as a stream with bounded memory (about 50 MB of CSV)', async () => {
    const { reportId } = await filedReport()
    const objectKey = `logs/report-${reportId}/large.csv`
    let bytes = 0
    const source = Readable.from(
      (async function* () {
        // About 50 MB: 4 h 50 min at 50 Hz of the generator's ten columns.
        for await (const chunk of generateLogChunks({ seed: 7, durationS: 17_400, rateHz: 50 })) {
          bytes += chunk.length
          yield chunk
        }
      })(),
    )
    await putObjectStream(objectKey, source, 'text/csv')
    expect(bytes).toBeGreaterThan(45 * 1024 * 1024)
    const log = await createLog({ reportId, objectKey, fileName: 'large.csv', sizeBytes: bytes, mapping: {} })

    global.gc?.()
    const base = process.memoryUsage().rss
    let peak = base
    const timer = setInterval(() => (peak = Math.max(peak, process.memoryUsage().rss)), 20)
    await analyse(log.id)
    clearInterval(timer)
    peak = Math.max(peak, process.memoryUsage().rss)
    const growthMb = (peak - base) / (1024 * 1024)
    console.log(`large log: ${(bytes / 1048576).toFixed(1)} MB parsed, peak RSS growth ${growthMb.toFixed(1)} MB`)

    const done = await getLog(log.id)
    expect(done?.status).toBe('done')
    const analysis = done?.analysis as { samples: number } | undefined
    expect(analysis?.samples).toBe(17_400 * 50 + 1)
    // Holding the file would cost at least its size again as a JS string (UTF-16: twice that).
    expect(growthMb).toBeLessThan(150)
  }, 240_000)
})
