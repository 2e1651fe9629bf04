/** Lift-off (accelerator released) regen on the drive axle: the regen map's 0 % row brakes the drive wheels. */
import { runSimulation, type SimOptions, type SimSample } from './sim-core'
import type { MapTable } from './table'
import { lookup } from './table-lookup'
import { requirePositive } from './errors'
import { commonSummary, startOfRun } from './map-run'

/** Lift-off inputs. `map.kind` must be `'regen'`; values are braking torque magnitudes at the motor shaft (≥ 0 = regen). */
export interface LiftOffOptions extends SimOptions {
  map: MapTable
  /** Speed when the pedal is released, km/h. */
  initialSpeedKmh: number
  /** Stop the simulation below this speed, km/h (default 2). */
  stopSpeedKmh?: number
}

/** Lift-off summary. Deceleration positive when slowing, m/s². */
export interface LiftOffSummary {
  peakDecelMps2: number
  /** Most negative slip reached (−1 = wheel stopped). */
  minSlip: number
  tyrePeakSlip: number
  /** True when the drive-axle slip went beyond the peak on the braking side (lock-up). */
  locks: boolean
  lockTimeS: number | null
  timeBeyondPeakSlipS: number
  finalSpeedKmh: number
  peakJerkMps3: number
}

/** Lift-off result: time series and summary. */
export interface LiftOffResult { samples: SimSample[]; summary: LiftOffSummary }

/**
 * Simulates a lift-off from `initialSpeedKmh` with pedal 0: the regen map's 0 % row (looked up at
 * the vehicle speed) gives the braking torque, limited by the motor envelope and battery charge power.
 * @example simulateLiftOff({ vehicle: truck, loadCase: 'empty', surface: 'ice', map: regenMap,
 *   initialSpeedKmh: 60, durationS: 10 }).summary.locks
 */
export function simulateLiftOff(o: LiftOffOptions): LiftOffResult {
  const v0 = startOfRun(o.map, 'regen', 'lift-off', o.initialSpeedKmh, requirePositive)
  const run = runSimulation(o, () => 0, (p, kmh) => -lookup(o.map, p, kmh), v0, [], o.stopSpeedKmh ?? 2)
  const locks = run.timeBeyondPeakBrakeS > 0
  return {
    samples: run.samples,
    summary: {
      ...commonSummary(run),
      peakDecelMps2: run.samples.reduce((m, s) => Math.max(m, -s.accelMps2), 0),
      minSlip: run.minSlip,
      locks,
      lockTimeS: run.firstLockS,
      timeBeyondPeakSlipS: run.timeBeyondPeakBrakeS,
    },
  }
}
