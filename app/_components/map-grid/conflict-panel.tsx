'use client'
/**
 * Someone saved a newer revision while this draft was open. The edits are kept; this shows what
 * the newer revision changed relative to the draft's base and offers to put the edits on top.
 */
import { useQuery } from '@tanstack/react-query'
import Link from 'next/link'
import { cellLabel, diff, type MapTable, humanNumber, renderParts, type UnitSet } from '@/maps'
import { api } from '@/app/_components/api-client'
import type { RevisionAnswer } from './api-types'

export interface ConflictPanelProps {
  mapId: number
  message: string
  latestNumber: number
  baseTable: MapTable
  units: UnitSet
  onRebase: (number: number, table: MapTable) => void
}

export function ConflictPanel({ mapId, message, latestNumber, baseTable, units: u, onRebase }: ConflictPanelProps) {
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
          <div className="flex flex-wrap gap-2 pt-1">
            <button type="button" className="btn-primary" onClick={() => onRebase(rev.number, rev.table)}>
              Rebase my edits on revision {rev.number}
            </button>
            <Link className="btn" href={`/maps/${mapId}/revisions/${rev.number}`} target="_blank">
              Open revision {rev.number}
            </Link>
          </div>
          <p className="text-xs text-slate-600">Rebasing keeps your table exactly as it is and saves it on top of revision {rev.number}, so your table replaces what revision {rev.number} changed. Open it first to carry over anything you want to keep.</p>
        </div>
      )}
    </section>
  )
}
