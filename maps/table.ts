/**
 * Table helpers shared by the editor, the validator, the formats and the API. The table type
 * itself is defined once in physics/table.ts (the lower layer) and re-exported here.
 */
import type { MapKind, MapTable } from '../physics/table'
import { MapInputError } from './errors'

export { MAP_KINDS, type MapKind, type MapTable } from '../physics/table'

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

/**
 * Throw MapInputError naming the first non-finite breakpoint or value; writers call this so a
 * NaN never reaches a file as "NaN" (CSV) or null (JSON).
 * @example assertFiniteTable({ ...t, values: [[NaN]] }, 'CSV') // throws "cannot write CSV: value in row 1, column 1 is NaN"
 */
export function assertFiniteTable(t: MapTable, format: string): void {
  const bad = (what: string, v: number) => {
    throw new MapInputError('not-finite', `cannot write ${format}: ${what} is ${v}`)
  }
  t.rowAxis.forEach((v, i) => Number.isFinite(v) || bad(`pedal breakpoint ${i + 1}`, v))
  t.colAxis.forEach((v, i) => Number.isFinite(v) || bad(`speed breakpoint ${i + 1}`, v))
  t.values.forEach((row, r) => row.forEach((v, c) => Number.isFinite(v) || bad(`value in row ${r + 1}, column ${c + 1}`, v)))
}
