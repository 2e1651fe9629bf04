import { withRole } from '@/app/_lib/http/access'
import { ConflictError, HttpError, NotFoundError, ValidationError } from '@/app/_lib/http/errors'
import { checkFitsSet, loadReport } from '@/app/_lib/reports/access'
import { readJson } from '@/app/_lib/http/request'
import { reanalyseLog } from '@/app/_lib/reports/log-jobs'
import { reportSetCorrectionSchema } from '@/app/_schemas/report'
import { listLogs } from '@/db/queries/logs'
import { correctReportSet, getReport } from '@/db/queries/reports'
import { getSet } from '@/db/queries/sets'

// POST /api/reports/:id/set — a lead engineer corrects the set a report was filed against: { setId, reason }.
// Only to another set of the same program that fits the report (load case, flagged maps); audited with the
// reason. The report's analysed logs are then analysed again against the new set (audited too).
export const POST = withRole<{ id: string }>(['lead_engineer'], async (req, { user, params }) => {
  const report = await loadReport(params.id)
  const { setId, reason } = await readJson(req, reportSetCorrectionSchema)
  const set = await getSet(setId)
  if (!set) throw new ValidationError(`setId: set ${setId} does not exist`)
  if (set.programId !== report.programId)
    throw new ValidationError(`setId: set ${set.number} belongs to another vehicle program (${set.programName}); a report can only be moved to a set of ${report.programName}`)
  if (set.id === report.setId) throw new ConflictError(`The report is already filed against set ${set.number}`)
  // A release keeps its evidence: a report on a released set stays there, and a released set's evidence list is closed.
  const from = await getSet(report.setId)
  for (const s of [from, set])
    if (s && s.releases.length > 0)
      throw new ConflictError(`${s.programName} · Set ${s.number} has been released with its reports as evidence; a report on it cannot be moved, and none can be moved onto it (file a new report instead)`)
  try {
    checkFitsSet(set, { loadCase: report.loadCase, flags: report.flags })
  } catch (e) {
    if (e instanceof HttpError) throw new ValidationError(`setId: the report does not fit set ${set.number}: ${e.message}`)
    throw e
  }
  if (!(await correctReportSet(report.id, set.id, user.id, reason))) throw new NotFoundError(`Drive report ${report.id}`)
  // Done logs, and those still being read (their run stops and they are claimed again); a failed one waits for its driver.
  const logs = (await listLogs(report.id)).filter((l) => l.status !== 'failed')
  for (const log of logs) await reanalyseLog(log, user.id, 'set-corrected')
  return Response.json({ report: await getReport(report.id), reanalysing: logs.map((l) => l.id) })
})
