/**
 * The gate's optional evidence replay: every analysed log of the program's drive reports on other sets,
 * replayed through this set, and the most the set would have asked for beyond what was driven. A log and
 * a set never change (a re-analysis stamps a new analysedAt), so results are kept by both, in memory,
 * bounded; each server process builds its own.
 */
import 'server-only'
import { listLogs } from '@/db/queries/logs'
import { listReports } from '@/db/queries/reports'
import type { MapSetFull } from '@/db/queries/sets'
import { replayReport } from '../reports/replay'
import type { ReplayEvidence } from './gate'

/** Logs replayed per gate, newest reports first: enough evidence to judge, bounded cost on a set page. */
export const MAX_REPLAYED_LOGS = 12
const CACHE_SIZE = 512
const cache = new Map<string, ReplayEvidence>()

function remember(key: string, v: ReplayEvidence) {
  cache.set(key, v)
  if (cache.size > CACHE_SIZE) cache.delete(cache.keys().next().value!)
}

export async function replayEvidence(set: MapSetFull, marginNm: number): Promise<ReplayEvidence[]> {
  const reports = (await listReports({ programId: set.programId })).filter((r) => r.setId !== set.id)
  const out: ReplayEvidence[] = []
  for (const report of reports) {
    for (const log of (await listLogs(report.id)).filter((l) => l.status === 'done')) {
      if (out.length >= MAX_REPLAYED_LOGS) return out
      const key = `${log.id}:${log.analysedAt?.toISOString() ?? ''}:${set.id}:${marginNm}`
      let e = cache.get(key)
      if (!e) {
        const a = await replayReport(report, set.id, log.id, marginNm)
        e = { reportId: report.id, setNumber: report.setNumber, logId: log.id, fileName: log.fileName, worstExcessNm: a.result.worstExcessNm, worstAtS: a.result.worstAtS }
        remember(key, e)
      }
      out.push(e)
    }
  }
  return out
}
