import type { SetFindings } from '@/app/_lib/sets/service'
import type { MapSetFull } from '@/db/queries/sets'
import type { Finding } from '@/maps'

/** Findings shown per list; the map's own page has them all beside the grid. */
const LIMIT = 30

function FindingItems({ title, findings, tone }: { title: string; findings: Finding[]; tone: 'error' | 'warning' }) {
  if (findings.length === 0) return null
  return (
    <div>
      <h4 className={`text-sm font-semibold ${tone === 'error' ? 'text-danger' : 'text-warn'}`}>
        {title} ({findings.length})
      </h4>
      <ul className="mt-1 space-y-1 text-xs">
        {findings.slice(0, LIMIT).map((f, i) => (
          <li key={i} className={`rounded border-l-4 px-2 py-1 break-words ${tone === 'error' ? 'border-danger bg-red-50/60' : 'border-warn bg-amber-50/60'}`}>
            <span className="text-slate-600">[{f.rule}]</span> {f.message}
          </li>
        ))}
      </ul>
      {findings.length > LIMIT && <p className="mt-1 text-xs text-slate-600">…and {findings.length - LIMIT} more on the map&apos;s page.</p>}
    </div>
  )
}

/** Each map judged under the set's parameter version, and the checks across the two maps. */
export function SetFindingsView({ set, findings }: { set: MapSetFull; findings: SetFindings }) {
  return (
    <section id="findings" aria-labelledby="findings-heading" className="space-y-3">
      <h2 id="findings-heading" className="text-lg font-semibold">Checks under parameter version v{set.paramVersion.number}</h2>
      <div className="grid gap-3 md:grid-cols-2">
        {findings.maps.map((m) => {
          const part = m.kind === 'drive' ? set.drive : set.regen
          const errors = m.findings.filter((f) => f.severity === 'error')
          const warnings = m.findings.filter((f) => f.severity === 'warning')
          return (
            <div key={m.kind} className="card min-w-0 space-y-2" data-testid={`set-findings-${m.kind}`}>
              <h3 className="font-semibold">
                {m.kind === 'drive' ? 'Drive' : 'Regen'} map {part ? `${part.mapName} r${part.number}` : ''}
                <span className="ml-2 text-sm font-normal text-slate-600">
                  {errors.length} error(s), {warnings.length} warning(s)
                </span>
              </h3>
              {m.findings.length === 0 && <p className="text-sm text-slate-600">No rule is broken.</p>}
              <FindingItems title="Errors" findings={errors} tone="error" />
              <FindingItems title="Warnings" findings={warnings} tone="warning" />
            </div>
          )
        })}
      </div>
      <div className="card" data-testid="set-cross-checks">
        <h3 className="mb-2 font-semibold">Drive and regen together</h3>
        {!set.drive || !set.regen ? (
          <p className="text-sm text-slate-600">The set holds only one map; nothing to check across.</p>
        ) : findings.crossChecks.length === 0 ? (
          <p className="text-sm text-slate-600">The two maps agree at lift-off and cover the same speeds.</p>
        ) : (
          <ul className="space-y-1 text-sm">
            {findings.crossChecks.map((c) => (
              <li key={c.id} className="break-words">
                <span className={`mr-1 font-semibold ${c.severity === 'warning' ? 'text-warn' : 'text-slate-600'}`}>{c.severity === 'warning' ? 'Warning:' : 'Note:'}</span>
                {c.message}
              </li>
            ))}
          </ul>
        )}
      </div>
    </section>
  )
}
