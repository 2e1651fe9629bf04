/**
 * Table lookup as a vehicle controller does it: bilinear interpolation between breakpoints,
 * held at the edge values outside the axes (no extrapolation, which could invent torque).
 */
import { MapInputError } from './errors'
import type { MapTable } from './table'

/**
 * Index `i` of the interval [axis[i], axis[i+1]] holding `x`, by binary search (O(log n), the
 * lookup runs per pixel in the surface plot). Outside the axis it returns the edge interval;
 * callers clamp the fraction. For a one-point axis it returns 0.
 * @example findInterval([0, 10, 20], 15) // 1
 */
export function findInterval(axis: readonly number[], x: number): number {
  let lo = 0
  let hi = axis.length - 1
  if (hi <= 0) return 0
  // Invariant: the answer lies in [lo, hi - 1].
  while (hi - lo > 1) {
    const mid = (lo + hi) >>> 1
    if (axis[mid] <= x) lo = mid
    else hi = mid
  }
  return lo
}

/** Fractional position of x in axis interval i, clamped to [0, 1]. */
function fraction(axis: readonly number[], i: number, x: number): number {
  if (axis.length < 2) return 0
  const t = (x - axis[i]) / (axis[i + 1] - axis[i])
  return t <= 0 ? 0 : t >= 1 ? 1 : t
}

/**
 * Torque request at a pedal position and road speed, N·m.
 * With x = speed, y = pedal and the four surrounding cells f11, f21, f12, f22 this is
 * f ≈ f11(1−t)(1−u) + f21·t(1−u) + f12(1−t)u + f22·t·u, with t, u the fractions along each axis.
 * Exact on breakpoints; coordinates outside the axes are clamped to the nearest edge.
 * Throws MapInputError for a non-finite coordinate rather than returning NaN.
 * @example lookup({ kind: 'drive', rowAxis: [0, 100], colAxis: [0, 10], values: [[0, 0], [100, 200]] }, 50, 5) // 75
 */
export function lookup(table: MapTable, pedalPct: number, speedKmh: number): number {
  if (!Number.isFinite(pedalPct) || !Number.isFinite(speedKmh))
    throw new MapInputError('not-finite', `lookup needs finite coordinates, got pedal ${pedalPct} %, speed ${speedKmh} km/h`)
  const { rowAxis, colAxis, values } = table
  if (rowAxis.length === 0 || colAxis.length === 0)
    throw new MapInputError('empty-axis', 'lookup needs at least one breakpoint on each axis')
  const r = findInterval(rowAxis, pedalPct)
  const c = findInterval(colAxis, speedKmh)
  const u = fraction(rowAxis, r, pedalPct)
  const t = fraction(colAxis, c, speedKmh)
  const r1 = Math.min(r + 1, rowAxis.length - 1)
  const c1 = Math.min(c + 1, colAxis.length - 1)
  const f11 = values[r][c]
  const f21 = values[r][c1]
  const f12 = values[r1][c]
  const f22 = values[r1][c1]
  // Skip the zero-weight terms so a neighbouring NaN cannot leak into an exact breakpoint hit.
  let v = f11 * (1 - t) * (1 - u)
  if (t > 0) v += f21 * t * (1 - u)
  if (u > 0) v += f12 * (1 - t) * u
  if (t > 0 && u > 0) v += f22 * t * u
  return v
}
