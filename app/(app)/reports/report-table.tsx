import Link from 'next/link'
import type { ReportRow } from '@/db/queries/reports'
import { SAFETY_LABELS, type SafetyState } from '@/domain/report-safety'
import { surfaceLabel } from '@/physics'
import { loadCaseLabel } from '@/physics/load-cases'

export { surfaceLabel }

export function SafetyBadge({ safety }: { safety: SafetyState }) {
  // inline-block with no wrap: the label stays whole, never split over two lines.
  if (safety === 'open') return <span className="inline-block whitespace-nowrap rounded bg-danger px-1.5 py-0.5 text-xs font-semibold text-white">{SAFETY_LABELS.open}</span>
  if (safety === 'resolved') return <span className="inline-block whitespace-nowrap rounded bg-slate-200 px-1.5 py-0.5 text-xs">{SAFETY_LABELS.resolved}</span>
  return null
}

/** "Site drive r2 · Site regen r1 · parameters v1" */
export function setParts(r: Pick<ReportRow, 'driveMapName' | 'driveNumber' | 'regenMapName' | 'regenNumber' | 'paramVersion'>): string {
  return [r.driveMapName && `${r.driveMapName} r${r.driveNumber}`, r.regenMapName && `${r.regenMapName} r${r.regenNumber}`, `parameters v${r.paramVersion}`].filter(Boolean).join(' · ')
}

/** Cells: narrow padding on a phone, where the driver, the surface and the flags move under the date and the set. */
const cell = 'px-2 py-2 sm:px-3'

export function ReportTable({ reports }: { reports: ReportRow[] }) {
  if (reports.length === 0) return <p className="text-slate-600">No drive reports.</p>
  return (
    <div className="card overflow-x-auto p-0">
      <table className="w-full text-sm">
        <thead className="bg-slate-50 text-left text-xs uppercase text-slate-600">
          <tr>
            <th className={cell}>Date</th>
            <th className={cell}>Set</th>
            <th className={`${cell} hidden sm:table-cell`}>Driver</th>
            <th className={`${cell} hidden sm:table-cell`}>Surface, load</th>
            <th className={`${cell} hidden sm:table-cell`}>Flags</th>
            <th className={cell}><span className="sr-only">Report</span></th>
          </tr>
        </thead>
        <tbody>
          {reports.map((r) => (
            <tr key={r.id} className="border-t border-line align-top" data-testid={`report-row-${r.id}`}>
              <td className={cell}>
                <span className="whitespace-nowrap">{r.drivenOn}</span>
                <span className="block text-xs text-slate-600 sm:hidden">{r.driverName}</span>
              </td>
              <td className={`${cell} break-words`}>
                <Link href={`/sets/${r.setId}`} className="hover:underline">{r.programName} · set {r.setNumber}</Link>
                <span className="block text-xs text-slate-600">{setParts(r)}</span>
                <span className="block text-xs text-slate-600 sm:hidden">{surfaceLabel(r.surface)}, {loadCaseLabel(r.loadCase).toLowerCase()}</span>
                <span className="block text-xs sm:hidden">{r.flags.length} flag{r.flags.length === 1 ? '' : 's'} <SafetyBadge safety={r.safety} /></span>
              </td>
              <td className={`${cell} hidden sm:table-cell`}>{r.driverName}</td>
              <td className={`${cell} hidden sm:table-cell`}>{surfaceLabel(r.surface)}, {loadCaseLabel(r.loadCase).toLowerCase()}</td>
              <td className={`${cell} hidden sm:table-cell`}>{r.flags.length} <SafetyBadge safety={r.safety} /></td>
              <td className={cell}><Link href={`/reports/${r.id}`} className="text-accent hover:underline">Open</Link></td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  )
}
