/**
 * Spreadsheet-style fill and clear on a selection: fill down copies the selection's top row into
 * the rows below it, fill right copies its left column into the columns to its right, clear sets
 * the cells to the map's neutral value. Each returns a new table (the input is never touched).
 */
import { MapEditError } from './errors'
import { mapSelection } from './edit-ops'
import { normaliseSelection, type Selection } from './selection'
import type { MapTable } from './table'

/**
 * What a cleared cell holds, N·m: zero torque request. A map cell cannot be empty (the
 * controller interpolates every cell), and 0 N·m is the one value that asks the motor for
 * nothing on a drive map and brakes with nothing on a regen map.
 */
export const CLEARED_TORQUE_NM = 0

/**
 * Every selected cell set to CLEARED_TORQUE_NM.
 * @example clearCells(t, { r0: 0, c0: 0, r1: 0, c1: 1 }).values[0] // [0, 0, …]
 */
export function clearCells(table: MapTable, sel: Selection): MapTable {
  return mapSelection(table, sel, () => CLEARED_TORQUE_NM)
}

/**
 * Fill down: the top row of the selection copied into its other rows. With a single selected
 * row, the row above it is copied into it (as spreadsheets do); the first row has nothing above.
 * @example fillDown(t, { r0: 0, c0: 0, r1: 2, c1: 1 }) // rows 1 and 2 take row 0's values in columns 0–1
 */
export function fillDown(table: MapTable, sel: Selection): MapTable {
  const s = normaliseSelection(table, sel)
  const from = s.r0 === s.r1 ? s.r0 - 1 : s.r0
  if (from < 0) throw new MapEditError('nothing-to-fill', 'fill down needs a row above the selected one, or a selection of several rows')
  return mapSelection(table, { ...s, r0: from === s.r0 ? s.r0 + 1 : s.r0 }, (_v, _r, c) => table.values[from][c])
}

/**
 * Fill right: the left column of the selection copied into its other columns. With a single
 * selected column, the column to its left is copied into it; the first column has none.
 * @example fillRight(t, { r0: 0, c0: 0, r1: 1, c1: 2 }) // columns 1 and 2 take column 0's values in rows 0–1
 */
export function fillRight(table: MapTable, sel: Selection): MapTable {
  const s = normaliseSelection(table, sel)
  const from = s.c0 === s.c1 ? s.c0 - 1 : s.c0
  if (from < 0) throw new MapEditError('nothing-to-fill', 'fill right needs a column left of the selected one, or a selection of several columns')
  return mapSelection(table, { ...s, c0: from === s.c0 ? s.c0 + 1 : s.c0 }, (_v, r) => table.values[r][from])
}
