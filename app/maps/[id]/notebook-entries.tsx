import { formatTime } from '@/app/_components/format'
import { MarkdownNotes } from '@/app/_components/markdown-notes'
import type { RevisionSummary } from '@/db/queries/revisions'

/** The map's story, newest first: each revision's message and notes (later: drive reports and reviews). */
export function NotebookEntries({ revisions }: { revisions: RevisionSummary[] }) {
  return (
    <ol className="space-y-3">
      {revisions.map((r) => (
        <li key={r.id} className="card">
          <p className="text-xs text-slate-500">
            r{r.number} · {r.authorName} · {formatTime(r.createdAt)}
          </p>
          <p className="font-medium">{r.message}</p>
          <MarkdownNotes text={r.notes} />
        </li>
      ))}
    </ol>
  )
}
