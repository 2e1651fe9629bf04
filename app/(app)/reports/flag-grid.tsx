'use client'
import { useQuery } from '@tanstack/react-query'
import { api } from '@/app/_components/api-client'
import type { MapTable } from '@/maps'

/**
 * One map of the flashed set as a compact tappable table: a tap on a cell proposes a flag at that
 * pedal and speed on that map. Plain HTML, not the editor grid, so it stays light and usable on a phone.
 */
export function FlagGrid(props: { mapId: number; revisionNumber: number; kind: 'drive' | 'regen'; flagged: { pedalPct: number; speedKmh: number }[]; onPick: (pedalPct: number, speedKmh: number) => void }) {
  const pedal = props.kind === 'regen' ? 'brake' : 'pedal'
  const rev = useQuery({
    queryKey: ['revision', props.mapId, props.revisionNumber],
    queryFn: () => api<{ revision: { table: MapTable } }>(`/api/maps/${props.mapId}/revisions/${props.revisionNumber}`),
  })
  const t = rev.data?.revision.table
  if (!t) return <p className="text-sm text-slate-500">Loading the map…</p>
  const isFlagged = (p: number, s: number) => props.flagged.some((f) => f.pedalPct === p && f.speedKmh === s)
  return (
    <div className="overflow-x-auto">
      <table className="border-collapse text-[11px]" data-testid="flag-grid">
        <thead>
          <tr>
            <th className="sticky left-0 bg-white px-1 text-left text-slate-500">{props.kind === 'regen' ? 'brake ' : ''}% \ km/h</th>
            {t.colAxis.map((s) => (
              <th key={s} className="px-1 text-slate-500">{s}</th>
            ))}
          </tr>
        </thead>
        <tbody>
          {t.rowAxis.map((p, r) => (
            <tr key={p}>
              <th className="sticky left-0 bg-white px-1 text-right text-slate-500">{p}</th>
              {t.colAxis.map((s, c) => (
                <td key={s} className="p-0">
                  <button
                    type="button"
                    aria-label={`${Math.round(t.values[r][c])}: flag ${p} % ${pedal} at ${s} km/h`}
                    onClick={() => props.onPick(p, s)}
                    className={`h-8 min-w-10 border border-line px-1 tabular-nums ${isFlagged(p, s) ? 'bg-amber-300 font-bold' : 'bg-white hover:bg-accent-soft'}`}
                  >
                    {Math.round(t.values[r][c])}
                  </button>
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-1 text-xs text-slate-500">{props.kind === 'regen' ? 'Regen torque' : 'Torque request'} in N·m. Tap a cell to flag it.</p>
    </div>
  )
}
