/**
 * Checked access to a torque map for the physics: validation with PhysicsInputError naming the
 * field, then the one bilinear lookup of physics/table.ts.
 */
import { PhysicsInputError, requireFinite } from './errors'
import { interpolate, type TableGrid } from './table'

function checkAxis(name: string, axis: number[]): void {
  if (!Array.isArray(axis) || axis.length < 1) throw new PhysicsInputError(name, 'needs at least one breakpoint')
  for (let i = 0; i < axis.length; i++) {
    requireFinite(`${name}[${i}]`, axis[i])
    if (i > 0 && !(axis[i] > axis[i - 1])) throw new PhysicsInputError(`${name}[${i}]`, 'breakpoints must be strictly ascending')
  }
}

/** Throws PhysicsInputError unless axes ascend strictly and values are a finite rows×cols grid. @example checkMap(map) */
export function checkMap(map: TableGrid, prefix = 'map.'): void {
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

/**
 * Bilinear interpolation at (row value, column value), clamped to edge values outside the axes.
 * Does not validate the map (call {@link checkMap} once); throws on a non-finite query.
 * @example lookup({ kind: 'drive', rowAxis: [0, 100], colAxis: [0, 10], values: [[0, 0], [100, 200]] }, 50, 5) // 75
 */
export function lookup(map: TableGrid, row: number, col: number): number {
  requireFinite('row', row)
  requireFinite('col', col)
  return interpolate(map, row, col)
}
