/**
 * The grid's layout, like the CSV file: row 0 holds the corner and the speed breakpoints,
 * column 0 holds the pedal breakpoints, the rest are torque values. Keeping the axes inside
 * the data lets a calibrator edit a breakpoint like any cell and paste a block that carries them.
 */
import { breakpointOrderMessage, humanNumber, mapSelection, parseExact, setBreakpoint, type AxisName, type MapTable, type UnitSet } from '@/maps'

export type GridCell = number | string
/** One edit as the grid reports it: grid row, grid column, the new raw value. */
export interface GridEdit {
  row: number
  col: number
  value: unknown
}

export function cornerText(table: MapTable, u: UnitSet): string {
  return `${table.kind === 'regen' ? 'brake' : 'pedal'} %\\${u.speed} · ${u.torque}`
}

/**
 * Shown numbers are rounded to 0.1 (the C header's resolution), so the cell editor and a copied
 * block read cleanly in either unit system. An edit that gives back the shown number leaves the
 * stored value exactly as it was, so copying a block and pasting it again changes nothing.
 */
export const shown = (x: number) => Math.round(x * 10) / 10

/** Table (SI) → grid rows in display units. */
export function toGridData(table: MapTable, u: UnitSet): GridCell[][] {
  return [
    [cornerText(table, u), ...table.colAxis.map((v) => shown(u.speedOut(v)))],
    ...table.rowAxis.map((p, r) => [shown(p), ...table.values[r].map((v) => shown(u.torqueOut(v)))]),
  ]
}

/** The one grid cell (`row`, `col`, axes included) of toGridData, without building the rest. */
export function gridCellOf(table: MapTable, u: UnitSet, row: number, col: number): GridCell {
  if (row === 0) return col === 0 ? cornerText(table, u) : shown(u.speedOut(table.colAxis[col - 1]))
  return col === 0 ? shown(table.rowAxis[row - 1]) : shown(u.torqueOut(table.values[row - 1][col - 1]))
}

// Spreadsheets often copy "1,200" with a thousands separator; accept exactly that shape.
const GROUPED = /^-?\d{1,3}(,\d{3})+(\.\d+)?$/

/** A typed or pasted cell as a number, or an Error naming the text. */
export function readCell(value: unknown): number | Error {
  if (typeof value === 'number') return Number.isFinite(value) ? value : new Error(`${value} is not a finite number`)
  const text = String(value ?? '').trim()
  const n = parseExact(GROUPED.test(text) ? text.replace(/,/g, '') : text)
  return n === undefined ? new Error(text === '' ? 'a cell cannot be empty' : `'${text}' is not a number`) : n
}

/**
 * Move several breakpoints of one axis. A pasted axis may need the moves in a particular order
 * (each move must stay between its current neighbours), so moves are retried until none is left
 * or none can go; then the last refusal is the message.
 */
function moveBreakpoints(table: MapTable, axis: AxisName, moves: Map<number, number>, u: UnitSet): MapTable {
  // Refusals in the units the engineer typed in (the map module speaks km/h).
  const fmt = axis === 'row' ? (v: number) => `${humanNumber(v)} %` : (v: number) => `${humanNumber(u.speedOut(v))} ${u.speed}`
  const orderCheck = (t: MapTable, i: number, v: number) => {
    const list = axis === 'row' ? t.rowAxis : t.colAxis
    const prev = i > 0 ? list[i - 1] : -Infinity
    const next = i < list.length - 1 ? list[i + 1] : Infinity
    if (!(v > prev && v < next)) throw new Error(breakpointOrderMessage(axis === 'row' ? 'pedal' : 'speed', i, prev, next, v, fmt))
  }
  let t = table
  const pending = new Map(moves)
  while (pending.size > 0) {
    const before = pending.size
    let refusal: unknown = null
    for (const [i, v] of [...pending]) {
      try {
        orderCheck(t, i, v)
        t = setBreakpoint(t, axis, i, v)
        pending.delete(i)
      } catch (e) {
        refusal = e
      }
    }
    if (pending.size === before) throw refusal
  }
  return t
}

/** Apply grid edits to the table; throws with a readable message when any edit is refused. */
export function applyGridEdits(table: MapTable, edits: GridEdit[], u: UnitSet): MapTable {
  const cells = new Map<string, number>()
  const rowMoves = new Map<number, number>()
  const colMoves = new Map<number, number>()
  for (const e of edits) {
    const r = e.row - 1
    const c = e.col - 1
    if (r < 0 && c < 0) continue // the corner is a label
    const n = readCell(e.value)
    if (n instanceof Error) throw new Error(`${r < 0 ? 'speed breakpoint' : c < 0 ? 'pedal breakpoint' : 'torque'}: ${n.message}`)
    if (r < 0) {
      if (n !== shown(u.speedOut(table.colAxis[c]))) colMoves.set(c, u.speedIn(n))
    } else if (c < 0) {
      if (n !== shown(table.rowAxis[r])) rowMoves.set(r, n)
    } else if (n !== shown(u.torqueOut(table.values[r][c]))) cells.set(`${r},${c}`, u.torqueIn(n))
  }
  let t = table
  if (cells.size > 0) {
    const keys = [...cells.keys()].map((k) => k.split(',').map(Number))
    const box = { r0: Math.min(...keys.map((k) => k[0])), r1: Math.max(...keys.map((k) => k[0])), c0: Math.min(...keys.map((k) => k[1])), c1: Math.max(...keys.map((k) => k[1])) }
    t = mapSelection(t, box, (v, r, c) => cells.get(`${r},${c}`) ?? v)
  }
  if (rowMoves.size > 0) t = moveBreakpoints(t, 'row', rowMoves, u)
  if (colMoves.size > 0) t = moveBreakpoints(t, 'col', colMoves, u)
  return t
}
