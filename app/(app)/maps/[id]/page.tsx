import Link from 'next/link'
import { notFound } from 'next/navigation'
import { pageId } from '@/app/_lib/http/page-params'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { EDITORS } from '@/app/_lib/auth/roles'
import { getMap } from '@/db/queries/maps'
import { countRevisions, listRevisions } from '@/db/queries/revisions'
import { listReviewComments, listRevisionEvents } from '@/db/queries/review'
import { listReports } from '@/db/queries/reports'
import { formatTime } from '@/app/_components/format'
import { releasedRevisionOfMap } from './released-set'
import { HistoryTable } from './history-table'
import { NotebookEntries } from './notebook-entries'
import { SubmitAfterSave } from './submit-after-save'

export const metadata = { title: 'Map notebook' }

export default async function MapNotebookPage(props: {
  params: Promise<{ id: string }>
  searchParams: Promise<Record<string, string | string[] | undefined>>
}) {
  const user = await requirePageUser()
  const map = await getMap(pageId((await props.params).id, 'Map id'))
  if (!map) notFound()
  const { saved } = await props.searchParams
  const [revisions, total, events, comments, reports, released] = await Promise.all([
    listRevisions(map.id, { limit: 50 }),
    countRevisions(map.id),
    listRevisionEvents({ mapId: map.id }),
    listReviewComments({ mapId: map.id }),
    listReports({ mapId: map.id }),
    releasedRevisionOfMap(map),
  ])
  const latest = revisions[0]
  const savedRev = typeof saved === 'string' ? revisions.find((r) => String(r.number) === saved) : undefined
  // The newest send-back comment of each revision (events come newest first), shown beside it.
  const sentBack = new Map<number, { comment: string; by: string }>()
  for (const e of events) if (e.action === 'send_back' && !sentBack.has(e.revisionId)) sentBack.set(e.revisionId, { comment: e.comment ?? '', by: e.actorName })
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-start gap-3">
        <div>
          <p className="text-sm text-slate-500">
            <Link href="/maps" className="hover:underline">Maps</Link> · {map.programName}
          </p>
          <h1 className="text-2xl font-bold">{map.name}</h1>
          <p className="text-sm text-slate-600">
            {map.kind === 'drive' ? 'Drive map: accelerator pedal × road speed → torque request' : 'Regen map: brake pedal × road speed → regen torque (0 % row is lift-off)'}
            {map.description ? ` — ${map.description}` : ''}
          </p>
          <p className="text-sm" data-testid="released-set">
            {released ? (
              <>
                In the trucks now: <Link href={`/maps/${map.id}/revisions/${released.revision.number}`} className="text-accent hover:underline">r{released.revision.number}</Link>, in the released{' '}
                <Link href={`/sets/${released.setId}`} className="text-accent hover:underline">set {released.setNumber}</Link> ({formatTime(released.releasedAt)}, {released.releasedByName})
              </>
            ) : (
              <span className="text-slate-600">No released map set of {map.programName} holds a revision of this map.</span>
            )}
          </p>
        </div>
        <div className="ml-auto flex gap-2">
          {latest && latest.number > 1 && (
            <Link href={`/maps/compare?a=${map.id}:${latest.number - 1}&b=${map.id}:${latest.number}`} className="btn">
              Compare r{latest.number - 1} with r{latest.number}
            </Link>
          )}
          {latest && (
            <Link href={`/maps/${map.id}/revisions/${latest.number}`} className="btn">
              Open latest (r{latest.number})
            </Link>
          )}
          {user.role === 'test_driver' && (
            <Link href={`/reports/new?map=${map.id}`} className="btn">
              File a drive report
            </Link>
          )}
          {EDITORS.includes(user.role) && (
            <Link href={`/maps/${map.id}/edit`} className="btn-primary">
              Edit
            </Link>
          )}
        </div>
      </div>
      {typeof saved === 'string' && /^\d+$/.test(saved) && (
        <SubmitAfterSave number={Number(saved)} revisionId={savedRev?.id ?? null} canSubmit={EDITORS.includes(user.role) && savedRev?.state === 'draft' && savedRev.authorId === user.id} />
      )}
      <section>
        <h2 className="mb-2 text-lg font-semibold">History</h2>
        <HistoryTable mapId={map.id} revisions={revisions} total={total} canEdit={EDITORS.includes(user.role)} sentBack={sentBack} />
      </section>
      <section>
        <h2 className="mb-2 text-lg font-semibold">Notebook</h2>
        <NotebookEntries revisions={revisions} events={events} comments={comments} reports={reports} />
      </section>
    </div>
  )
}
