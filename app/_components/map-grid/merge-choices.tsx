'use client'
/**
 * The cell-by-cell merge of a stale draft with the revision saved first: what came from each side
 * without a question, and a choice (mine or theirs) for each cell both sides changed differently.
 * When breakpoints moved the merge cannot go cell by cell; then the whole-table choices remain.
 */
import { useMemo, useState } from 'react'
import { cellLabel, humanNumber, mergeTables, renderParts, resolveMerge, type MapTable, type MergeSide, type UnitSet } from '@/maps'

export interface MergeChoicesProps {
  parent: MapTable
  mine: MapTable
  theirs: MapTable
  theirsNumber: number
  units: UnitSet
  /** The table to continue editing, on top of revision `theirsNumber`. */
  onDone: (table: MapTable) => void
}

export function MergeChoices({ parent, mine, theirs, theirsNumber: n, units: u, onDone }: MergeChoicesProps) {
  const merge = useMemo(() => mergeTables(parent, mine, theirs), [parent, mine, theirs])
  const [picks, setPicks] = useState<Record<string, MergeSide>>({})
  if (!merge.ok)
    return (
      <div className="space-y-2" data-testid="merge-refused">
        <p>A cell-by-cell merge is not possible: {merge.reason}. Choose a whole table:</p>
        <div className="flex flex-wrap gap-2">
          <button type="button" className="btn" onClick={() => onDone(mine)}>Keep my whole table (replaces what revision {n} changed)</button>
          <button type="button" className="btn" onClick={() => onDone(theirs)}>Take revision {n} (drop my edits)</button>
        </div>
      </div>
    )
  const { conflicts } = merge
  const key = (r: number, c: number) => `${r},${c}`
  const side = (r: number, c: number): MergeSide => picks[key(r, c)] ?? 'mine'
  const all = (s: MergeSide) => setPicks(Object.fromEntries(conflicts.map((c) => [key(c.row, c.col), s])))
  const torque = (nm: number) => `${humanNumber(u.torqueOut(nm))} ${u.torque}`
  return (
    <div className="space-y-2" data-testid="merge-choices">
      <p>
        Merged cell by cell against the revision you started from: {merge.takenFromMine} cell(s) from your edits, {merge.takenFromTheirs} from revision {n}
        {conflicts.length === 0 ? '; no cell was changed on both sides.' : `; ${conflicts.length} cell(s) changed on both sides need your choice.`}
      </p>
      {conflicts.length > 0 && (
        <>
          <div className="flex flex-wrap gap-2">
            <button type="button" className="btn px-2 py-0.5 text-xs" onClick={() => all('mine')}>All mine</button>
            <button type="button" className="btn px-2 py-0.5 text-xs" onClick={() => all('theirs')}>All theirs</button>
          </div>
          <div className="max-h-64 overflow-auto" tabIndex={0} role="region" aria-label="Cells changed on both sides">
            <table className="w-full text-xs">
              <thead>
                <tr className="text-left">
                  <th scope="col">Cell</th>
                  <th scope="col">Started from</th>
                  <th scope="col">Mine</th>
                  <th scope="col">Revision {n}</th>
                </tr>
              </thead>
              <tbody>
                {conflicts.map((c) => {
                  const where = renderParts(cellLabel(parent.kind, parent.rowAxis[c.row], parent.colAxis[c.col]), u)
                  const pick = (s: MergeSide) => setPicks({ ...picks, [key(c.row, c.col)]: s })
                  return (
                    <tr key={key(c.row, c.col)} data-testid={`merge-cell-${c.row}-${c.col}`}>
                      <th scope="row" className="pr-2 text-left font-normal">{where}</th>
                      <td className="pr-2">{torque(c.parent)}</td>
                      <td className="pr-2">
                        <label className="inline-flex items-center gap-1">
                          <input type="radio" name={`merge-${c.row}-${c.col}`} checked={side(c.row, c.col) === 'mine'} onChange={() => pick('mine')} />
                          {torque(c.mine)}
                          <span className="sr-only">, mine, at {where}</span>
                        </label>
                      </td>
                      <td>
                        <label className="inline-flex items-center gap-1">
                          <input type="radio" name={`merge-${c.row}-${c.col}`} checked={side(c.row, c.col) === 'theirs'} onChange={() => pick('theirs')} />
                          {torque(c.theirs)}
                          <span className="sr-only">, revision {n}, at {where}</span>
                        </label>
                      </td>
                    </tr>
                  )
                })}
              </tbody>
            </table>
          </div>
        </>
      )}
      <button type="button" className="btn-primary" onClick={() => onDone(resolveMerge(merge.table, conflicts, (c) => side(c.row, c.col)))}>
        Merge onto revision {n}
      </button>
    </div>
  )
}
