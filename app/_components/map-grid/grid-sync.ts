/**
 * What the grid must be told when the table changes outside it (undo, a toolbar operation, the
 * unit switch): only the cells whose shown value differs, or a full reload when the shape changed.
 * The grid keeps its own cells, so an edit typed into it costs no reload at all.
 */
import type { CellMark } from './finding-marks'
import type { GridCell } from './grid-data'

export type GridSync = { reload: true } | { reload: false; cells: [number, number, GridCell][] }

/** Cell updates that turn `shown` (what the grid holds) into `next`, or a reload when the sizes differ. */
export function gridSync(shown: GridCell[][], next: GridCell[][]): GridSync {
  if (shown.length !== next.length || (shown[0]?.length ?? 0) !== (next[0]?.length ?? 0)) return { reload: true }
  const cells: [number, number, GridCell][] = []
  for (let r = 0; r < next.length; r++) for (let c = 0; c < next[r].length; c++) if (shown[r][c] !== next[r][c]) cells.push([r, c, next[r][c]])
  return { reload: false, cells }
}

const sameMark = (a: CellMark | undefined, b: CellMark | undefined) =>
  a === b || (a !== undefined && b !== undefined && a.severity === b.severity && a.messages.length === b.messages.length && a.messages.every((m, i) => m === b.messages[i]))

/** Keys (see markKey) of the cells whose finding mark appeared, went or changed. */
export function changedMarks(prev: Map<string, CellMark>, next: Map<string, CellMark>): string[] {
  const keys = new Set([...prev.keys(), ...next.keys()])
  return [...keys].filter((k) => !sameMark(prev.get(k), next.get(k)))
}
