import Link from 'next/link'
import { notFound } from 'next/navigation'
import { pageId } from '@/app/_lib/http/page-params'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { formatTime, shortChecksum } from '@/app/_components/format'
import { MarkdownNotes } from '@/app/_components/markdown-notes'
import { EDITORS } from '@/app/_lib/auth/roles'
import { loadRevisionContext } from '@/app/_lib/review/service'
import { availableActions, blockedActions } from '@/app/_lib/review/states'
import { STATE_LABELS } from '@/domain/revision-states'
import { NotFoundError } from '@/app/_lib/http/errors'
import { listReviewComments, listRevisionEvents } from '@/db/queries/review'
import { listReports } from '@/db/queries/reports'
import { listSets } from '@/db/queries/sets'
import { diff, limitsFromVehicle, validate } from '@/maps'
import { ReportTable } from '@/app/(app)/reports/report-table'
import { releasedRevisionOfMap } from '@/app/(app)/maps/[id]/released-set'
import { ReviewActions } from './review-actions'
import { ReviewComments } from './review-comments'
import { ChangesSummary } from './changes-summary'
import { compareWithReleaseBefore } from '@/app/_lib/sets/release-before'
import { SetsHolding } from './sets-holding'

export const metadata = { title: 'Review' }

export default async function ReviewPage(props: { params: Promise<{ revisionId: string }> }) {
  const user = await requirePageUser()
  const id = pageId((await props.params).revisionId, 'Revision id')
  const ctx = await loadRevisionContext(id).catch((e) => (e instanceof NotFoundError ? null : Promise.reject(e)))
  if (!ctx) notFound()
  const { revision: r, map } = ctx
  const [sets, reports, comments, events, released] = await Promise.all([
    listSets({ revisionId: r.id }),
    listReports({ revisionId: r.id }),
    listReviewComments({ revisionId: r.id }),
    listRevisionEvents({ revisionId: r.id }),
    releasedRevisionOfMap(map),
  ])
  const changes = released && released.revision.id !== r.id ? diff(released.revision.table, r.table) : null
  // In the trucks now: say what it changed against the release before, not "nothing to compare".
  const previous =
    released && released.revision.id === r.id
      ? { kind: map.kind, comparison: await compareWithReleaseBefore({ programId: map.programId, releasedAt: released.releasedAt, drive: map.kind === 'drive' ? { revisionId: r.id } : null, regen: map.kind === 'regen' ? { revisionId: r.id } : null }) }
      : undefined
  const findings = validate(r.table, limitsFromVehicle(map.programParams))
  const errors = findings.filter((f) => f.severity === 'error').length
  const state = r.state
  const actions = availableActions(state, user, r.authorId)
  const blocked = blockedActions(state, user, r.authorId)
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
        <p className="text-sm" data-testid="validation-count">
          {findings.length === 0 ? (
            'Validation finds nothing.'
          ) : (
            <>
              Validation: {errors} error(s), {findings.length - errors} warning(s) —{' '}
              <Link href={`/maps/${map.id}/revisions/${r.number}`} className="text-accent hover:underline">see them on the map</Link>
            </>
          )}{' '}
          <span className="text-slate-600">(judged with parameter version {map.programParamVersion}, the program&apos;s latest; each set below is judged with its own)</span>
        </p>
      </div>
      <ChangesSummary
        mapId={map.id}
        number={r.number}
        released={released && { number: released.revision.number, setId: released.setId, setNumber: released.setNumber }}
        changes={changes}
        previous={previous}
      />
      {(actions.length > 0 || blocked.length > 0) && (
        <ReviewActions
          revisionId={r.id}
          actions={actions}
          blocked={blocked}
          summaries={{
            approve: `Approve ${map.name} r${r.number} by ${r.authorName}: it becomes “${STATE_LABELS.approved}”, can go into a map set for release, and ${r.authorName} is told by e-mail.`,
          }}
        />
      )}
      <SetsHolding revisionId={r.id} kind={map.kind} sets={sets} canMake={EDITORS.includes(user.role)} />
      <section id="reports">
        <h2 className="mb-2 text-lg font-semibold">Drive reports on sets holding this revision</h2>
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
