/** What launch and lift-off share: checking the map and start speed, and the summary figures every run reports. */
import { PhysicsInputError } from './errors'
import type { SimRun } from './sim-core'
import type { MapKind, MapTable } from './table'
import { checkMap } from './table-lookup'
import { kmhToMps } from './units'

/**
 * Throws PhysicsInputError unless `map` is a well-formed map of `kind` and the start speed passes
 * `rule` (requirePositive, requireNonNegative …); returns the start speed in m/s.
 * @example startOfRun(map, 'drive', 'launch', 0, requireNonNegative) // 0
 */
export function startOfRun(map: MapTable, kind: MapKind, purpose: string, initialSpeedKmh: number, rule: (field: string, v: number) => number): number {
  if (map.kind !== kind) throw new PhysicsInputError('map.kind', `a ${purpose} needs a ${kind} map`)
  checkMap(map)
  return kmhToMps(rule('initialSpeedKmh', initialSpeedKmh))
}

/** Summary figures common to every run: the tyre's peak slip, the last speed and the peak jerk. */
export function commonSummary(run: SimRun): { tyrePeakSlip: number; finalSpeedKmh: number; peakJerkMps3: number } {
  return { tyrePeakSlip: run.tyrePeakSlip, finalSpeedKmh: run.samples[run.samples.length - 1].speedKmh, peakJerkMps3: run.peakJerkMps3 }
}
