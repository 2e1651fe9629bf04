// Test helpers: build samples on a fixed time step and run them through the pure analyser.
import { createLogAnalyser, type AnalysisResult, type LogAnalyserOptions, type LogSample } from '@/physics'

/** A constant-condition sample at time t (s); override any field. */
export function sample(t: number, over: Partial<LogSample> = {}): LogSample {
  return { timeS: t, roadSpeedKmh: 36, wheelSpeedsKmh: [36], accelPedalPct: 20, brakePedalPct: 0, ...over }
}

/** Pushes every sample and returns the result plus the per-sample slips. */
export function analyse(samples: readonly LogSample[], opts: LogAnalyserOptions = {}): { result: AnalysisResult; slips: number[] } {
  const a = createLogAnalyser(opts)
  const slips = samples.map((s) => a.push(s))
  return { result: a.finish(), slips }
}

/** Samples every `dt` s from 0 to `endS` inclusive, built by `f(t, i)`. */
export function series(endS: number, dt: number, f: (t: number, i: number) => Partial<LogSample>): LogSample[] {
  const n = Math.round(endS / dt)
  return Array.from({ length: n + 1 }, (_, i) => sample(i * dt, f(i * dt, i)))
}

export const HEADER = 'time_s,road_speed_kmh,wheel_speed_kmh,accel_pedal_pct'
