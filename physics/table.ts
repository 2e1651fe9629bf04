/**
 * The torque map table — the one definition shared by physics, maps/, the database and the UI —
 * and its bilinear lookup, clamped to the edge values outside the axes as a vehicle controller does.
 *
 * A map is a 2-D grid of torque requests: rows are pedal position (%), columns road speed
 * (km/h). A drive map holds motoring torque; a regen map holds braking torque (≥ 0) by brake
 * pedal position, where the 0 % row is the lift-off regen applied with both pedals released.
 */

/** Map kinds in display order. */
export const MAP_KINDS = ['drive', 'regen'] as const
export type MapKind = (typeof MAP_KINDS)[number]

export interface MapTable {
  kind: MapKind
  /** Pedal position breakpoints, %, strictly increasing (regen: brake pedal; 0 % = lift-off). */
  rowAxis: number[]
  /** Road speed breakpoints, km/h, strictly increasing. */
  colAxis: number[]
  /** values[row][col]: torque request at the motor shaft, N·m (regen: braking torque, ≥ 0). */
  values: number[][]
}

/** The numeric part of a table, all the lookup needs. */
export type TableGrid = Pick<MapTable, 'rowAxis' | 'colAxis' | 'values'>

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
 * Bilinear interpolation at (row value, column value), unchecked: callers validate the
 * coordinates and the grid with their own error type (maps/lookup, physics lookup).
 * With x = column, y = row and the four surrounding cells f11, f21, f12, f22 this is
 * f ≈ f11(1−t)(1−u) + f21·t(1−u) + f12(1−t)u + f22·t·u, with t, u the fractions along each axis
 * (Numerical Recipes §3.6). Exact on breakpoints; outside the axes held at the edge values.
 * @example interpolate({ rowAxis: [0, 100], colAxis: [0, 10], values: [[0, 0], [100, 200]] }, 50, 5) // 75
 */
export function interpolate(table: TableGrid, row: number, col: number): number {
  const { rowAxis, colAxis, values } = table
  const r = findInterval(rowAxis, row)
  const c = findInterval(colAxis, col)
  const u = fraction(rowAxis, r, row)
  const t = fraction(colAxis, c, col)
  const r1 = Math.min(r + 1, rowAxis.length - 1)
  const c1 = Math.min(c + 1, colAxis.length - 1)
  // Skip the zero-weight terms so a neighbouring NaN cannot leak into an exact breakpoint hit.
  let v = values[r][c] * (1 - t) * (1 - u)
  if (t > 0) v += values[r][c1] * t * (1 - u)
  if (u > 0) v += values[r1][c] * (1 - t) * u
  if (t > 0 && u > 0) v += values[r1][c1] * t * u
  return v
}
