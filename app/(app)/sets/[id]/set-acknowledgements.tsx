import { formatTime } from '@/app/_components/format'
import type { SetRelease } from '@/db/queries/sets'
import { loadCaseLabel } from '@/physics/load-cases'
import { surfaceLabel } from '@/physics/surfaces'

/** What each release of the set let through above the traction limit, why, by whom and when. */
export function SetAcknowledgements({ releases }: { releases: SetRelease[] }) {
  const withAcks = releases.filter((r) => r.acknowledgements.length > 0)
  if (releases.length === 0) return null
  return (
    <section className="card space-y-3" aria-labelledby="acks-heading" data-testid="set-acknowledgements">
      <h3 id="acks-heading" className="font-semibold">Acknowledged traction exceptions</h3>
      {withAcks.length === 0 && <p className="text-sm text-slate-600">{releases.length === 1 ? 'The release of this set needed none' : 'No release of this set needed one'}: no cell was above the traction limit less the margin.</p>}
      {withAcks.map((r) => (
        <div key={r.id} className="space-y-1">
          {releases.length > 1 && <h4 className="text-sm font-semibold">Release of {formatTime(r.releasedAt)}</h4>}
          <ul className="space-y-2 text-sm">
            {r.acknowledgements.map((a) => (
              <li key={a.key} className="rounded border border-amber-300 bg-amber-50 px-2 py-1 break-words">
                <span className="font-semibold">
                  {a.mapKind === 'drive' ? 'Drive' : 'Regen'} map × {surfaceLabel(a.surface)} × {loadCaseLabel(a.loadCase)}
                </span>
                {a.cells !== undefined && <span className="text-slate-600"> ({a.cells} cell(s))</span>}
                <br />
                Reason: “{a.reason}”
                <br />
                <span className="text-xs text-slate-600">
                  {a.byName}, {formatTime(a.at)}
                </span>
              </li>
            ))}
          </ul>
        </div>
      ))}
      {releases.filter((r) => r.coverageWaivers.length > 0).map((r) => (
        <div key={`w${r.id}`} className="space-y-1" data-testid="coverage-waiver-record">
          <h4 className="text-sm font-semibold">Release conditions waived without a drive report{releases.length > 1 ? ` (release of ${formatTime(r.releasedAt)})` : ''}</h4>
          <ul className="space-y-2 text-sm">
            {r.coverageWaivers.map((w) => (
              <li key={w.key} className="rounded border border-amber-300 bg-amber-50 px-2 py-1 break-words">
                <span className="font-semibold">{surfaceLabel(w.surface)} × {loadCaseLabel(w.loadCase)}</span>
                <br />
                Reason: “{w.reason}”
                <br />
                <span className="text-xs text-slate-600">{w.byName}, {formatTime(w.at)}</span>
              </li>
            ))}
          </ul>
        </div>
      ))}
    </section>
  )
}
