// The demo seed runs the same analysis from a script, under tsx --conditions=react-server (see package.json).
import 'server-only'
import { getLog, setLogProgress } from '@/db/queries/logs'
import { getReport } from '@/db/queries/reports'
import { getSet } from '@/db/queries/sets'
import { recordAudit } from '@/db/queries/audit'
import { LogFormatError, type AnalysisResult, type MapKind } from '@/physics'
import { ingestLog, type LogIngestResult } from './log-ingest'
import { getObjectStream } from '../storage/object-store'

/** What a stored analysis was made against: the report's set, and the map whose axes the occupancy uses. */
export interface AnalysisBasis {
  setId: number
  setNumber: number
  paramVersionId: number
  paramVersion: number
  /** The drive map's, or the regen map's when the set holds no drive map. */
  occupancyMap: MapKind
  occupancyRevisionId: number
}

/** A log's analysis as stored: the ingest result and its basis (absent in analyses older than sets). */
export type StoredAnalysis = LogIngestResult & { basis?: AnalysisBasis }

/** The basis of a stored analysis, if it has one. */
export const basisOf = (a: AnalysisResult | null | undefined): AnalysisBasis | null => (a as StoredAnalysis | null | undefined)?.basis ?? null

// Analyses running in this process, so a second request for the same log does not start another;
// a request while one runs (e.g. the set was corrected meanwhile) runs it once more after.
const running = new Set<number>()
const again = new Set<number>()

/**
 * Parse and analyse a stored log in the background: streamed from storage, never held whole in
 * memory, progress written to the log row so the report page can show it. A malformed file ends
 * as 'failed' with the line and column at fault; the raw file stays in storage either way.
 */
export function startLogAnalysis(logId: number): void {
  if (running.has(logId)) {
    again.add(logId)
    return
  }
  running.add(logId)
  analyse(logId)
    .catch(async (e) => {
      const message = e instanceof LogFormatError ? e.message : 'The log could not be analysed; the file is kept and the analysis can be run again'
      if (!(e instanceof LogFormatError)) console.error(`log ${logId} analysis failed`, e)
      await setLogProgress(logId, { status: 'failed', errorMessage: message }).catch(() => {})
    })
    .finally(() => {
      running.delete(logId)
      if (again.delete(logId)) startLogAnalysis(logId)
    })
}

/** Analyse a log again, with its audit row saying who asked and why. */
export async function reanalyseLog(log: { id: number; reportId: number; fileName: string }, actorId: number, why: 'requested' | 'set-corrected'): Promise<void> {
  await recordAudit({ actorId, action: 'report.log-reanalyse', entityType: 'drive_report', entityId: log.reportId, details: { logId: log.id, fileName: log.fileName, why } })
  startLogAnalysis(log.id)
}

/**
 * Run one analysis to the end (also used directly by tests and the demo seed), against the
 * report's set: occupancy on the axes of its drive map (its regen map when it holds no drive map)
 * and the wheel radius of its parameter version, not the program's latest parameters.
 */
export async function analyse(logId: number): Promise<void> {
  const log = await getLog(logId)
  if (!log) return
  const report = await getReport(log.reportId)
  if (!report) return
  const set = await getSet(report.setId)
  if (!set) throw new Error(`log ${logId}: set ${report.setId} is missing`)
  const part = set.drive ?? set.regen
  if (!part) throw new Error(`log ${logId}: set ${set.id} holds no map`)
  const basis: AnalysisBasis = { setId: set.id, setNumber: set.number, paramVersionId: set.paramVersion.id, paramVersion: set.paramVersion.number, occupancyMap: part.kind, occupancyRevisionId: part.revisionId }
  await setLogProgress(logId, { status: 'analysing', progressBytes: 0, errorMessage: null })
  let lastWrite = 0
  const result = await ingestLog(await getObjectStream(log.objectKey), {
    mapping: log.mapping,
    wheelRadiusM: set.paramVersion.params.wheelRadiusM,
    map: { rowAxis: part.table.rowAxis, colAxis: part.table.colAxis },
    kind: part.kind,
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
  const stored: StoredAnalysis = { ...result, basis }
  await setLogProgress(logId, { status: 'done', progressBytes: log.sizeBytes, analysis: JSON.parse(JSON.stringify(stored)), analysedAt: new Date() })
}
