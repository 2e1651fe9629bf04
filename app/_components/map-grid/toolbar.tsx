'use client'
/**
 * Operations on the selected cells, undo and redo. Every operation goes through runOp, and a
 * refusal (bad number, breakpoint out of order, too few breakpoints…) goes to the editor's one
 * message line, never swallowed.
 */
import { useState, type ReactNode } from 'react'
import { humanNumber, type UnitSet } from '@/maps'
import { readCell, shown } from './grid-data'
import { runOp, type OpInput, type OpName } from './ops'
import { selectedCol, selectedRow, valueSelection } from './selection'

export interface ToolbarProps extends Omit<OpInput, 'text'> {
  onApply: (table: OpInput['table']) => void
  undo: () => void
  redo: () => void
  canUndo: boolean
  canRedo: boolean
  /** The editor's one message line: an operation's refusal, or null after one that worked. */
  onMessage: (error: string | null) => void
}

function Group({ children, label }: { children: ReactNode; label: string }) {
  return (
    <div role="group" aria-label={label} className="flex flex-wrap items-center gap-1 rounded-md border border-line bg-slate-50 px-1.5 py-1">
      {children}
    </div>
  )
}

export function Toolbar(p: ToolbarProps) {
  const [text, setText] = useState<Record<string, string>>({ set: '', scale: '5', offset: '50', insert: '' })
  const [insertAxis, setInsertAxis] = useState<'insert-row' | 'insert-col'>('insert-col')
  const { table, range, units } = p
  // A unit switch converts what is typed but not applied yet, so "400" N·m does not become 400 lbf·ft.
  const [typedIn, setTypedIn] = useState(units)
  if (typedIn !== units) {
    setTypedIn(units)
    setText(convertTyped(text, insertAxis, typedIn, units))
  }
  const sel = valueSelection(table, range)
  const row = selectedRow(table, range)
  const col = selectedCol(table, range)

  const run = (op: OpName, key?: string) => {
    try {
      p.onApply(runOp(op, { ...p, text: key ? text[key] : undefined }))
      p.onMessage(null)
    } catch (e) {
      p.onMessage(e instanceof Error ? e.message : String(e))
    }
  }
  const input = (key: string, label: string, unit: string) => (
    <label className="flex items-center gap-1 text-xs text-slate-600">
      <input aria-label={label} className="field w-20 py-1" inputMode="decimal" value={text[key]} onChange={(e) => setText({ ...text, [key]: e.target.value })} />
      {unit}
    </label>
  )
  const btn = (label: string, onClick: () => void, disabled = false, title?: string) => (
    <button type="button" className="btn px-2 py-1 text-xs" onClick={onClick} disabled={disabled} title={title}>
      {label}
    </button>
  )

  return (
    <div className="space-y-1">
      <div role="toolbar" aria-label="Map operations" className="flex flex-wrap items-center gap-1.5">
        <Group label="Undo and redo">
          {btn('Undo', p.undo, !p.canUndo, 'Ctrl+Z')}
          {btn('Redo', p.redo, !p.canRedo, 'Ctrl+Y or Ctrl+Shift+Z')}
        </Group>
        <Group label="Set value">
          {input('set', 'Value to set', units.torque)}
          {btn('Set value', () => run('set', 'set'), !sel)}
        </Group>
        <Group label="Scale">
          {input('scale', 'Scale by percent', '%')}
          {btn('Scale selection', () => run('scale', 'scale'), !sel)}
        </Group>
        <Group label="Offset">
          {input('offset', 'Offset to add', units.torque)}
          {btn('Add offset', () => run('offset', 'offset'), !sel)}
        </Group>
        <Group label="Shape">
          {btn('Fill along speed', () => run('fill-rows'), !sel, 'Straight line between the first and last selected column, in each selected row')}
          {btn('Fill along pedal', () => run('fill-cols'), !sel, 'Straight line between the first and last selected row, in each selected column')}
          {btn('Smooth', () => run('smooth'), !sel, '3 × 3 mean of each selected cell')}
          {btn('Clamp to motor limit', () => run('clamp'), !p.limits, 'Pull the selected cells (or the whole map) inside the motor and battery limits')}
        </Group>
        <Group label="Breakpoints">
          <select aria-label="Breakpoint axis" className="field w-auto py-1 text-xs" value={insertAxis} onChange={(e) => setInsertAxis(e.target.value === 'insert-row' ? 'insert-row' : 'insert-col')}>
            <option value="insert-col">speed</option>
            <option value="insert-row">pedal</option>
          </select>
          {input('insert', 'New breakpoint', insertAxis === 'insert-row' ? '%' : units.speed)}
          {btn('Insert breakpoint', () => run(insertAxis, 'insert'))}
          {btn(row === null ? 'Remove pedal row' : `Remove ${humanNumber(table.rowAxis[row])} % row`, () => run('remove-row'), row === null)}
          {btn(col === null ? 'Remove speed column' : `Remove ${humanNumber(units.speedOut(table.colAxis[col]))} ${units.speed} column`, () => run('remove-col'), col === null)}
        </Group>
      </div>
    </div>
  )
}

/** The toolbar's typed numbers moved from one unit system to another (scale % needs nothing); text that is no number stays. */
export function convertTyped(text: Record<string, string>, insertAxis: 'insert-row' | 'insert-col', from: UnitSet, to: UnitSet): Record<string, string> {
  const move = (t: string | undefined, f: (n: number) => number) => {
    const n = readCell(t ?? '')
    return n instanceof Error || !t?.trim() ? (t ?? '') : String(shown(f(n)))
  }
  const torque = (n: number) => to.torqueOut(from.torqueIn(n))
  return {
    ...text,
    set: move(text.set, torque),
    offset: move(text.offset, torque),
    insert: insertAxis === 'insert-col' ? move(text.insert, (n) => to.speedOut(from.speedIn(n))) : (text.insert ?? ''),
  }
}
