import Link from 'next/link'
import type { ReportRow } from '@/db/queries/reports'
import { loadCaseLabel } from '@/physics/load-cases'
import { surfaceLabel } from '@/physics/surfaces'

/** Drives on the program's other sets, each a link to replay its log through this set (the lead's "what would this set have done?"). */
export function EvidenceReplay({ setId, reports }: { setId: number; reports: ReportRow[] }) {
  if (reports.length === 0) return null
  return (
    <section aria-labelledby="evidence-replay-heading" className="space-y-2">
      <h2 id="evidence-replay-heading" className="text-lg font-semibold">Replay drives on other sets through this one</h2>
      <p className="text-sm text-slate-600">What this set would have asked for on the same pedal and road speed, and the slip it would give, beside what was measured.</p>
      <ul className="card divide-y divide-line p-0 text-sm" data-testid="evidence-replay">
        {reports.map((r) => (
          <li key={r.id} className="flex flex-wrap items-baseline gap-x-3 px-3 py-2">
            <Link href={`/reports/${r.id}/replay?set=${setId}`} className="font-medium text-accent underline">
              Replay the drive of {r.drivenOn} (set {r.setNumber}) through this set
            </Link>
            <span className="text-slate-600">{surfaceLabel(r.surface)}, {loadCaseLabel(r.loadCase)} · {r.driverName}</span>
          </li>
        ))}
      </ul>
    </section>
  )
}
