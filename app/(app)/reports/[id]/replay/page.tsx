import Link from 'next/link'
import { notFound } from 'next/navigation'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { HttpError } from '@/app/_lib/http/errors'
import { idOrNull, pageId } from '@/app/_lib/http/page-params'
import { getReport } from '@/db/queries/reports'
import { replayReport, type ReplayAnswer } from '@/app/_lib/reports/replay'
import { listLogs } from '@/db/queries/logs'
import { listSets } from '@/db/queries/sets'
import { loadCaseLabel } from '@/physics/load-cases'
import { surfaceLabel } from '@/physics/surfaces'
import { ReplayPlots } from './replay-plots'
import { ReplayGrid } from './replay-grid'

export const metadata = { title: 'Replay a drive' }

const pct = (x: number) => `${(100 * x).toFixed(1)} %`

/** /reports/:id/replay?set=&log= — the report's log replayed through a chosen set of the same program. */
export default async function ReplayPage(props: { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  await requirePageUser()
  // The layout answers 404 first; pages render beside it, so this one says 404 too rather than throw.
  const report = await getReport(pageId((await props.params).id, 'Report id'))
  if (!report) notFound()
  const q = await props.searchParams
  const [sets, logs] = await Promise.all([listSets({ programId: report.programId }), listLogs(report.id)])
  const analysed = logs.filter((l) => l.status === 'done')
  const setId = idOrNull(q.set, 'Set') ?? sets.find((s) => s.id !== report.setId)?.id ?? report.setId
  const logId = idOrNull(q.log, 'Log') ?? analysed[0]?.id
  let answer: ReplayAnswer | null = null
  let problem: string | null = null
  if (analysed.length) {
    try {
      answer = await replayReport(report, setId, logId ?? undefined)
    } catch (e) {
      if (!(e instanceof HttpError)) throw e
      problem = e.message
    }
  }
  const r = answer?.result
  return (
    <div className="space-y-5">
      <div>
        <p className="text-sm text-slate-500">
          <Link href="/reports" className="hover:underline">Drive reports</Link> · <Link href={`/reports/${report.id}`} className="hover:underline">Report {report.id}</Link>
        </p>
        <h1 className="text-2xl font-bold">Replay the drive of set {report.setNumber} through another set</h1>
        <p className="max-w-3xl text-sm text-slate-600">
          The logged pedal and road speed go through each set’s maps and ramp limits: what the candidate would have asked for at every
          moment of this drive ({surfaceLabel(report.surface)}, {loadCaseLabel(report.loadCase)}), and the slip that request would give under
          its parameter version, beside the slip measured. A driver would have pressed differently on a different map; this compares requests on the same pedal.
        </p>
      </div>
      <form method="get" className="card flex flex-wrap items-end gap-3">
        <div>
          <label htmlFor="set" className="label">Candidate set</label>
          <select id="set" name="set" className="field" defaultValue={String(setId)}>
            {sets.map((s) => (
              <option key={s.id} value={s.id}>Set {s.number}{s.id === report.setId ? ' (driven)' : ''} — {s.driveMapName ?? 'no drive map'} r{s.driveNumber ?? '–'}, {s.regenMapName ?? 'no regen map'} r{s.regenNumber ?? '–'}</option>
            ))}
          </select>
        </div>
        {analysed.length > 1 && (
          <div>
            <label htmlFor="log" className="label">Log</label>
            <select id="log" name="log" className="field" defaultValue={String(logId)}>
              {analysed.map((l) => <option key={l.id} value={l.id}>{l.fileName}</option>)}
            </select>
          </div>
        )}
        <button type="submit" className="btn-primary">Replay</button>
      </form>
      {!analysed.length && <p className="card">This report has no analysed log yet: attach one on the report page and wait for its analysis.</p>}
      {problem && <p role="alert" className="card text-danger">{problem}</p>}
      {answer && r && (
        <>
          <section className="card space-y-1 text-sm" aria-label="Summary" data-testid="replay-summary">
            <p>
              <strong>Set {answer.candidate.number}</strong> (parameter version v{answer.candidate.paramVersion}
              {answer.candidate.rampVersion !== null ? `, ramps v${answer.candidate.rampVersion}` : ', no ramp limits'}) over {answer.log.fileName}:{' '}
              {r.samples.toLocaleString('en')} samples, {r.seconds.toFixed(0)} s, replayed in {answer.ms} ms.
            </p>
            <p data-testid="replay-more">
              Asks for more than was driven (by over 25 N·m) during <strong>{r.moreSeconds.toFixed(1)} s ({pct(r.moreShare)})</strong>
              {r.worstAtS !== null ? `; at most ${Math.round(r.worstExcessNm)} N·m more, at ${r.worstAtS.toFixed(1)} s` : ''}.
            </p>
            <p>
              Peak slip predicted for the candidate {r.predictedPeakSlip.toFixed(3)}
              {r.predictedSpinSeconds > 0 ? `, and beyond the tyre’s peak (spin or lock) for ${r.predictedSpinSeconds.toFixed(1)} s` : ''}; peak slip measured on the drive {r.measuredPeakSlip.toFixed(3)}.
            </p>
          </section>
          <ReplayPlots series={r.series} drivenLabel={`set ${answer.driven.number} (driven)`} candidateLabel={`set ${answer.candidate.number}`} filename={`report-${report.id}-replay-set-${answer.candidate.number}`} />
          {r.grid && <ReplayGrid grid={r.grid} />}
        </>
      )}
    </div>
  )
}
