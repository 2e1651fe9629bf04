/**
 * Cell editing operations. Each returns a new table and leaves its input untouched, so the
 * editor can keep an undo history of plain references.
 */
import { MapEditError } from './errors'
import { normaliseSelection, type Selection } from './selection'
import { cloneTable, type MapTable } from './table'

function requireFinite(what: string, v: number): void {
  if (!Number.isFinite(v)) throw new MapEditError('not-finite', `${what} must be a finite number, got ${v}`)
}

/** Copy of `table` with `f(value, r, c)` applied to every selected cell; refuses non-finite results. */
export function mapSelection(table: MapTable, sel: Selection, f: (v: number, r: number, c: number) => number): MapTable {
  const s = normaliseSelection(table, sel)
  const out = cloneTable(table)
  for (let r = s.r0; r <= s.r1; r++)
    for (let c = s.c0; c <= s.c1; c++) {
      const v = f(table.values[r][c], r, c)
      if (!Number.isFinite(v)) throw new MapEditError('not-finite', `the operation gives ${v} in row ${r + 1}, column ${c + 1}`)
      out.values[r][c] = v
    }
  return out
}

/**
 * Every selected cell set to `v`, N·m.
 * @example setValue(t, { r0: 0, c0: 0, r1: 0, c1: 0 }, 120).values[0][0] // 120
 */
export function setValue(table: MapTable, sel: Selection, v: number): MapTable {
  requireFinite('the value', v)
  return mapSelection(table, sel, () => v)
}

/**
 * Selected cells scaled by a percentage: +10 → ×1.1, −25 → ×0.75.
 * @example scaleBy(t, sel, 10) // 1000 N·m becomes 1100 N·m
 */
export function scaleBy(table: MapTable, sel: Selection, pct: number): MapTable {
  requireFinite('the percentage', pct)
  const k = 1 + pct / 100
  return mapSelection(table, sel, (v) => v * k)
}

/**
 * Selected cells shifted by `nm`, N·m.
 * @example addOffset(t, sel, -50) // 1000 N·m becomes 950 N·m
 */
export function addOffset(table: MapTable, sel: Selection, nm: number): MapTable {
  requireFinite('the offset', nm)
  return mapSelection(table, sel, (v) => v + nm)
}

/**
 * Straight line between the selection's edge values, placed by breakpoint position (not index),
 * so an unevenly spaced axis still gets a true linear ramp in km/h or %.
 * 'rows': along each selected row, from its value at column c0 to its value at column c1.
 * 'cols': along each selected column, from its value at row r0 to its value at row r1.
 * @example // speeds 0, 10, 40 with 0 and 400 at the ends: the middle becomes 100, not 200
 *          fillLinear(t, { r0: 0, c0: 0, r1: 0, c1: 2 }, 'rows')
 */
export function fillLinear(table: MapTable, sel: Selection, direction: 'rows' | 'cols'): MapTable {
  if (direction !== 'rows' && direction !== 'cols') throw new MapEditError('bad-direction', `fill direction must be 'rows' or 'cols', got ${String(direction)}`)
  const s = normaliseSelection(table, sel)
  const { rowAxis, colAxis, values } = table
  return mapSelection(table, s, (v, r, c) => {
    if (direction === 'rows') {
      if (s.c0 === s.c1) return v
      const t = (colAxis[c] - colAxis[s.c0]) / (colAxis[s.c1] - colAxis[s.c0])
      return values[r][s.c0] + (values[r][s.c1] - values[r][s.c0]) * t
    }
    if (s.r0 === s.r1) return v
    const u = (rowAxis[r] - rowAxis[s.r0]) / (rowAxis[s.r1] - rowAxis[s.r0])
    return values[s.r0][c] + (values[s.r1][c] - values[s.r0][c]) * u
  })
}

/**
 * 3 × 3 mean of each selected cell and its neighbours. Neighbours are read from the original
 * table (also outside the selection, so the smoothed block blends into its surroundings);
 * at the table edge only the neighbours that exist are averaged. Cells outside the selection
 * are unchanged.
 * @example smooth(t, wholeTable(t)) // a lone 900 among zeros in a 3 × 3 table becomes 100
 */
export function smooth(table: MapTable, sel: Selection): MapTable {
  const { values } = table
  const rows = table.rowAxis.length
  const cols = table.colAxis.length
  const s = normaliseSelection(table, sel)
  return mapSelection(table, s, (_v, r, c) => {
    let sum = 0
    let n = 0
    for (let i = Math.max(0, r - 1); i <= Math.min(rows - 1, r + 1); i++)
      for (let j = Math.max(0, c - 1); j <= Math.min(cols - 1, c + 1); j++) {
        sum += values[i][j]
        n++
      }
    return sum / n
  })
}
