import Link from 'next/link'
import { notFound } from 'next/navigation'
import { pageId } from '@/app/_lib/http/page-params'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { formatTime, shortChecksum } from '@/app/_components/format'
import { MarkdownNotes } from '@/app/_components/markdown-notes'
import { SafetyCaution } from '@/app/_components/safety-caution'
import { gateFor, loadRevisionContext } from '@/app/_lib/review/service'
import { availableActions } from '@/app/_lib/review/states'
import { STATE_LABELS } from '@/domain/revision-states'
import { NotFoundError } from '@/app/_lib/http/errors'
import { currentRelease, listReviewComments, listRevisionEvents } from '@/db/queries/review'
import { listReports } from '@/db/queries/reports'
import { getRevision } from '@/db/queries/revisions'
import { diff, limitsFromVehicle, validate } from '@/maps'
import { ReportTable } from '@/app/(app)/reports/report-table'
import { GateChecklist } from './gate-checklist'
import { ReviewActions } from './review-actions'
import { ReviewComments } from './review-comments'
import { ChangesSummary } from './changes-summary'

export const metadata = { title: 'Review' }

export default async function ReviewPage(props: { params: Promise<{ revisionId: string }> }) {
  const user = await requirePageUser()
  const id = pageId((await props.params).revisionId, 'Revision id')
  const ctx = await loadRevisionContext(id).catch((e) => (e instanceof NotFoundError ? null : Promise.reject(e)))
  if (!ctx) notFound()
  const { revision: r, map } = ctx
  const [gate, reports, comments, events, released] = await Promise.all([
    gateFor(ctx),
    listReports({ revisionId: r.id }),
    listReviewComments({ revisionId: r.id }),
    listRevisionEvents({ revisionId: r.id }),
    currentRelease(map.id),
  ])
  const base = released && released.revisionId !== r.id ? await getRevision(map.id, released.number) : null
  const changes = base ? diff(base.table, r.table) : null
  const findings = validate(r.table, limitsFromVehicle(map.programParams))
  const state = r.state
  const actions = availableActions(state, user, r.authorId)
  return (
    <div className="space-y-5">
      <div>
        <p className="text-sm text-slate-500">
          <Link href="/review" className="hover:underline">Review queue</Link> · {map.programName} · <Link href={`/maps/${map.id}`} className="hover:underline">{map.name}</Link>
        </p>
        <h1 className="text-2xl font-bold">
          {map.name} r{r.number} <span data-testid="revision-state" className="ml-2 rounded bg-accent-soft px-2 py-0.5 align-middle text-sm font-semibold">{STATE_LABELS[state]}</span>
        </h1>
        <p className="text-sm text-slate-600">
          “{r.message}” — {r.authorName}, {formatTime(r.createdAt)} · checksum <span className="font-mono">{shortChecksum(r.checksum)}</span> ·{' '}
          <Link href={`/maps/${map.id}/revisions/${r.number}`} className="text-accent hover:underline">open the map</Link>
        </p>
        <MarkdownNotes text={r.notes} />
      </div>
      <ChangesSummary mapId={map.id} number={r.number} base={released && base ? { number: released.number } : null} changes={changes} />
      <GateChecklist gate={gate} findingsCount={findings.length} mapId={map.id} number={r.number} programId={map.programId} />
      {actions.length > 0 && <ReviewActions revisionId={r.id} actions={actions} exceptions={gate.exceptions.map((e) => ({ key: e.key, label: `${e.surface}, ${e.loadCase}: ${e.cells.length} cell(s)` }))} />}
      {['released', 'retired', 'withdrawn'].includes(state) && (
        <section className="card space-y-2">
          <a className="btn-primary" href={`/api/revisions/${r.id}/package`} data-testid="package-link">Download the release package</a>
          <SafetyCaution />
        </section>
      )}
      <section id="reports">
        <h2 className="mb-2 text-lg font-semibold">Drive reports on this revision</h2>
        <ReportTable reports={reports} />
      </section>
      <ReviewComments revisionId={r.id} initial={comments.map((c) => ({ ...c, createdAt: c.createdAt.toISOString() }))} canComment={user.role === 'lead_engineer' || user.role === 'calibration_engineer'} rowAxis={r.table.rowAxis} colAxis={r.table.colAxis} />
      <section className="card">
        <h2 className="mb-2 font-semibold">History of this revision</h2>
        <ul className="space-y-1 text-sm" data-testid="revision-events">
          {events.map((e) => (
            <li key={e.id}>
              {formatTime(e.at)} — {e.actorName}: {STATE_LABELS[e.fromState]} → {STATE_LABELS[e.toState]}
              {e.comment && <> — “{e.comment}”</>}
            </li>
          ))}
          {events.length === 0 && <li className="text-slate-500">No state change yet.</li>}
        </ul>
      </section>
    </div>
  )
}
