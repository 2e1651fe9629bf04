/**
 * The toolbar's operations, each a call into maps/ with the typed input converted from display
 * units to SI. Errors are thrown with messages a calibrator can act on.
 */
import { addOffset, clampToEnvelope, clearCells, CLEARED_TORQUE_NM, fillDown, fillRight, fillLinear, insertBreakpoint, mapSelection, removeBreakpoint, scaleBy, setValue, smooth, wholeTable, type MapLimits, type MapTable, type UnitSet } from '@/maps'
import { readCell } from './grid-data'
import type { GridCommand } from './grid-keys'
import { selectedCol, selectedRow, valueCellsIn, valueSelection, type GridRange } from './selection'

export type OpName = 'set' | 'scale' | 'offset' | 'fill-rows' | 'fill-cols' | 'smooth' | 'clamp' | 'insert-row' | 'insert-col' | 'remove-row' | 'remove-col'

export interface OpInput {
  table: MapTable
  range: GridRange | null
  units: UnitSet
  limits: MapLimits | null
  /** The text typed next to the button, when the operation takes a number. */
  text?: string
}

function num(what: string, text: string | undefined): number {
  const n = readCell(text ?? '')
  if (n instanceof Error) throw new Error(`${what}: ${text?.trim() ? n.message : 'enter a number'}`)
  return n
}

export function runOp(op: OpName, { table, range, units, limits, text }: OpInput): MapTable {
  const sel = () => {
    const s = valueSelection(table, range)
    if (!s) throw new Error('Select one or more cells first')
    return s
  }
  switch (op) {
    case 'set':
      return setValue(table, sel(), units.torqueIn(num('Value', text)))
    case 'scale':
      return scaleBy(table, sel(), num('Scale', text))
    case 'offset':
      return addOffset(table, sel(), units.torqueIn(num('Offset', text)))
    case 'fill-rows':
      return fillLinear(table, sel(), 'rows')
    case 'fill-cols':
      return fillLinear(table, sel(), 'cols')
    case 'smooth':
      return smooth(table, sel())
    case 'clamp': {
      if (!limits) throw new Error('The vehicle program gives no usable motor limits, so there is nothing to clamp to')
      const clamped = clampToEnvelope(table, limits)
      // clampToEnvelope works on the whole table; keep its result only inside the selection.
      return mapSelection(table, valueSelection(table, range) ?? wholeTable(table), (_v, r, c) => clamped.values[r][c])
    }
    case 'insert-row':
      return insertBreakpoint(table, 'row', num('Pedal breakpoint', text))
    case 'insert-col':
      return insertBreakpoint(table, 'col', units.speedIn(num('Speed breakpoint', text)))
    case 'remove-row': {
      const r = selectedRow(table, range)
      if (r === null) throw new Error('Select a cell in the one pedal row to remove')
      return removeBreakpoint(table, 'row', r)
    }
    case 'remove-col': {
      const c = selectedCol(table, range)
      if (c === null) throw new Error('Select a cell in the one speed column to remove')
      return removeBreakpoint(table, 'col', c)
    }
  }
}

/**
 * The grid's spreadsheet keys on a selection (grid coordinates). Breakpoints are never cleared or
 * filled: every breakpoint of a map is needed, and removing one is the toolbar's job.
 */
export function runGridCommand(cmd: GridCommand, table: MapTable, range: GridRange): MapTable {
  const sel = valueCellsIn(table, range)
  if (!sel)
    throw new Error(cmd === 'clear' ? 'Breakpoints cannot be cleared — a map needs every one. Use Remove pedal row or Remove speed column to drop one.' : 'Select torque cells to fill; breakpoints are not filled.')
  if (cmd === 'clear') return clearCells(table, sel)
  if (cmd === 'fill-down') return fillDown(table, sel)
  return fillRight(table, sel)
}

/** What a cleared cell holds, in the display unit (for the editor's help text). */
export const clearedText = (u: UnitSet) => `${u.torqueOut(CLEARED_TORQUE_NM)} ${u.torque}`
