import Link from 'next/link'
import type { ReportRow } from '@/db/queries/reports'
import { SAFETY_LABELS } from '@/domain/report-safety'
import { loadCaseLabel } from '@/physics/load-cases'
import { surfaceLabel } from '@/physics/surfaces'

const SAFETY_TONE = { none: 'text-slate-600', open: 'rounded bg-danger px-1.5 py-0.5 font-semibold text-white', resolved: 'rounded bg-slate-200 px-1.5 py-0.5' } as const

/** Drive reports filed on exactly this set; a list, so it fits a phone without scrolling sideways. */
export function SetReports({ setId, reports, canFile }: { setId: number; reports: ReportRow[]; canFile: boolean }) {
  return (
    <section id="reports" aria-labelledby="reports-heading" className="space-y-2">
      <div className="flex flex-wrap items-center gap-3">
        <h2 id="reports-heading" className="text-lg font-semibold">Drive reports on this set</h2>
        {canFile && (
          <Link href={`/reports/new?set=${setId}`} className="btn-primary ml-auto" data-testid="file-report-link">
            File a drive report on this set
          </Link>
        )}
      </div>
      {reports.length === 0 ? (
        <p className="text-slate-600">No drive report has been filed on this set yet.</p>
      ) : (
        <ul className="card divide-y divide-line p-0" data-testid="set-reports">
          {reports.map((r) => (
            <li key={r.id} className="flex flex-wrap items-baseline gap-x-3 gap-y-1 px-3 py-2 text-sm">
              <Link href={`/reports/${r.id}`} className="font-medium text-accent hover:underline">
                {r.drivenOn} · {r.driverName}
              </Link>
              <span className="text-slate-600">
                {surfaceLabel(r.surface)}, {loadCaseLabel(r.loadCase)} · {r.flags.length} flag(s)
              </span>
              <span className={`text-xs ${SAFETY_TONE[r.safety]}`}>{SAFETY_LABELS[r.safety]}</span>
            </li>
          ))}
        </ul>
      )}
    </section>
  )
}
