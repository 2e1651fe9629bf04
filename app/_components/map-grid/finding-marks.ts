/**
 * Which grid cell each finding belongs to: a value finding marks its value cell, a breakpoint
 * finding marks the breakpoint in the axis row or column, a whole-table finding marks the corner.
 */
import type { Finding } from '@/maps'

export interface CellMark {
  severity: 'error' | 'warning'
  messages: string[]
}

/** Grid coordinates (axes inside the grid: values start at row 1, column 1) of a finding. */
export function findingCell(f: Finding): { row: number; col: number } {
  return { row: f.row === undefined ? 0 : f.row + 1, col: f.col === undefined ? 0 : f.col + 1 }
}

export const markKey = (row: number, col: number) => `${row}:${col}`

/** Findings grouped by grid cell; an error outranks a warning in the same cell. */
export function markCells(findings: Finding[], show: (f: Finding) => string): Map<string, CellMark> {
  const marks = new Map<string, CellMark>()
  for (const f of findings) {
    const { row, col } = findingCell(f)
    const key = markKey(row, col)
    const mark = marks.get(key) ?? { severity: f.severity, messages: [] }
    if (f.severity === 'error') mark.severity = 'error'
    mark.messages.push(show(f))
    marks.set(key, mark)
  }
  return marks
}
