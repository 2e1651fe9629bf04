import type { CoverageCell } from '@/app/_lib/sets/gate'
import { loadCaseLabel } from '@/physics/load-cases'
import { surfaceLabel, type SurfaceId } from '@/physics/surfaces'
import type { LoadCase } from '@/physics/vehicle'

/**
 * The release conditions (surface × load case) against the drive reports filed on the set: how many reports
 * cover each, or the lead's waiver and its reason, or nothing yet. A lead waives an empty cell when releasing.
 */
export function SetCoverageGrid({ coverage }: { coverage: CoverageCell[] }) {
  if (coverage.length === 0) return null
  const surfaces = [...new Set(coverage.map((c) => c.surface))] as SurfaceId[]
  const loads = [...new Set(coverage.map((c) => c.loadCase))] as LoadCase[]
  const cell = (s: SurfaceId, l: LoadCase) => coverage.find((c) => c.surface === s && c.loadCase === l)
  return (
    <section id="coverage" className="card space-y-2" aria-labelledby="coverage-heading" data-testid="set-coverage">
      <h3 id="coverage-heading" className="font-semibold">Drive-report evidence per release condition</h3>
      <div className="overflow-x-auto">
        <table className="text-sm">
          <thead>
            <tr>
              <th scope="col" className="pr-4 text-left text-xs text-slate-500">Surface</th>
              {loads.map((l) => <th key={l} scope="col" className="px-2 text-left text-xs text-slate-500">{loadCaseLabel(l)}</th>)}
            </tr>
          </thead>
          <tbody>
            {surfaces.map((s) => (
              <tr key={s} className="border-t border-line">
                <th scope="row" className="pr-4 text-left font-normal">{surfaceLabel(s)}</th>
                {loads.map((l) => {
                  const c = cell(s, l)
                  if (!c) return <td key={l} />
                  const state = c.reports > 0 ? 'covered' : c.waiver !== null ? 'waived' : 'uncovered'
                  return (
                    <td key={l} className="px-2 py-1 align-top" data-testid={`coverage-${c.key}`} data-state={state}>
                      {state === 'covered' && <span className="rounded bg-accent-soft px-1 text-accent">{c.reports} report{c.reports > 1 ? 's' : ''}</span>}
                      {state === 'waived' && <span className="rounded bg-amber-50 px-1">waived: “{c.waiver}”</span>}
                      {state === 'uncovered' && <span className="rounded bg-red-100 px-1 text-danger">no report</span>}
                    </td>
                  )
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="text-xs text-slate-600">
        The release needs a drive report on this set for every cell, or a lead engineer&apos;s waiver with a reason for each cell without one.
      </p>
    </section>
  )
}
