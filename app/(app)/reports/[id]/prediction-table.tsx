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
  return (
    <div className="overflow-x-auto">
      <h3 className="mb-1 text-sm font-semibold">Measured against predicted</h3>
      <p className="mb-1 text-xs text-slate-600">
        The model predicts the event at {agree} of {predictions.length}: spin judged on the drive map, lock-up on the regen map. Where it does not, the tyre or surface grip in the model is more optimistic than the road was.
      </p>
      <table className="w-full text-sm" data-testid="prediction-table">
        <thead className="text-left text-xs uppercase text-slate-500">
          <tr><th>Event</th><th>Start (s)</th><th>Pedal (%)</th><th>Speed (km/h)</th><th>Map torque (N·m)</th><th>Measured peak slip</th><th>Predicted slip</th><th>Traction used</th></tr>
        </thead>
        <tbody>
          {predictions.map((p, i) => (
            <tr key={i} className={`border-t border-line ${p.predictedBeyondPeak ? 'bg-amber-50' : ''}`}>
              <td>{p.kind === 'spin' ? 'Spin (drive map)' : 'Lock-up (regen map)'}</td>
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
  )
}
