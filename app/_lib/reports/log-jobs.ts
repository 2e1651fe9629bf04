// The demo seed runs the same analysis from a script, under tsx --conditions=react-server (see package.json).
import 'server-only'
import { getLog, setLogProgress } from '@/db/queries/logs'
import { getReport } from '@/db/queries/reports'
import { getRevisionWithMap } from '@/db/queries/maps'
import { LogFormatError } from '@/physics'
import { ingestLog } from './log-ingest'
import { getObjectStream } from '../storage/object-store'

// Analyses running in this process, so a second request for the same log does not start another.
const running = new Set<number>()

/**
 * Parse and analyse a stored log in the background: streamed from storage, never held whole in
 * memory, progress written to the log row so the report page can show it. A malformed file ends
 * as 'failed' with the line and column at fault; the raw file stays in storage either way.
 */
export function startLogAnalysis(logId: number): void {
  if (running.has(logId)) return
  running.add(logId)
  analyse(logId)
    .catch(async (e) => {
      const message = e instanceof LogFormatError ? e.message : 'The log could not be analysed; the file is kept and the analysis can be run again'
      if (!(e instanceof LogFormatError)) console.error(`log ${logId} analysis failed`, e)
      await setLogProgress(logId, { status: 'failed', errorMessage: message }).catch(() => {})
    })
    .finally(() => running.delete(logId))
}

/** Run one analysis to the end (also used directly by tests and the demo seed). */
export async function analyse(logId: number): Promise<void> {
  const log = await getLog(logId)
  if (!log) return
  const report = await getReport(log.reportId)
  if (!report) return
  const target = await getRevisionWithMap(report.revisionId)
  if (!target) throw new Error(`log ${logId}: its revision is missing`)
  const { map, revision } = target
  await setLogProgress(logId, { status: 'analysing', progressBytes: 0, errorMessage: null })
  let lastWrite = 0
  const result = await ingestLog(await getObjectStream(log.objectKey), {
    mapping: log.mapping,
    wheelRadiusM: map.programParams.wheelRadiusM,
    map: { rowAxis: revision.table.rowAxis, colAxis: revision.table.colAxis },
    kind: map.kind,
    surface: report.surface,
    onProgress: (bytes: number) => {
      // Throttle progress writes: one a second is plenty for a progress bar.
      const now = Date.now()
      if (now - lastWrite > 1000) {
        lastWrite = now
        void setLogProgress(logId, { progressBytes: bytes })
      }
    },
  })
  await setLogProgress(logId, { status: 'done', progressBytes: log.sizeBytes, analysis: JSON.parse(JSON.stringify(result)), analysedAt: new Date() })
}
