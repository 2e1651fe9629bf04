/**
 * The grid's selection (grid coordinates, axes included) in the terms the map operations use.
 */
import type { MapTable, Selection } from '@/maps'

/** A selected block in grid coordinates: row 0 is the speed axis, column 0 the pedal axis. */
export interface GridRange {
  r0: number
  c0: number
  r1: number
  c1: number
}

/** One axis of a selection in table indices: a block only on the breakpoint band means "all of them". */
function span(a: number, b: number, n: number): [number, number] {
  const lo = Math.min(a, b)
  const hi = Math.max(a, b)
  if (hi < 1) return [0, n - 1]
  return [Math.max(1, lo) - 1, Math.min(n, hi) - 1]
}

/**
 * The selected value cells as a table Selection. Selecting pedal breakpoints means their whole
 * rows, selecting speed breakpoints their whole columns, the corner the whole table, as a
 * calibrator expects from clicking a header.
 */
export function valueSelection(table: MapTable, g: GridRange | null): Selection | null {
  if (!g) return null
  const [r0, r1] = span(g.r0, g.r1, table.rowAxis.length)
  const [c0, c1] = span(g.c0, g.c1, table.colAxis.length)
  return r0 <= r1 && c0 <= c1 ? { r0, c0, r1, c1 } : null
}

/** The one table row (pedal breakpoint) the selection lies in, or null when it spans several or only the speed axis. */
export function selectedRow(table: MapTable, g: GridRange | null): number | null {
  if (!g || g.r0 !== g.r1 || g.r0 < 1 || g.r0 > table.rowAxis.length) return null
  return g.r0 - 1
}

/** The one table column (speed breakpoint) the selection lies in, or null. */
export function selectedCol(table: MapTable, g: GridRange | null): number | null {
  if (!g || g.c0 !== g.c1 || g.c0 < 1 || g.c0 > table.colAxis.length) return null
  return g.c0 - 1
}

/**
 * Only the value cells inside a grid block (axis cells left out), for the spreadsheet keys: a
 * Delete on a row that includes its breakpoint clears the torque values, never the breakpoint.
 */
export function valueCellsIn(table: MapTable, g: GridRange): Selection | null {
  const r0 = Math.max(1, Math.min(g.r0, g.r1)) - 1
  const r1 = Math.min(table.rowAxis.length, Math.max(g.r0, g.r1)) - 1
  const c0 = Math.max(1, Math.min(g.c0, g.c1)) - 1
  const c1 = Math.min(table.colAxis.length, Math.max(g.c0, g.c1)) - 1
  return r0 <= r1 && c0 <= c1 ? { r0, c0, r1, c1 } : null
}
