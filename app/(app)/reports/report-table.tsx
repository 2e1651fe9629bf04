import Link from 'next/link'
import type { ReportRow } from '@/db/queries/reports'
import { SAFETY_LABELS, type SafetyState } from '@/domain/report-safety'
import { surfaceLabel } from '@/physics'
import { loadCaseLabel } from '@/physics/load-cases'

export { surfaceLabel }

export function SafetyBadge({ safety }: { safety: SafetyState }) {
  if (safety === 'open') return <span className="rounded bg-danger px-1.5 py-0.5 text-xs font-semibold text-white">{SAFETY_LABELS.open}</span>
  if (safety === 'resolved') return <span className="rounded bg-slate-200 px-1.5 py-0.5 text-xs">{SAFETY_LABELS.resolved}</span>
  return null
}

/** "Site drive r2 · Site regen r1 · parameters v1" */
export function setParts(r: Pick<ReportRow, 'driveMapName' | 'driveNumber' | 'regenMapName' | 'regenNumber' | 'paramVersion'>): string {
  return [r.driveMapName && `${r.driveMapName} r${r.driveNumber}`, r.regenMapName && `${r.regenMapName} r${r.regenNumber}`, `parameters v${r.paramVersion}`].filter(Boolean).join(' · ')
}

export function ReportTable({ reports }: { reports: ReportRow[] }) {
  if (reports.length === 0) return <p className="text-slate-600">No drive reports.</p>
  return (
    <div className="card overflow-x-auto p-0">
      <table className="w-full text-sm">
        <thead className="bg-slate-50 text-left text-xs uppercase text-slate-600">
          <tr>
            <th className="px-3 py-2">Date</th>
            <th className="px-3 py-2">Set</th>
            <th className="px-3 py-2">Driver</th>
            <th className="px-3 py-2">Surface, load</th>
            <th className="px-3 py-2">Flags</th>
            <th className="px-3 py-2" />
          </tr>
        </thead>
        <tbody>
          {reports.map((r) => (
            <tr key={r.id} className="border-t border-line" data-testid={`report-row-${r.id}`}>
              <td className="px-3 py-2 whitespace-nowrap">{r.drivenOn}</td>
              <td className="px-3 py-2">
                <Link href={`/sets/${r.setId}`} className="hover:underline">{r.programName} · set {r.setNumber}</Link>
                <span className="block text-xs text-slate-600">{setParts(r)}</span>
              </td>
              <td className="px-3 py-2">{r.driverName}</td>
              <td className="px-3 py-2">{surfaceLabel(r.surface)}, {loadCaseLabel(r.loadCase).toLowerCase()}</td>
              <td className="px-3 py-2">{r.flags.length} <SafetyBadge safety={r.safety} /></td>
              <td className="px-3 py-2"><Link href={`/reports/${r.id}`} className="text-accent hover:underline">Open</Link></td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  )
}
