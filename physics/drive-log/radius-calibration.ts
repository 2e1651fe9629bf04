/**
 * Per-log effective-radius calibration. A logged wheel speed is Ω·R_nom with the program's nominal dynamic
 * radius; the tyre actually rolls on R_eff (tread wear, inflation, load). Where no torque acts the tyre
 * carries no longitudinal force and so no slip, and V = Ω·R_eff; the wheel-to-road speed ratio there,
 *
 *     ρ = Σ v_w·Δt / Σ V·Δt = R_nom / R_eff,
 *
 * is the radius error, and dividing every wheel speed by ρ removes it. Hand case: 20 mm of tread worn off a
 * 0.52 m drive tyre gives R_eff = 0.50 m, ρ = 1.04, and an uncalibrated 4.0 % "slip" on every straight mile
 * (20/520 = 3.8 % of the new radius) — as large as a wet-road spin warning.
 *
 * Qualifying samples: |motor torque| ≤ 50 N·m, brake pedal released, straight (|ψ̇| ≤ 0.01 rad/s when a yaw
 * rate is logged; else left and right of an axle within 0.5 % of each other when both are logged), steady
 * (|dV/dt| ≤ 0.5 m/s² against the previous sample) and at ≥ 30 km/h, where a 0.1 m/s satellite-speed error
 * is 1.2 % of a sample and averages out over many. At least 10 s of them are needed. A ratio more than ±5 %
 * from 1 is not applied: a worn-out tyre changes its radius by about 4 %, so more than 5 % points to a wrong
 * nominal radius, a wrong road-speed source or a speed column in the wrong unit — to be fixed, not calibrated away.
 */
import { PhysicsInputError, requirePositive } from '../errors'
import type { WheelChannel } from './columns'
import { LogFormatError, type LogColumnRef } from './errors'
import type { LogSample, RadiusCalibration } from './types'
import { createWheelCombiner, DEFAULT_DRIVE_TRACK_WIDTH_M } from './wheel-speed'

/** Bounds of the calibration; every field optional, defaults as documented above. */
export interface RadiusCalibrationOptions {
  /** Channel of each wheel-speed entry (from the log's layout). Default: one unnamed wheel per entry. */
  wheelChannels?: readonly WheelChannel[]
  trackWidthM?: number
  /** |motor torque| at or below this counts as zero torque, N·m. Default 50. */
  maxTorqueNm?: number
  /** Largest |yaw rate| of a straight stretch, rad/s. Default 0.01. */
  maxYawRadS?: number
  /** Largest |left − right|/mean of a straight stretch without a yaw rate. Default 0.005. */
  maxSideDiff?: number
  /** Slowest qualifying road speed, km/h. Default 30. */
  minSpeedKmh?: number
  /** Largest |dV/dt| of a steady stretch, m/s². Default 0.5. */
  maxAccelMps2?: number
  /** Least qualifying time, s. Default 10. */
  minSeconds?: number
  /** Largest accepted |R_eff/R_nom − 1|, %. Default 5. */
  maxChangePct?: number
  /** A longer time step is a gap, s. Default 1. */
  maxGapS?: number
  /** The time column, for the position in a time-order error (the same error the analyser gives). */
  timeColumn?: LogColumnRef
}

/** Accumulator; push every sample of the log, then `result()`. */
export interface RadiusCalibrator {
  push(s: LogSample): void
  result(): RadiusCalibration
}

const fin = (x: number | undefined): x is number => x !== undefined && x === x && x !== Infinity && x !== -Infinity

/** @example const c = createRadiusCalibrator({ wheelChannels: ['wheel'] }); samples.forEach(c.push); c.result().ratio // ≈ 1.04 */
export function createRadiusCalibrator(opts: RadiusCalibrationOptions = {}): RadiusCalibrator {
  const pos = (name: keyof RadiusCalibrationOptions, dflt: number) => {
    const v = opts[name]
    return v === undefined ? dflt : requirePositive(name, v as number)
  }
  const maxTorque = pos('maxTorqueNm', 50)
  const maxYaw = pos('maxYawRadS', 0.01)
  const maxSide = pos('maxSideDiff', 0.005)
  const minSpeed = pos('minSpeedKmh', 30)
  const maxAccel = pos('maxAccelMps2', 0.5)
  const minSeconds = pos('minSeconds', 10)
  const bound = pos('maxChangePct', 5)
  const maxGap = pos('maxGapS', 1)
  const trackWidth = pos('trackWidthM', DEFAULT_DRIVE_TRACK_WIDTH_M)
  if (bound >= 100) throw new PhysicsInputError('maxChangePct', 'must be below 100 %')
  let combiner: ReturnType<typeof createWheelCombiner> | null = opts.wheelChannels ? createWheelCombiner(opts.wheelChannels, trackWidth) : null
  let out = new Float64Array(combiner?.size ?? 0)
  let sumW = 0, sumV = 0, seconds = 0, samples = 0, sawTorque = false
  let prevT = NaN, prevV = NaN, n = 0 // n: samples seen, for the default line number

  function straight(s: LogSample): boolean {
    if (fin(s.yawRateRadS)) return Math.abs(s.yawRateRadS) <= maxYaw
    const ch = opts.wheelChannels
    if (!ch) return true
    for (const [l, r] of [['wheelLeft', 'wheelRight'], ['wheelLeft2', 'wheelRight2']] as const) {
      const a = s.wheelSpeedsKmh[ch.indexOf(l)], b = s.wheelSpeedsKmh[ch.indexOf(r)]
      if (fin(a) && fin(b) && Math.abs(a - b) > maxSide * 0.5 * Math.abs(a + b)) return false
    }
    return true // without a yaw rate or a wheel pair straightness cannot be checked; the road speed is averaged anyway
  }

  return {
    push(s) {
      if (!combiner) { combiner = createWheelCombiner(s.wheelSpeedsKmh.map(() => undefined), trackWidth); out = new Float64Array(combiner.size) }
      const t = s.timeS, V = s.roadSpeedKmh
      // A first pass must refuse a bad log as the analysis would, so the first error in the file is the one reported.
      const line = s.line ?? n + 2
      if (!fin(t)) throw new LogFormatError('row', line, opts.timeColumn ?? null, 'time is missing or not a finite number')
      if (n++ > 0 && t < prevT) throw new LogFormatError('time-order', line, opts.timeColumn ?? null, `time ${t} s is earlier than the previous row (${prevT} s); time must not decrease`)
      const dt = t - prevT
      const steady = dt > 0 && dt <= maxGap && fin(prevV) && Math.abs((V - prevV) / 3.6 / dt) <= maxAccel
      prevT = t
      prevV = fin(V) ? V : NaN
      if (fin(s.motorTorqueNm)) sawTorque = true
      if (!steady || !(V >= minSpeed) || !fin(s.motorTorqueNm) || Math.abs(s.motorTorqueNm) > maxTorque) return
      if (fin(s.brakePedalPct) && s.brakePedalPct > 1) return
      if (!straight(s)) return
      combiner.combine(s.wheelSpeedsKmh, s.yawRateRadS, out)
      let w = 0, k = 0
      for (let i = 0; i < out.length; i++) if (fin(out[i])) { w += out[i]; k++ }
      if (k === 0) return
      sumW += (w / k) * dt
      sumV += V * dt
      seconds += dt
      samples++
    },
    result() {
      const ratio = sumV > 0 ? sumW / sumV : null
      const radiusChangePct = ratio === null ? null : (1 / ratio - 1) * 100
      const base = { ratio, radiusChangePct, seconds, samples, boundPct: bound }
      if (!sawTorque) return { ...base, status: 'insufficient', reason: 'the log has no motor torque: zero-torque stretches cannot be told apart, so the nominal radius is used' }
      if (ratio === null || seconds < minSeconds)
        return { ...base, status: 'insufficient', reason: `${seconds.toFixed(1)} s of straight, steady zero-torque driving at ≥ ${minSpeed} km/h (${minSeconds} s needed); the nominal radius is used` }
      if (Math.abs(radiusChangePct!) > bound)
        return { ...base, status: 'rejected', reason: `the effective radius would change by ${radiusChangePct!.toFixed(1)} %, beyond ±${bound} %: check the wheel radius, the road-speed source and the speed units; the nominal radius is used` }
      return { ...base, status: 'applied', reason: `wheel speeds divided by ${ratio.toFixed(4)} (effective radius ${radiusChangePct! >= 0 ? '+' : ''}${radiusChangePct!.toFixed(2)} % of nominal), from ${seconds.toFixed(1)} s of straight, steady zero-torque driving` }
    },
  }
}
