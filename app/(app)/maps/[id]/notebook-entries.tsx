import Link from 'next/link'
import { formatTime } from '@/app/_components/format'
import { loadCaseLabel } from '@/physics/load-cases'
import { MarkdownNotes } from '@/app/_components/markdown-notes'
import { STATE_LABELS } from '@/domain/revision-states'
import type { RevisionSummary } from '@/db/queries/revisions'
import type { ReportRow } from '@/db/queries/reports'
import type { ReviewCommentRow, RevisionEventRow } from '@/db/queries/review'
import { SafetyBadge, surfaceLabel } from '@/app/(app)/reports/report-table'

/** The map's story, newest first: each revision with its notes, state changes, review comments and drive reports. */
export function NotebookEntries(props: { revisions: RevisionSummary[]; events: RevisionEventRow[]; comments: ReviewCommentRow[]; reports: ReportRow[] }) {
  return (
    <ol className="space-y-3">
      {props.revisions.map((r) => {
        const events = props.events.filter((e) => e.revisionId === r.id)
        const comments = props.comments.filter((c) => c.revisionId === r.id)
        // Reports on sets that hold this revision (as their drive or their regen map).
        const reports = props.reports.filter((x) => x.driveRevisionId === r.id || x.regenRevisionId === r.id)
        return (
          <li key={r.id} className="card space-y-2" data-testid={`notebook-${r.number}`}>
            <p className="text-xs text-slate-500">
              r{r.number} · {r.authorName} · {formatTime(r.createdAt)} · {STATE_LABELS[r.state]}
            </p>
            <p className="font-medium">{r.message}</p>
            <MarkdownNotes text={r.notes} />
            {events.length > 0 && (
              <ul className="text-sm text-slate-700">
                {events.map((e) => (
                  <li key={e.id}><span className="text-slate-500">State</span> {formatTime(e.at)} {e.actorName}: {STATE_LABELS[e.fromState]} → {STATE_LABELS[e.toState]}{e.comment ? ` — “${e.comment}”` : ''}</li>
                ))}
              </ul>
            )}
            {comments.length > 0 && (
              <ul className="text-sm text-slate-700">
                {comments.map((c) => (
                  <li key={c.id}><span className="text-slate-500">Comment</span> {c.authorName}: <MarkdownNotes text={c.body} /></li>
                ))}
              </ul>
            )}
            {reports.length > 0 && (
              <ul className="text-sm">
                {reports.map((x) => (
                  <li key={x.id}>
                    <span className="text-slate-500">Report</span> <Link href={`/reports/${x.id}`} className="text-accent hover:underline">Drive report {x.drivenOn}</Link> on <Link href={`/sets/${x.setId}`} className="hover:underline">set {x.setNumber}</Link> by {x.driverName}, {surfaceLabel(x.surface)}, {loadCaseLabel(x.loadCase).toLowerCase()} <SafetyBadge safety={x.safety} />
                  </li>
                ))}
              </ul>
            )}
          </li>
        )
      })}
    </ol>
  )
}
