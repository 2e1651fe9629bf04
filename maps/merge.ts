/**
 * Three-way merge of map tables, cell by cell, for a save that lost a race: `parent` is the
 * revision both edits started from, `mine` the unsaved draft, `theirs` the revision a colleague
 * saved first. A cell only one side changed is taken from that side; a cell both sides changed
 * to different values is a conflict for the engineer to decide. Breakpoints must agree on all
 * three tables, since a moved breakpoint changes what every cell of its row or column means.
 */
import type { MapTable } from './table'

/** One cell both sides changed to different values, N·m; row and column are 0-based table indices. */
export interface MergeConflict {
  row: number
  col: number
  parent: number
  mine: number
  theirs: number
}

export type MergeResult =
  | {
      ok: true
      /** The merged table with every conflict set to my value (resolve() picks per cell). */
      table: MapTable
      conflicts: MergeConflict[]
      /** Cells taken from each side without a question (changed on that side only, or equally on both). */
      takenFromMine: number
      takenFromTheirs: number
    }
  | { ok: false; reason: string }

const sameList = (a: number[], b: number[]) => a.length === b.length && a.every((v, i) => v === b[i])

function axesNote(name: string, parent: MapTable, t: MapTable): string | null {
  const rows = !sameList(parent.rowAxis, t.rowAxis)
  const cols = !sameList(parent.colAxis, t.colAxis)
  if (!rows && !cols) return null
  return `${name} ${[rows && 'pedal', cols && 'speed'].filter(Boolean).join(' and ')} breakpoints`
}

/**
 * Merge `mine` and `theirs` against `parent`. When breakpoints differ between the three the
 * result is `ok: false` with a reason; the caller then offers whole-table choices instead.
 * @example mergeTables(p, mine, theirs) // { ok: true, table, conflicts: [], takenFromMine: 2, takenFromTheirs: 1 }
 */
export function mergeTables(parent: MapTable, mine: MapTable, theirs: MapTable): MergeResult {
  if (mine.kind !== parent.kind || theirs.kind !== parent.kind) return { ok: false, reason: 'the maps are of different kinds (drive and regen)' }
  const moved = [axesNote('your edits move the', parent, mine), axesNote('the newer revision moves the', parent, theirs)].filter(Boolean)
  if (moved.length > 0) return { ok: false, reason: `${moved.join('; ')}, so the cells no longer line up one to one` }
  const conflicts: MergeConflict[] = []
  let takenFromMine = 0
  let takenFromTheirs = 0
  const values = parent.values.map((row, r) =>
    row.map((p, c) => {
      const m = mine.values[r][c]
      const t = theirs.values[r][c]
      if (m === t) {
        if (m !== p) takenFromMine++ // both made the same change: count it once, as mine
        return m
      }
      if (m === p) {
        takenFromTheirs++
        return t
      }
      if (t === p) {
        takenFromMine++
        return m
      }
      conflicts.push({ row: r, col: c, parent: p, mine: m, theirs: t })
      return m
    }),
  )
  return { ok: true, table: { kind: parent.kind, rowAxis: [...parent.rowAxis], colAxis: [...parent.colAxis], values }, conflicts, takenFromMine, takenFromTheirs }
}

/** Which side wins a conflict cell. */
export type MergeSide = 'mine' | 'theirs'

/**
 * The merged table with each conflict decided: `choice(conflict)` names the side (all mine or
 * all theirs is a constant function). Returns a new table; the merge result is left as it was.
 * @example resolveMerge(result.table, result.conflicts, () => 'theirs')
 */
export function resolveMerge(table: MapTable, conflicts: MergeConflict[], choice: (c: MergeConflict) => MergeSide): MapTable {
  const values = table.values.map((row) => [...row])
  for (const c of conflicts) values[c.row][c.col] = choice(c) === 'theirs' ? c.theirs : c.mine
  return { kind: table.kind, rowAxis: [...table.rowAxis], colAxis: [...table.colAxis], values }
}
