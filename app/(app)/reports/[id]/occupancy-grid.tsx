import type { MapOccupancy, SlipEvent } from '@/physics'

/**
 * Where on the map the truck spent its time (darker = longer), with the cells where spin or
 * lock-up events began marked, so the engineer sees which cells to look at.
 */
export function OccupancyGrid({ occupancy: o, events, mapKind }: { occupancy: MapOccupancy; events: SlipEvent[]; mapKind: 'drive' | 'regen' }) {
  const max = Math.max(1e-9, ...o.seconds.flat())
  const nearest = (axis: number[], v: number) => axis.reduce((best, x, i) => (Math.abs(x - v) < Math.abs(axis[best] - v) ? i : best), 0)
  const marks = new Map<string, number>()
  for (const e of events) {
    const pedal = mapKind === 'regen' ? (e.start.brakePedalPct ?? 0) : e.start.accelPedalPct
    const k = `${nearest(o.rowAxis, pedal)}:${nearest(o.colAxis, e.start.roadSpeedKmh)}`
    marks.set(k, (marks.get(k) ?? 0) + 1)
  }
  return (
    // Focusable, so a keyboard can scroll it on a phone; shading kept light enough that dark numbers read (≥ 4.5:1).
    <div className="overflow-x-auto" tabIndex={0} role="region" aria-label="Time in each map cell">
      <h3 className="mb-1 text-sm font-semibold">Time in each map cell, with events</h3>
      <table className="border-collapse text-[11px]" data-testid="occupancy-grid">
        <thead>
          <tr>
            <th className="px-1 text-slate-500">{mapKind === 'regen' ? 'brake %' : 'pedal %'} \ km/h</th>
            {o.colAxis.map((s) => <th key={s} className="px-1 text-slate-500">{s}</th>)}
          </tr>
        </thead>
        <tbody>
          {o.rowAxis.map((p, r) => (
            <tr key={p}>
              <th className="px-1 text-right text-slate-500">{p}</th>
              {o.colAxis.map((s, c) => {
                const sec = o.seconds[r][c]
                const n = marks.get(`${r}:${c}`)
                return (
                  <td key={s} title={`${sec.toFixed(1)} s${n ? `, ${n} event(s)` : ''}`} className="h-6 min-w-9 border border-line text-center tabular-nums" style={{ background: `rgba(15,107,92,${(0.55 * sec) / max})` }}>
                    {n ? <span className="rounded bg-white px-0.5 font-bold text-amber-800">●{n}</span> : sec >= 1 ? Math.round(sec) : ''}
                  </td>
                )
              })}
            </tr>
          ))}
        </tbody>
      </table>
      <p className="text-xs text-slate-500">Numbers are seconds; ● marks where events began.</p>
    </div>
  )
}
