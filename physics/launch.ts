/** Standing (or rolling) launch on a drive map: pedal trace → map torque → envelope → tyre → vehicle. */
import { checkPedalTrace, pedalAt, type PedalTrace } from './pedal'
import { runSimulation, type SimOptions, type SimSample } from './sim-core'
import type { MapTable } from './table'
import { lookup } from './table-lookup'
import { requireNonNegative } from './errors'
import { commonSummary, startOfRun } from './map-run'

/** Launch inputs. `map.kind` must be `'drive'`; map values are motor-shaft torque, N·m. */
export interface LaunchOptions extends SimOptions {
  map: MapTable
  pedal: PedalTrace
  /** Initial road speed, km/h (default 0). */
  initialSpeedKmh?: number
}

/** Launch summary figures (times in s, null when the speed is not reached within durationS). */
export interface LaunchSummary {
  timeTo30KmhS: number | null
  timeTo50KmhS: number | null
  finalSpeedKmh: number
  peakSlip: number
  /** Slip at the Magic Formula peak for the surface (Infinity for a monotone curve). */
  tyrePeakSlip: number
  timeBeyondPeakSlipS: number
  peakAccelMps2: number
  peakJerkMps3: number
}

/** Launch result: time series and summary. */
export interface LaunchResult { samples: SimSample[]; summary: LaunchSummary }

/**
 * Simulates a launch. Drive-map torque is looked up at the pedal % and the road speed (the driven-wheel
 * speed when `vehicle.mapSpeedSource` says so, docs/physics.md §9a),
 * clipped to the motor envelope and battery discharge power at the actual motor speed.
 * @example simulateLaunch({ vehicle: truck, loadCase: 'laden', surface: 'wet-asphalt', map: driveMap,
 *   pedal: { kind: 'step', pedalPct: 100 }, durationS: 30 }).summary.timeTo50KmhS
 */
export function simulateLaunch(o: LaunchOptions): LaunchResult {
  const v0 = startOfRun(o.map, 'drive', 'launch', o.initialSpeedKmh ?? 0, requireNonNegative)
  checkPedalTrace(o.pedal)
  const run = runSimulation(o, (t) => pedalAt(o.pedal, t), (p, kmh) => lookup(o.map, p, kmh), v0, [30, 50])
  return {
    samples: run.samples,
    summary: {
      ...commonSummary(run),
      timeTo30KmhS: run.crossings[0],
      timeTo50KmhS: run.crossings[1],
      peakSlip: run.peakSlip,
      timeBeyondPeakSlipS: run.timeBeyondPeakDriveS,
      peakAccelMps2: run.samples.reduce((m, s) => Math.max(m, s.accelMps2), 0),
    },
  }
}
