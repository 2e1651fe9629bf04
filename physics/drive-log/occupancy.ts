/**
 * Map-cell occupancy: seconds spent near each breakpoint of a pedal % × km/h map. Each interval's
 * duration goes to the four breakpoints around the operating point with bilinear weights (the same
 * weights the map lookup uses, clamped at the edges), so the grid says how long each cell value
 * actually shaped the torque. Weights sum to 1, so the grid sums to the assigned time.
 */
import type { MapKind } from '../table'
import type { MapOccupancy } from './types'

/**
 * Lower breakpoint index of x on an ascending axis, clamped to [0, n − 2] (0 for a one-point axis);
 * the weight of the upper neighbour is then (x − axis[i])/(axis[i+1] − axis[i]) clamped to [0, 1].
 */
function lowerIndex(axis: readonly number[], x: number): number {
  const n = axis.length
  if (n < 3 || x <= axis[1]) return 0
  if (x >= axis[n - 2]) return n - 2
  let lo = 1
  let hi = n - 2
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1
    if (axis[mid] <= x) lo = mid; else hi = mid
  }
  return lo
}

function upperWeight(axis: readonly number[], i: number, x: number): number {
  if (axis.length === 1) return 0
  const f = (x - axis[i]) / (axis[i + 1] - axis[i])
  return f <= 0 ? 0 : f >= 1 ? 1 : f
}

/** Accumulator for one map's axes. */
export interface OccupancyGrid {
  /** Adds `dtS` seconds at (pedal %, speed km/h). */
  add(pedalPct: number, speedKmh: number, dtS: number): void
  unassigned(dtS: number): void
  result(): MapOccupancy
}

/** Axes must be ascending (checked by the analyser). @example createOccupancy('drive', [0, 100], [0, 50]).add(50, 25, 1) */
export function createOccupancy(kind: MapKind, rowAxis: readonly number[], colAxis: readonly number[]): OccupancyGrid {
  const rows = rowAxis.slice()
  const cols = colAxis.slice()
  const nc = cols.length
  const grid = new Float64Array(rows.length * nc)
  let unassignedS = 0
  return {
    add(pedalPct, speedKmh, dtS) {
      // No tuples here: this runs once per log row.
      const r = lowerIndex(rows, pedalPct)
      const fr = upperWeight(rows, r, pedalPct)
      const c = lowerIndex(cols, speedKmh)
      const fc = upperWeight(cols, c, speedKmh)
      const k = r * nc + c
      grid[k] += dtS * (1 - fr) * (1 - fc)
      if (fc > 0) grid[k + 1] += dtS * (1 - fr) * fc
      if (fr > 0) {
        grid[k + nc] += dtS * fr * (1 - fc)
        if (fc > 0) grid[k + nc + 1] += dtS * fr * fc
      }
    },
    unassigned(dtS) { unassignedS += dtS },
    result: () => ({
      kind,
      rowAxis: rows.slice(),
      colAxis: cols.slice(),
      seconds: rows.map((_, r) => Array.from(grid.subarray(r * nc, r * nc + nc))),
      unassignedS,
    }),
  }
}
