/**
 * Table lookup for the map module: the bilinear interpolation of physics/table.ts, with the
 * map module's typed error for an unusable coordinate or axis.
 */
import { interpolate } from '../physics/table'
import { MapInputError } from './errors'
import type { MapTable } from './table'

export { findInterval } from '../physics/table'

/**
 * Torque request at a pedal position and road speed, N·m; coordinates outside the axes are
 * clamped to the nearest edge. Throws MapInputError for a non-finite coordinate rather than returning NaN.
 * @example lookup({ kind: 'drive', rowAxis: [0, 100], colAxis: [0, 10], values: [[0, 0], [100, 200]] }, 50, 5) // 75
 */
export function lookup(table: MapTable, pedalPct: number, speedKmh: number): number {
  if (!Number.isFinite(pedalPct) || !Number.isFinite(speedKmh))
    throw new MapInputError('not-finite', `lookup needs finite coordinates, got pedal ${pedalPct} %, speed ${speedKmh} km/h`)
  if (table.rowAxis.length === 0 || table.colAxis.length === 0)
    throw new MapInputError('empty-axis', 'lookup needs at least one breakpoint on each axis')
  return interpolate(table, pedalPct, speedKmh)
}
