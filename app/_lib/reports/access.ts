import 'server-only'
import { getReport, type ReportRow } from '@/db/queries/reports'
import { getSet, type MapSetFull } from '@/db/queries/sets'
import { loadCasesFor } from '@/physics/load-cases'
import type { ReportInput } from '@/app/_schemas/report'
import type { ReportFlag } from '@/db/schema'
import type { LoadCase } from '@/physics/vehicle'
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from '../http/errors'
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

/** What is refused once a lead engineer has read a report, and the words for it. */
export const AFTER_READ = {
  edit: 'A lead engineer has read this report; it can no longer be edited. Add a comment instead.',
  'add-log': 'A lead engineer has read this report, so no log can be added to it any more. File a new report for the new drive, or ask a lead.',
  'remove-log': 'A lead engineer has read this report, so its logs can no longer be removed.',
  'remap-log': 'A lead engineer has read this report, so its logs can no longer be mapped again; a lead can still run the analysis again.',
} as const

/** After a lead engineer has read a report, what it says and which logs it has stay as the lead read them. */
export function assertUnread(report: Pick<ReportRow, 'leadReadAt'>, what: keyof typeof AFTER_READ): void {
  if (report.leadReadAt) throw new ConflictError(AFTER_READ[what])
}

export const SET_FIXED_MESSAGE = "A report's set cannot change by an edit; ask a lead to correct it or file a new report"

/**
 * What a report says must fit its set: the load case is one the set's parameter version has (not
 * the program's latest parameters), and every flag is on a map the set holds. Messages name the
 * report's own fields, so the form can show them where they belong.
 */
export function checkFitsSet(set: MapSetFull, r: { loadCase: LoadCase; trailer?: boolean; flags: Pick<ReportFlag, 'map'>[] }): void {
  const cases = loadCasesFor(set.paramVersion.params)
  if (!cases.includes(r.loadCase)) throw new ValidationError(`loadCase: set ${set.number} (parameter version ${set.paramVersion.number}) has the load cases ${cases.join(', ')}`)
  if (r.trailer !== undefined && r.trailer !== r.loadCase.startsWith('trailer')) throw new ValidationError('trailer: must match the load case (trailer-empty or trailer-laden means a trailer)')
  r.flags.forEach((f, i) => {
    if (set[f.map]) return
    const other = f.map === 'drive' ? 'regen' : 'drive'
    throw new ValidationError(`flags.${i}.map: set ${set.number} holds no ${f.map} map; flag the point on its ${other} map`)
  })
}

/** The set must exist and the report must fit it; returns the set. */
export async function checkReportTarget(input: ReportInput): Promise<MapSetFull> {
  const set = await getSet(input.setId)
  if (!set) throw new ValidationError(`setId: set ${input.setId} does not exist`)
  checkFitsSet(set, input)
  return set
}

/** An edit keeps the report's set: a body naming another one is refused, not applied. */
export function assertSameSet(report: ReportRow, setId: number): void {
  if (setId !== report.setId) throw new ConflictError(SET_FIXED_MESSAGE, { setId: report.setId })
}
