import 'server-only'
import { getReport, type ReportRow } from '@/db/queries/reports'
import { getRevisionWithMap } from '@/db/queries/maps'
import { loadCasesFor } from '@/physics/load-cases'
import type { ReportInput } from '@/app/_schemas/report'
import { ForbiddenError, NotFoundError, ValidationError } from '../http/errors'
import { intParam } from '../http/request'
import type { SessionUser } from '../auth/session'

export async function loadReport(idParam: string | undefined): Promise<ReportRow> {
  const id = intParam(idParam, 'Report id')
  const report = await getReport(id)
  if (!report) throw new NotFoundError(`Drive report ${id}`)
  return report
}

/** Logged in is not authorised: only the driver who filed a report may change it or add logs. */
export function assertOwner(report: ReportRow, user: SessionUser): void {
  if (report.driverId !== user.id) throw new ForbiddenError('Only the driver who filed this report may change it')
}

/** The revision must exist, and the load case must be one the vehicle program has. */
export async function checkReportTarget(input: ReportInput): Promise<void> {
  const target = await getRevisionWithMap(input.revisionId)
  if (!target) throw new ValidationError(`revisionId: revision ${input.revisionId} does not exist`)
  const { map } = target
  const cases = loadCasesFor(map.programParams)
  if (!cases.includes(input.loadCase)) throw new ValidationError(`loadCase: ${map.programName} has the load cases ${cases.join(', ')}`)
  if (input.trailer !== input.loadCase.startsWith('trailer')) throw new ValidationError('trailer: must match the load case (trailer-empty or trailer-laden means a trailer)')
}
