'use client'
/**
 * Someone saved a newer revision while this draft was open. The edits are kept; this shows what
 * the newer revision changed relative to the draft's base and merges the two cell by cell.
 */
import { useQuery } from '@tanstack/react-query'
import Link from 'next/link'
import { cellLabel, diff, type MapTable, humanNumber, renderParts, type UnitSet } from '@/maps'
import { api } from '@/app/_components/api-client'
import type { RevisionAnswer } from './api-types'
import { MergeChoices } from './merge-choices'

export interface ConflictPanelProps {
  mapId: number
  message: string
  latestNumber: number
  baseTable: MapTable
  /** The unsaved draft. */
  table: MapTable
  units: UnitSet
  /** Continue with `merged` on top of revision `number` (whose table is `theirs`). */
  onMerged: (number: number, theirs: MapTable, merged: MapTable) => void
}

export function ConflictPanel({ mapId, message, latestNumber, baseTable, table, units: u, onMerged }: ConflictPanelProps) {
  const newer = useQuery({
    queryKey: ['map', mapId, 'revision', latestNumber],
    queryFn: () => api<RevisionAnswer>(`/api/maps/${mapId}/revisions/${latestNumber}`),
  })
  const rev = newer.data?.revision
  const d = rev ? diff(baseTable, rev.table) : null
  const big = d?.largestAbsolute
  return (
    <section role="alert" aria-label="Save conflict" className="space-y-2 rounded-md border border-warn bg-amber-50 p-3 text-sm">
      <p className="font-semibold text-warn">{message}</p>
      {newer.isPending && <p>Loading revision {latestNumber}…</p>}
      {newer.isError && <p className="error-text">Could not load revision {latestNumber}: {newer.error.message}</p>}
      {rev && d && (
        <div className="space-y-1">
          <p>
            Revision {rev.number} by {rev.authorName}: “{rev.message}”. Against the revision you started from it changes{' '}
            <strong>
              {d.changed.length} of {d.cellCount} cells
            </strong>
            {d.axesDiffer && ' and moves breakpoints (compared by interpolation)'}.
          </p>
          {big && (
            <p>
              Largest change {renderParts(cellLabel(baseTable.kind, big.pedalPct, big.speedKmh), u)}: {humanNumber(u.torqueOut(big.before))} → {humanNumber(u.torqueOut(big.after))} {u.torque} ({big.delta > 0 ? '+' : ''}
              {humanNumber(u.torqueOut(big.delta))} {u.torque}).
            </p>
          )}
          <MergeChoices parent={baseTable} mine={table} theirs={rev.table} theirsNumber={rev.number} units={u} onDone={(merged) => onMerged(rev.number, rev.table, merged)} />
          <Link className="btn inline-block" href={`/maps/${mapId}/revisions/${rev.number}`} target="_blank">
            Open revision {rev.number}
          </Link>
        </div>
      )}
    </section>
  )
}
