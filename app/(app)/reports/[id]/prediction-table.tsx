import type { EventPrediction } from '@/app/_lib/reports/log-prediction'

export type Prediction = EventPrediction

const f = (v: number | null, d = 3) => (v === null ? 'beyond peak' : v.toFixed(d))

/**
 * Measured slip at each event beside what the model predicts for the same cell, load case and
 * surface: wheel spin on the set's drive map, lock-up on its regen map.
 */
export function PredictionTable({ predictions }: { predictions: Prediction[] }) {
  if (predictions.length === 0) return <p className="text-sm text-slate-500">No wheel-spin or lock-up event on a map of this set for the model to compare with.</p>
  const agree = predictions.filter((p) => p.predictedBeyondPeak).length
  const kind = (p: Prediction) => (p.kind === 'spin' ? 'Spin (drive map)' : 'Lock-up (regen map)')
  return (
    <div>
      <h3 className="mb-1 text-sm font-semibold">Measured against predicted</h3>
      <p className="mb-1 text-xs text-slate-600">
        The model predicts the event at {agree} of {predictions.length}: spin judged on the drive map, lock-up on the regen map. Where it does not, the tyre or surface grip in the model is more optimistic than the road was.
      </p>
      {/* A phone gets one block per event: eight columns cannot be read at 390 px. */}
      <ol className="space-y-2 sm:hidden" data-testid="prediction-list">
        {predictions.map((p, i) => (
          <li key={i} className={`rounded-md border border-line p-2 text-sm ${p.predictedBeyondPeak ? 'bg-amber-50' : ''}`}>
            <p className="font-semibold">{kind(p)} at {p.startS.toFixed(1)} s</p>
            <dl className="grid grid-cols-[auto_1fr] gap-x-3 text-xs">
              <dt className="text-slate-600">Pedal, speed</dt><dd>{p.pedalPct.toFixed(0)} %, {p.speedKmh.toFixed(1)} km/h</dd>
              <dt className="text-slate-600">Map torque</dt><dd>{p.mapTorqueNm.toFixed(0)} N·m</dd>
              <dt className="text-slate-600">Measured peak slip</dt><dd>{p.measuredPeakSlip.toFixed(3)}</dd>
              <dt className="text-slate-600">Predicted slip</dt><dd>{f(p.predictedSlip)}</dd>
              <dt className="text-slate-600">Traction used</dt><dd>{(p.utilisation * 100).toFixed(0)} %</dd>
            </dl>
          </li>
        ))}
      </ol>
      <div className="hidden overflow-x-auto sm:block" tabIndex={0} role="region" aria-label="Measured against predicted, by event">
        <table className="w-full text-sm" data-testid="prediction-table">
          <thead className="text-left text-xs uppercase text-slate-600">
            <tr><th>Event</th><th>Start (s)</th><th>Pedal (%)</th><th>Speed (km/h)</th><th>Map torque (N·m)</th><th>Measured peak slip</th><th>Predicted slip</th><th>Traction used</th></tr>
          </thead>
          <tbody>
            {predictions.map((p, i) => (
              <tr key={i} className={`border-t border-line ${p.predictedBeyondPeak ? 'bg-amber-50' : ''}`}>
                <td>{kind(p)}</td>
                <td>{p.startS.toFixed(1)}</td>
                <td>{p.pedalPct.toFixed(0)}</td>
                <td>{p.speedKmh.toFixed(1)}</td>
                <td>{p.mapTorqueNm.toFixed(0)}</td>
                <td>{p.measuredPeakSlip.toFixed(3)}</td>
                <td>{f(p.predictedSlip)}</td>
                <td>{(p.utilisation * 100).toFixed(0)} %</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  )
}
