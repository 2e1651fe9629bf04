/**
 * Breakpoint editing: add, remove or move a pedal (row) or speed (col) breakpoint.
 * All return a new table; the input is never modified.
 */
import { MapEditError } from './errors'
import { lookup } from './lookup'
import { formatExact } from './number-format'
import { cloneTable, MAX_BREAKPOINTS, MIN_BREAKPOINTS, type MapTable } from './table'

export type AxisName = 'row' | 'col'

const label = (axis: AxisName) => (axis === 'row' ? 'pedal' : 'speed')

function checkAxisName(axis: AxisName): void {
  if (axis !== 'row' && axis !== 'col') throw new MapEditError('bad-axis', `axis must be 'row' or 'col', got ${String(axis)}`)
}

function checkIndex(table: MapTable, axis: AxisName, index: number): void {
  const n = axis === 'row' ? table.rowAxis.length : table.colAxis.length
  if (!Number.isInteger(index) || index < 0 || index >= n)
    throw new MapEditError('bad-index', `${label(axis)} breakpoint index ${index} is outside 0–${n - 1}`)
}

/**
 * A new breakpoint at `value` (%, or km/h), its row or column filled by lookup on the old table,
 * so the surface is unchanged at every point (inside the old range; outside it the edge values
 * are held, as lookup does). Throws MapEditError if the value exists or the axis is full.
 * @example insertBreakpoint(t, 'col', 15).colAxis // [0, 10, 15, 20] for [0, 10, 20]
 */
export function insertBreakpoint(table: MapTable, axis: AxisName, value: number): MapTable {
  checkAxisName(axis)
  if (!Number.isFinite(value)) throw new MapEditError('not-finite', `a breakpoint must be a finite number, got ${value}`)
  const list = axis === 'row' ? table.rowAxis : table.colAxis
  if (list.includes(value)) throw new MapEditError('duplicate-breakpoint', `there is already a ${label(axis)} breakpoint at ${formatExact(value)}`)
  if (list.length >= MAX_BREAKPOINTS) throw new MapEditError('too-many-breakpoints', `a map has at most ${MAX_BREAKPOINTS} ${label(axis)} breakpoints`)
  const at = list.findIndex((b) => b > value)
  const i = at === -1 ? list.length : at
  const out = cloneTable(table)
  if (axis === 'row') {
    out.rowAxis.splice(i, 0, value)
    out.values.splice(i, 0, table.colAxis.map((s) => lookup(table, value, s)))
  } else {
    out.colAxis.splice(i, 0, value)
    out.values.forEach((row, r) => row.splice(i, 0, lookup(table, table.rowAxis[r], value)))
  }
  return out
}

/**
 * The table without breakpoint `index` and its row or column. Refuses to go below 2 breakpoints.
 * @example removeBreakpoint(t, 'row', 1).rowAxis // [0, 100] for [0, 50, 100]
 */
export function removeBreakpoint(table: MapTable, axis: AxisName, index: number): MapTable {
  checkAxisName(axis)
  checkIndex(table, axis, index)
  const n = axis === 'row' ? table.rowAxis.length : table.colAxis.length
  if (n <= MIN_BREAKPOINTS) throw new MapEditError('too-few-breakpoints', `a map needs at least ${MIN_BREAKPOINTS} ${label(axis)} breakpoints`)
  const out = cloneTable(table)
  if (axis === 'row') {
    out.rowAxis.splice(index, 1)
    out.values.splice(index, 1)
  } else {
    out.colAxis.splice(index, 1)
    out.values.forEach((row) => row.splice(index, 1))
  }
  return out
}

/**
 * Move breakpoint `index` to `value`, keeping its cell values (the calibrator is saying "this
 * row belongs at 35 %", not resampling). The value must stay strictly between its neighbours,
 * otherwise MapEditError 'breakpoint-order' is thrown.
 * @example setBreakpoint(t, 'col', 1, 12).colAxis // [0, 12, 20] for [0, 10, 20]
 */
export function setBreakpoint(table: MapTable, axis: AxisName, index: number, value: number): MapTable {
  checkAxisName(axis)
  checkIndex(table, axis, index)
  if (!Number.isFinite(value)) throw new MapEditError('not-finite', `a breakpoint must be a finite number, got ${value}`)
  const list = axis === 'row' ? table.rowAxis : table.colAxis
  const prev = index > 0 ? list[index - 1] : -Infinity
  const next = index < list.length - 1 ? list[index + 1] : Infinity
  if (!(value > prev && value < next)) {
    const unit = (v: number) => `${formatExact(v)} ${axis === 'row' ? '%' : 'km/h'}`
    throw new MapEditError('breakpoint-order', breakpointOrderMessage(label(axis), index, prev, next, value, unit))
  }
  const out = cloneTable(table)
  ;(axis === 'row' ? out.rowAxis : out.colAxis)[index] = value
  return out
}

/**
 * Why a moved breakpoint breaks the order, with its position (#, counted from 1) kept apart from
 * its values (with units), e.g. "speed breakpoint #3 must lie between 3 km/h and 10 km/h; 12 km/h
 * would break the order". `prev`/`next` are ±Infinity at the ends of the axis.
 */
export function breakpointOrderMessage(axisWord: string, index: number, prev: number, next: number, value: number, fmt: (v: number) => string): string {
  const range = Number.isFinite(prev) && Number.isFinite(next) ? `between ${fmt(prev)} and ${fmt(next)}` : Number.isFinite(prev) ? `above ${fmt(prev)}` : `below ${fmt(next)}`
  return `${axisWord} breakpoint #${index + 1} must lie ${range}; ${fmt(value)} would break the order`
}
