// A log's analysis as a job any server can finish: the worker (log-worker.ts) claims a log with a lease
// in the database and runs it here; the demo seed runs the same analysis from a script, under
// tsx --conditions=react-server (see package.json).
import 'server-only'
import { hostname } from 'node:os'
import { randomUUID } from 'node:crypto'
import { claimLog, extendLogLease, finishClaimedLog, getLog, requeueLog, type LogClaim } from '@/db/queries/logs'
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

/** Where this process's log worker (log-worker.ts) is kept: on globalThis, as Next loads the server hook and each route as separate module copies. */
export const LOG_WORKER_KEY = Symbol.for('mapwright.log-worker')

/** Tell this process's worker, if it runs one, that a log waits: it looks at once instead of at its next poll. */
export function nudgeLogWorker(): void {
  ;(globalThis as { [LOG_WORKER_KEY]?: { nudge(): void } })[LOG_WORKER_KEY]?.nudge()
}

/** How long a claim lasts without a heartbeat; the analysis pushes it on with each progress write (about once a second). */
export const LOG_LEASE_MS = 30_000
/** Claims of one log whose lease may run out (its server died) before it is failed with a message saying so. */
export const LOG_MAX_ATTEMPTS = 3
/** At most one progress write (and lease extension) per this many ms. */
const HEARTBEAT_MS = 1000

/** Thrown inside a claimed analysis to stop it: the server is stopping, or the claim went to someone else. */
class JobInterrupted extends Error {
  constructor(readonly why: 'stopped' | 'lost') {
    super(`analysis ${why}`)
  }
}

/** How a claimed analysis ended: written 'done' or 'failed'; 'lost' (the claim was no longer held, nothing written); 'stopped' (asked to stop, nothing written). */
export type JobOutcome = { ended: 'done' } | { ended: 'failed'; error: unknown } | { ended: 'lost' } | { ended: 'stopped' }

export interface RunOptions {
  leaseMs?: number
  /** Checked before the file is read and at each progress write: true stops the run without writing. */
  shouldStop?: () => boolean
  /** Least time between progress writes; tests set 0. */
  heartbeatMs?: number
}

/** What a failed analysis says on the log: the line and column at fault for a malformed file. */
function failureMessage(e: unknown): string {
  return e instanceof LogFormatError ? e.message : 'The log could not be analysed; the file is kept and the analysis can be run again'
}

/**
 * Run one claimed analysis to the end, against the report's set: occupancy on the axes of its drive
 * map (its regen map when it holds no drive map) and the wheel radius of its parameter version, not
 * the program's latest parameters. Streamed from storage, never held whole in memory; each progress
 * write also extends the lease. The result (done, or failed with the line and column at fault for a
 * malformed file) is written only while the claim is still held. Never throws.
 */
export async function runClaimedAnalysis(claim: LogClaim, opts: RunOptions = {}): Promise<JobOutcome> {
  const leaseMs = opts.leaseMs ?? LOG_LEASE_MS
  const heartbeatMs = opts.heartbeatMs ?? HEARTBEAT_MS
  let lost = false
  let beating: Promise<void> | null = null
  const beat = (bytes?: number) => {
    beating = extendLogLease(claim, leaseMs, bytes)
      .then((held) => {
        if (!held) lost = true
      })
      .catch((e) => console.error(`log ${claim.logId}: lease not extended`, e))
      .finally(() => (beating = null))
  }
  const checkpoint = () => {
    if (lost) throw new JobInterrupted('lost')
    if (opts.shouldStop?.()) throw new JobInterrupted('stopped')
  }
  try {
    const stored = await analyseLog(claim.logId, {
      checkpoint,
      onProgress: (() => {
        let lastWrite = Date.now()
        return (bytes: number) => {
          checkpoint()
          // One write a second is plenty for a progress bar, and keeps the lease alive.
          const now = Date.now()
          if (now - lastWrite >= heartbeatMs && !beating) {
            lastWrite = now
            beat(bytes)
          }
        }
      })(),
    })
    if (!stored) return { ended: 'lost' } // the log was removed meanwhile
    if (await finishClaimedLog(claim, { status: 'done', progressBytes: stored.sizeBytes, analysis: JSON.parse(JSON.stringify(stored.analysis)), analysedAt: new Date() })) return { ended: 'done' }
    return { ended: 'lost' }
  } catch (e) {
    if (e instanceof JobInterrupted) return { ended: e.why }
    if (!(e instanceof LogFormatError)) console.error(`log ${claim.logId} analysis failed`, e)
    const written = await finishClaimedLog(claim, { status: 'failed', errorMessage: failureMessage(e) }).catch((w) => {
      console.error(`log ${claim.logId}: failure not recorded`, w)
      return false
    })
    return written ? { ended: 'failed', error: e } : { ended: 'lost' }
  }
}

/** Read and analyse a stored log; null when the log (or its report) no longer exists. */
async function analyseLog(logId: number, hooks: { checkpoint: () => void; onProgress: (bytes: number) => void }): Promise<{ sizeBytes: number; analysis: StoredAnalysis } | null> {
  const log = await getLog(logId)
  if (!log) return null
  const report = await getReport(log.reportId)
  if (!report) return null
  const set = await getSet(report.setId)
  if (!set) throw new Error(`log ${logId}: set ${report.setId} is missing`)
  const part = set.drive ?? set.regen
  if (!part) throw new Error(`log ${logId}: set ${set.id} holds no map`)
  const basis: AnalysisBasis = { setId: set.id, setNumber: set.number, paramVersionId: set.paramVersion.id, paramVersion: set.paramVersion.number, occupancyMap: part.kind, occupancyRevisionId: part.revisionId }
  hooks.checkpoint()
  // Opened twice: the radius calibration reads the log once before the analysis.
  const result = await ingestLog(() => getObjectStream(log.objectKey), {
    mapping: log.mapping,
    wheelRadiusM: set.paramVersion.params.wheelRadiusM,
    map: { rowAxis: part.table.rowAxis, colAxis: part.table.colAxis },
    kind: part.kind,
    surface: report.surface,
    driveTyre: set.paramVersion.params.driveTyre,
    onProgress: hooks.onProgress,
  })
  return { sizeBytes: log.sizeBytes, analysis: { ...result, basis } }
}

/** Analyse a log again, with its audit row saying who asked and why: back in the queue for any server's worker. */
export async function reanalyseLog(log: { id: number; reportId: number; fileName: string }, actorId: number, why: 'requested' | 'set-corrected') {
  await recordAudit({ actorId, action: 'report.log-reanalyse', entityType: 'drive_report', entityId: log.reportId, details: { logId: log.id, fileName: log.fileName, why } })
  const row = await requeueLog(log.id)
  nudgeLogWorker()
  return row
}

/**
 * Run one analysis to the end in this process, now (the demo seed and tests): the log is claimed
 * for this call (taken from any other holder), analysed and written like a worker's job. A failure is
 * written to the log and thrown.
 */
export async function analyse(logId: number): Promise<void> {
  const claim = await claimLog(logId, `direct:${hostname()}:${process.pid}:${randomUUID().slice(0, 8)}`, LOG_LEASE_MS)
  if (!claim) return
  const out = await runClaimedAnalysis(claim)
  if (out.ended === 'failed') throw out.error
}
