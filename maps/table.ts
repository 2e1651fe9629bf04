/**
 * The table model shared by the editor, the validator, the formats and the API.
 *
 * A map is a 2-D grid of torque requests: rows are pedal position (%), columns road speed
 * (km/h). A drive map holds motoring torque; a regen map holds braking torque (≥ 0) by brake
 * pedal position, where the 0 % row is the lift-off regen applied with both pedals released.
 */

export type MapKind = 'drive' | 'regen'

export interface MapTable {
  kind: MapKind
  /** Pedal position breakpoints, %, strictly increasing (regen: brake pedal; 0 % = lift-off). */
  rowAxis: number[]
  /** Road speed breakpoints, km/h, strictly increasing. */
  colAxis: number[]
  /** values[row][col]: torque request at the motor shaft, N·m (regen: braking torque, ≥ 0). */
  values: number[][]
}

/** Axis sizes accepted everywhere (schema, CSV, breakpoint edits): small enough for firmware. */
export const MIN_BREAKPOINTS = 2
export const MAX_BREAKPOINTS = 64

/**
 * A deep copy, so operations can build their result without touching the input.
 * @example const copy = cloneTable(t); copy.values[0][0] = 5 // t unchanged
 */
export function cloneTable(t: MapTable): MapTable {
  return { kind: t.kind, rowAxis: [...t.rowAxis], colAxis: [...t.colAxis], values: t.values.map((r) => [...r]) }
}

/**
 * A table whose every cell is `value` (handy for tests and for starting a new map).
 * @example filledTable('drive', [0, 100], [0, 50], 0).values // [[0, 0], [0, 0]]
 */
export function filledTable(kind: MapKind, rowAxis: number[], colAxis: number[], value: number): MapTable {
  return { kind, rowAxis: [...rowAxis], colAxis: [...colAxis], values: rowAxis.map(() => colAxis.map(() => value)) }
}

/** True when both axes have the same breakpoints, bit for bit. */
export function sameAxes(a: MapTable, b: MapTable): boolean {
  const eq = (x: number[], y: number[]) => x.length === y.length && x.every((v, i) => v === y[i])
  return eq(a.rowAxis, b.rowAxis) && eq(a.colAxis, b.colAxis)
}
