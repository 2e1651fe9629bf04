import Link from 'next/link'
import { formatTime, shortChecksum } from '@/app/_components/format'
import type { RevisionSummary } from '@/db/queries/revisions'
import { STATE_LABELS } from '@/domain/revision-states'


/** The history of one map; a sent-back revision shows the lead's comment beside its state. */
export function HistoryTable(props: { mapId: number; revisions: RevisionSummary[]; total: number; canEdit: boolean; sentBack?: Map<number, { comment: string; by: string }> }) {
  return (
    <div className="card overflow-x-auto p-0">
      <table className="w-full text-sm">
        <thead className="bg-slate-50 text-left text-xs uppercase text-slate-600">
          <tr>
            <th className="px-3 py-2">Rev.</th>
            <th className="px-3 py-2">Author</th>
            <th className="px-3 py-2">Saved</th>
            <th className="px-3 py-2">Message</th>
            <th className="px-3 py-2">Checksum</th>
            <th className="px-3 py-2">State</th>
            <th className="px-3 py-2" />
          </tr>
        </thead>
        <tbody>
          {props.revisions.map((r) => (
            <tr key={r.id} data-testid={`history-row-${r.number}`} className="border-t border-line align-top">
              <td className="px-3 py-2 font-semibold">r{r.number}</td>
              <td className="px-3 py-2">{r.authorName}</td>
              <td className="px-3 py-2 whitespace-nowrap">{formatTime(r.createdAt)}</td>
              <td className="px-3 py-2">{r.message}</td>
              <td className="px-3 py-2 font-mono text-xs" title={r.checksum}>{shortChecksum(r.checksum)}</td>
              <td className="px-3 py-2" data-testid={`state-${r.number}`}>
                {STATE_LABELS[r.state]}
                {r.state === 'returned' && props.sentBack?.get(r.id) && (
                  <p className="mt-1 max-w-xs text-xs text-slate-700" data-testid={`sent-back-${r.number}`}>
                    {props.sentBack.get(r.id)?.by}: “{props.sentBack.get(r.id)?.comment}”
                  </p>
                )}
              </td>
              <td className="px-3 py-2 whitespace-nowrap">
                <Link href={`/maps/${props.mapId}/revisions/${r.number}`} className="text-accent hover:underline">Open</Link>
                {' · '}
                <Link href={`/review/${r.id}`} className="text-accent hover:underline">Review</Link>
                {r.number > 1 && (
                  <>
                    {' · '}
                    <Link href={`/maps/compare?a=${props.mapId}:${r.number - 1}&b=${props.mapId}:${r.number}`} className="text-accent hover:underline">Changes</Link>
                  </>
                )}
                {props.canEdit && (
                  <>
                    {' · '}
                    <Link href={`/maps/${props.mapId}/edit?from=${r.number}`} className="text-accent hover:underline">New draft from here</Link>
                  </>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      {props.total > props.revisions.length && (
        <p className="px-3 py-2 text-xs text-slate-500">
          Showing the newest {props.revisions.length} of {props.total} revisions.
        </p>
      )}
    </div>
  )
}
