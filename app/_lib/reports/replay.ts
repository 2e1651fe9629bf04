/**
 * Replays a drive report's log through a candidate set of the same program: the log is read again
 * from storage (one pass, with the radius calibration its analysis found) and every sample is pushed
 * through the pure replayer (physics/replay.ts) with the driven set and the candidate.
 */
import 'server-only'
import { getLog, listLogs } from '@/db/queries/logs'
import { getSet, type MapSetFull } from '@/db/queries/sets'
import type { ReportRow } from '@/db/queries/reports'
import { createReplayer, type ReplayResult } from '@/physics/replay'
import { ConflictError, NotFoundError, ValidationError } from '../http/errors'
import { physics } from '../physics/query'
import { getObjectStream } from '../storage/object-store'
import { ingestLog } from './log-ingest'
import type { StoredAnalysis } from './log-jobs'

const parts = (s: MapSetFull) => ({ drive: s.drive?.table ?? null, regen: s.regen?.table ?? null, ramps: s.rampVersion?.limits ?? null })

export interface ReplayAnswer {
  report: { id: number; surface: string; loadCase: string }
  log: { id: number; fileName: string }
  driven: { id: number; number: number }
  candidate: { id: number; number: number; paramVersion: number; rampVersion: number | null }
  result: ReplayResult
  /** Time the replay took on the server, ms (read, parse and replay). */
  ms: number
}

/** The log to replay: the one asked for, else the report's first analysed log. */
async function chooseLog(report: ReportRow, logId: number | undefined) {
  if (logId !== undefined) {
    const log = await getLog(logId)
    if (!log || log.reportId !== report.id) throw new NotFoundError(`Log ${logId} of report ${report.id}`)
    if (log.status !== 'done') throw new ConflictError(`Log ${log.fileName} is not analysed yet (it is “${log.status}”); replay it once its analysis is done`)
    return log
  }
  const done = (await listLogs(report.id)).find((l) => l.status === 'done')
  if (!done) throw new ConflictError(`Report ${report.id} has no analysed log to replay`)
  return (await getLog(done.id))!
}

export async function replayReport(report: ReportRow, candidateSetId: number, logId?: number, marginNm?: number): Promise<ReplayAnswer> {
  const started = performance.now()
  const [driven, candidate] = await Promise.all([getSet(report.setId), getSet(candidateSetId)])
  if (!driven) throw new NotFoundError(`Set ${report.setId}`)
  if (!candidate) throw new NotFoundError(`Set ${candidateSetId}`)
  if (candidate.programId !== driven.programId)
    throw new ValidationError(`setId: set ${candidate.number} belongs to ${candidate.programName}, the report to ${driven.programName}; a drive replays through a set of its own program`)
  if (!candidate.drive && !candidate.regen) throw new ValidationError(`setId: set ${candidate.number} holds no map`)
  const log = await chooseLog(report, logId)
  const stored = log.analysis as StoredAnalysis | null
  const replayer = physics(() =>
    createReplayer({
      driven: parts(driven),
      candidate: { ...parts(candidate), vehicle: candidate.paramVersion.params },
      surface: report.surface,
      loadCase: report.loadCase,
      marginNm,
    }),
  )
  await ingestLog(await getObjectStream(log.objectKey), {
    mapping: log.mapping,
    wheelRadiusM: driven.paramVersion.params.wheelRadiusM,
    surface: report.surface,
    driveTyre: driven.paramVersion.params.driveTyre,
    calibrateRadius: false,
    radiusCalibration: stored?.calibration ?? undefined,
    maxSeriesPoints: 10,
    onSample: (s, slip) => replayer.push({ timeS: s.timeS, roadSpeedKmh: s.roadSpeedKmh, accelPedalPct: s.accelPedalPct, brakePedalPct: s.brakePedalPct, measuredSlip: slip }),
  })
  return {
    report: { id: report.id, surface: report.surface, loadCase: report.loadCase },
    log: { id: log.id, fileName: log.fileName },
    driven: { id: driven.id, number: driven.number },
    candidate: { id: candidate.id, number: candidate.number, paramVersion: candidate.paramVersion.number, rampVersion: candidate.rampVersion?.number ?? null },
    result: replayer.finish(),
    ms: Math.round(performance.now() - started),
  }
}
