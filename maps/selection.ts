/**
 * A rectangular block of cells, corners inclusive, as the editor's drag selection gives it.
 */
import { MapEditError } from './errors'
import type { MapTable } from './table'

export interface Selection {
  r0: number
  c0: number
  r1: number
  c1: number
}

/**
 * Corners ordered (r0 ≤ r1, c0 ≤ c1) and checked against the table: a selection dragged
 * bottom-right to top-left means the same block. Throws MapEditError when it leaves the table.
 * @example normaliseSelection(t, { r0: 3, c0: 2, r1: 1, c1: 0 }) // { r0: 1, c0: 0, r1: 3, c1: 2 }
 */
export function normaliseSelection(table: MapTable, sel: Selection): Selection {
  for (const k of ['r0', 'c0', 'r1', 'c1'] as const)
    if (!Number.isInteger(sel[k])) throw new MapEditError('bad-selection', `selection corner ${k} must be a whole index, got ${sel[k]}`)
  const s = { r0: Math.min(sel.r0, sel.r1), r1: Math.max(sel.r0, sel.r1), c0: Math.min(sel.c0, sel.c1), c1: Math.max(sel.c0, sel.c1) }
  const rows = table.rowAxis.length
  const cols = table.colAxis.length
  if (s.r0 < 0 || s.r1 >= rows || s.c0 < 0 || s.c1 >= cols)
    throw new MapEditError('bad-selection', `selection rows ${s.r0 + 1}–${s.r1 + 1}, columns ${s.c0 + 1}–${s.c1 + 1} is outside the ${rows} × ${cols} table`)
  return s
}

/**
 * The whole table as a selection.
 * @example wholeTable(t) // { r0: 0, c0: 0, r1: rows - 1, c1: cols - 1 }
 */
export function wholeTable(table: MapTable): Selection {
  return { r0: 0, c0: 0, r1: table.rowAxis.length - 1, c1: table.colAxis.length - 1 }
}

/** True when cell (r, c) lies in a normalised selection. */
export function inSelection(s: Selection, r: number, c: number): boolean {
  return r >= s.r0 && r <= s.r1 && c >= s.c0 && c <= s.c1
}
