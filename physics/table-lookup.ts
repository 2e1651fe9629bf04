/**
 * Torque map and bilinear lookup, clamped to the edge values outside the axes.
 * Kept local to physics so the physics stays independent of the maps module; same semantics.
 */
import { PhysicsInputError, requireFinite } from './errors'

/**
 * A drive or regen map: rows = pedal % (ascending), columns = road speed km/h (ascending),
 * values[row][col] in N·m at the motor shaft. In a regen map values are braking torque magnitudes (≥ 0 = regen).
 */
export interface TorqueMap {
  kind: 'drive' | 'regen'
  rowAxis: number[]
  colAxis: number[]
  values: number[][]
}

function checkAxis(name: string, axis: number[]): void {
  if (!Array.isArray(axis) || axis.length < 1) throw new PhysicsInputError(name, 'needs at least one breakpoint')
  for (let i = 0; i < axis.length; i++) {
    requireFinite(`${name}[${i}]`, axis[i])
    if (i > 0 && !(axis[i] > axis[i - 1])) throw new PhysicsInputError(`${name}[${i}]`, 'breakpoints must be strictly ascending')
  }
}

/** Throws PhysicsInputError unless axes ascend strictly and values are a finite rows×cols grid. @example checkMap(map) */
export function checkMap(map: Pick<TorqueMap, 'rowAxis' | 'colAxis' | 'values'>, prefix = 'map.'): void {
  checkAxis(`${prefix}rowAxis`, map.rowAxis)
  checkAxis(`${prefix}colAxis`, map.colAxis)
  if (!Array.isArray(map.values) || map.values.length !== map.rowAxis.length)
    throw new PhysicsInputError(`${prefix}values`, `needs ${map.rowAxis.length} rows`)
  map.values.forEach((row, r) => {
    if (!Array.isArray(row) || row.length !== map.colAxis.length)
      throw new PhysicsInputError(`${prefix}values[${r}]`, `needs ${map.colAxis.length} columns`)
    row.forEach((x, c) => requireFinite(`${prefix}values[${r}][${c}]`, x))
  })
}

/** Index i and fraction f with axis[i] ≤ x ≤ axis[i+1], clamped at the ends. */
function locate(axis: number[], x: number): [number, number] {
  const n = axis.length
  if (n === 1 || x <= axis[0]) return [0, 0]
  if (x >= axis[n - 1]) return [n - 2, 1]
  let lo = 0
  let hi = n - 1
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1
    if (axis[mid] <= x) lo = mid; else hi = mid
  }
  return [lo, (x - axis[lo]) / (axis[lo + 1] - axis[lo])]
}

/**
 * Bilinear interpolation at (row value, column value), clamped to edge values outside the axes.
 * Does not validate the map (call {@link checkMap} once); throws on a non-finite query.
 * @example lookup({ kind: 'drive', rowAxis: [0, 100], colAxis: [0, 10], values: [[0, 0], [100, 200]] }, 50, 5) // 75
 */
export function lookup(map: Pick<TorqueMap, 'rowAxis' | 'colAxis' | 'values'>, row: number, col: number): number {
  requireFinite('row', row)
  requireFinite('col', col)
  const [i, fr] = locate(map.rowAxis, row)
  const [j, fc] = locate(map.colAxis, col)
  const r0 = map.values[i]
  const r1 = map.values[Math.min(i + 1, map.rowAxis.length - 1)]
  const j1 = Math.min(j + 1, map.colAxis.length - 1)
  const a = r0[j] + (r0[j1] - r0[j]) * fc
  const b = r1[j] + (r1[j1] - r1[j]) * fc
  return a + (b - a) * fr
}
