import type { AnalysisResult } from '@/physics'

type SlipEvent = AnalysisResult['events'][number]

const fmt = (v: number | null | undefined, d = 2) => (v === null || v === undefined ? '—' : v.toFixed(d))
const what = (e: SlipEvent) => (e.kind === 'spin' ? 'Wheel spin' : 'Lock-up')
// Spin happens on the accelerator, lock-up on the brake: the pedal that was pressed.
const pedal = (e: SlipEvent) => fmt(e.kind === 'spin' ? e.start.accelPedalPct : e.start.brakePedalPct, 0)

/** A log's wheel-spin and lock-up events: one block per event on a phone, a table from the sm breakpoint on. */
export function EventTable({ events }: { events: SlipEvent[] }) {
  if (events.length === 0) return null
  const shown = events.slice(0, 200)
  return (
    <div>
      <h3 className="mb-1 text-sm font-semibold">Slip events{events.length > shown.length ? ` (first ${shown.length} of ${events.length})` : ''}</h3>
      {/* Six columns cannot be read at 390 px, and a sideways scroll hides the speed. */}
      <ol className="space-y-2 sm:hidden" data-testid="event-list">
        {shown.map((e, i) => (
          <li key={i} className="rounded-md border border-line p-2 text-sm">
            <p className="font-semibold">{what(e)} at {fmt(e.startS, 1)} s</p>
            <dl className="grid grid-cols-[auto_1fr] gap-x-3 text-xs">
              <dt className="text-slate-600">Duration</dt><dd>{fmt(e.durationS, 2)} s</dd>
              <dt className="text-slate-600">Peak slip</dt><dd>{fmt(e.peakSlip, 3)}</dd>
              <dt className="text-slate-600">{e.kind === 'spin' ? 'Accelerator' : 'Brake'} pedal at start</dt><dd>{pedal(e)} %</dd>
              <dt className="text-slate-600">Speed at start</dt><dd>{fmt(e.start.roadSpeedKmh, 1)} km/h</dd>
            </dl>
          </li>
        ))}
      </ol>
      <div className="hidden overflow-x-auto sm:block" tabIndex={0} role="region" aria-label="Slip events">
        <table className="w-full text-sm" data-testid="event-table">
          <thead className="text-left text-xs uppercase text-slate-600">
            <tr><th>Event</th><th>Start (s)</th><th>Duration (s)</th><th>Peak slip</th><th>Pedal at start (%)</th><th>Speed at start (km/h)</th></tr>
          </thead>
          <tbody>
            {shown.map((e, i) => (
              <tr key={i} className="border-t border-line">
                <td>{what(e)}</td>
                <td>{fmt(e.startS, 1)}</td>
                <td>{fmt(e.durationS, 2)}</td>
                <td>{fmt(e.peakSlip, 3)}</td>
                <td>{pedal(e)}</td>
                <td>{fmt(e.start.roadSpeedKmh, 1)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  )
}
