'use client'
/** The summary figures of a launch or lift-off, in the chosen units. */
import { tableNumber, type UnitSet } from '@/maps'
import type { SimulationResponse } from '@/app/_lib/physics/simulate'

const secs = (s: number | null) => (s === null ? 'not reached' : `${s.toFixed(2)} s`)

export function SimulationSummary({ result, units: u }: { result: SimulationResponse; units: UnitSet }) {
  const speed = (kmh: number) => `${tableNumber(u.speedOut(kmh))} ${u.speed}`
  const items: [string, string, boolean?][] =
    result.mode === 'launch'
      ? [
          [`Time to ${speed(30)}`, secs(result.summary.timeTo30KmhS)],
          [`Time to ${speed(50)}`, secs(result.summary.timeTo50KmhS)],
          ['Peak slip', result.summary.peakSlip.toFixed(3), result.summary.timeBeyondPeakSlipS > 0],
          ['Tyre peak slip', result.summary.tyrePeakSlip === null ? 'none' : result.summary.tyrePeakSlip.toFixed(3)],
          ['Time beyond peak slip (wheel spin)', `${result.summary.timeBeyondPeakSlipS.toFixed(2)} s`, result.summary.timeBeyondPeakSlipS > 0],
          ['Peak acceleration', `${result.summary.peakAccelMps2.toFixed(2)} m/s²`],
          ['Peak jerk', `${result.summary.peakJerkMps3.toFixed(1)} m/s³`],
          ['Final speed', speed(result.summary.finalSpeedKmh)],
        ]
      : [
          ['Peak deceleration', `${result.summary.peakDecelMps2.toFixed(2)} m/s²`],
          ['Peak (most negative) slip', result.summary.minSlip.toFixed(3), result.summary.locks],
          ['Tyre peak slip', result.summary.tyrePeakSlip === null ? 'none' : `−${result.summary.tyrePeakSlip.toFixed(3)}`],
          ['Drive axle locks', result.summary.locks ? `yes, from ${secs(result.summary.lockTimeS)}` : 'no', result.summary.locks],
          ['Time beyond peak slip', `${result.summary.timeBeyondPeakSlipS.toFixed(2)} s`, result.summary.locks],
          ['Peak jerk', `${result.summary.peakJerkMps3.toFixed(1)} m/s³`],
          ['Final speed', speed(result.summary.finalSpeedKmh)],
        ]
  return (
    <dl className="grid grid-cols-2 gap-2 sm:grid-cols-4" data-testid="simulation-summary">
      {items.map(([k, v, bad]) => (
        <div key={k} className={`rounded border px-2 py-1 ${bad ? 'border-red-300 bg-red-50' : 'border-line'}`}>
          <dt className="text-xs text-slate-500">{k}</dt>
          <dd className={`font-semibold tabular-nums ${bad ? 'text-danger' : ''}`}>{v}</dd>
        </div>
      ))}
    </dl>
  )
}
