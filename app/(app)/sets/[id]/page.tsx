import Link from 'next/link'
import { MapError } from '@/maps'
import { notFound } from 'next/navigation'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { NotFoundError } from '@/app/_lib/http/errors'
import { pageId } from '@/app/_lib/http/page-params'
import { loadSet, setFindings, setGateFor, testPackage } from '@/app/_lib/sets/service'
import { formatTime } from '@/app/_components/format'
import { SafetyCaution } from '@/app/_components/safety-caution'
import { listAudit } from '@/db/queries/audit'
import { listReports } from '@/db/queries/reports'
import { currentSetRelease, listSets, releaseToRestore } from '@/db/queries/sets'
import { loadCaseLabel } from '@/physics/load-cases'
import { surfaceLabel } from '@/physics/surfaces'
import { SetStatusBadge } from '../status-badge'
import { otherSetIds, setHistory, withdrawnBy } from './history'
import { ReleasePanel } from './release-panel'
import { ReleaseComparisonView } from './release-comparison'
import { compareWithReleaseBefore } from '@/app/_lib/sets/release-before'
import { SetAcknowledgements } from './set-acknowledgements'
import { SetCoverageGrid } from './set-coverage-grid'
import { SetDownloads } from './set-downloads'
import { SetFindingsView } from './set-findings'
import { SetGateChecklist } from './set-gate-checklist'
import { SetHistoryList } from './set-history-list'
import { SetParts } from './set-parts'
import { SetReports } from './set-reports'
import { EvidenceReplay } from './evidence-replay'
import { WithdrawnBanner } from './withdrawn-banner'
import { WithdrawPanel } from './withdraw-panel'
import { MarkdownNotes } from '@/app/_components/markdown-notes'

export const metadata = { title: 'Map set' }

export default async function SetPage(props: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser()
  const id = pageId((await props.params).id, 'Set id')
  const set = await loadSet(id).catch((e) => (e instanceof NotFoundError ? null : Promise.reject(e)))
  if (!set) notFound()
  const firstRelease = set.releases[set.releases.length - 1]
  const [gate, reports, programReports, test, current, audit] = await Promise.all([
    setGateFor(set),
    listReports({ setId: set.id }),
    listReports({ programId: set.programId }),
    // A draft validation refuses can be in a set (driven on a closed course), but it cannot be packaged.
    testPackage(set).catch((e: unknown) => (e instanceof MapError ? { error: e.message } : Promise.reject(e))),
    currentSetRelease(set.programId),
    // Withdrawals and later releases of the program say who withdrew this set's release and what replaced it.
    firstRelease
      ? Promise.all([listAudit({ entityType: 'map_set', action: 'set.release', since: firstRelease.releasedAt, limit: 500 }), listAudit({ entityType: 'map_set', action: 'set.withdraw', since: firstRelease.releasedAt, limit: 500 })]).then((x) => x.flat())
      : [],
  ])
  const others = otherSetIds(set.id, audit)
  const setNumbers = new Map(others.length ? (await listSets({ ids: others })).map((s) => [s.id, s.number] as const) : [])
  const history = setHistory({ setId: set.id, createdAt: set.createdAt, createdByName: set.createdByName, releases: set.releases, audit, setNumbers })
  const latest = set.releases[0] ?? null
  const partNames = [set.drive && `drive map ${set.drive.mapName} r${set.drive.number}`, set.regen && `regen map ${set.regen.mapName} r${set.regen.number}`].filter(Boolean).join(' and ')
  const comparison = latest ? await compareWithReleaseBefore({ programId: set.programId, releasedAt: latest.releasedAt, drive: set.drive, regen: set.regen }) : null
  const isLead = user.role === 'lead_engineer'
  const restore = isLead && set.status === 'released' ? await releaseToRestore(set.programId) : null
  const canRelease = isLead && (set.status === 'testing' || set.status === 'retired')
  // What would still block the release with a reason given for every traction exception and uncovered condition.
  const reasonable = [...gate.exceptions.map((e) => e.key), ...gate.uncovered]
  const unmet = canRelease
    ? (reasonable.length ? await setGateFor(set, reasonable.map((key) => ({ key, reason: 'given' }))) : gate).conditions.filter((c) => !c.met).map((c) => c.summary)
    : []
  return (
    <div className="space-y-6">
      <div className="space-y-1">
        <p className="text-sm text-slate-500">
          <Link href="/sets" className="hover:underline">Map sets</Link> · <Link href={`/sets?program=${set.programId}`} className="hover:underline">{set.programName}</Link>
        </p>
        <h1 className="flex flex-wrap items-center gap-x-3 gap-y-1 text-2xl font-bold">
          <span>
            {set.programName} · Set {set.number}
          </span>
          <SetStatusBadge status={set.status} className="text-sm" />
        </h1>
        <p className="text-sm text-slate-600">
          Made {formatTime(set.createdAt)}
          {set.createdByName ? ` by ${set.createdByName}` : ''}
          {set.status === 'released' && latest ? ` · released ${formatTime(latest.releasedAt)} by ${latest.releasedByName}` : ''}
        </p>
        <MarkdownNotes text={set.note} />
        <p className="pt-1">
          <Link href={`/sets/${set.id}/drivability`} className="btn">Drivability: tip-in, tip-out, launch</Link>
        </p>
      </div>
      {set.status === 'withdrawn' && latest?.withdrawnAt && <WithdrawnBanner setNumber={set.number} at={latest.withdrawnAt} by={withdrawnBy(set.id, latest.id, audit)} reason={latest.withdrawReason} />}
      {(set.status === 'withdrawn' || set.status === 'retired') && (
        <p role="status" className="rounded border border-line bg-white px-3 py-2 text-sm">
          {current ? (
            <>
              The released set of {set.programName} is now{' '}
              <Link href={`/sets/${current.setId}`} className="font-semibold text-accent hover:underline">Set {current.setNumber}</Link> (released {formatTime(current.releasedAt)} by {current.releasedByName}).
            </>
          ) : (
            <>{set.programName} has no released set now.</>
          )}
        </p>
      )}
      <SetParts set={set} />
      {latest && <ReleaseComparisonView comparison={comparison} paramVersion={set.paramVersion.number} />}
      <SetFindingsView set={set} findings={setFindings(set)} />
      <section aria-labelledby="release-section-heading" className="space-y-3">
        <h2 id="release-section-heading" className="text-lg font-semibold">Release</h2>
        <SetGateChecklist gate={gate} programId={set.programId} />
        <SetCoverageGrid coverage={gate.coverage} />
        <SetAcknowledgements releases={set.releases} />
        <SafetyCaution />
        {canRelease && (
          <ReleasePanel
            setId={set.id}
            setNumber={set.number}
            unmet={unmet}
            summary={`Release Set ${set.number} of ${set.programName}: its ${partNames} go to the program's trucks${current ? `, replacing Set ${current.setNumber}` : ' as its first released set'}; the leads and the maps' authors are e-mailed.`}
            exceptions={gate.exceptions.map((e) => ({
              key: e.key,
              label: `${e.mapKind === 'drive' ? 'Drive' : 'Regen'} map × ${surfaceLabel(e.surface)} × ${loadCaseLabel(e.loadCase)}: ${e.cells.length} ${e.finding === 'jackknife' ? 'lift-off cell(s) below the design lateral acceleration (jackknife risk)' : 'cell(s) above the limit'}`,
            }))}
            uncovered={gate.coverage
              .filter((c) => gate.uncovered.includes(c.key))
              .map((c) => ({ key: c.key, label: `${surfaceLabel(c.surface)} × ${loadCaseLabel(c.loadCase)}: no drive report on this set` }))}
          />
        )}
        {isLead && set.status === 'released' && <WithdrawPanel
            setId={set.id}
            setNumber={set.number}
            summary={`Withdraw the release of Set ${set.number}: everyone is told not to use it; ${restore ? `Set ${restore.setNumber}, the release before it, goes back to the trucks` : `${set.programName} will have no released set`}.`}
          />}
        <SetDownloads setId={set.id} status={set.status} release={latest} test={'error' in test ? { error: test.error } : { sha256: test.sha256, bytes: test.bytes.length }} />
      </section>
      <SetReports setId={set.id} reports={reports} canFile={user.role === 'test_driver' && set.status !== 'withdrawn'} />
      <EvidenceReplay setId={set.id} reports={programReports.filter((r) => r.setId !== set.id).slice(0, 20)} />
      <SetHistoryList events={history} />
    </div>
  )
}
