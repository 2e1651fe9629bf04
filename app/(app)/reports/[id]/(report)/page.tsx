import Link from 'next/link'
import { notFound } from 'next/navigation'
import { pageId } from '@/app/_lib/http/page-params'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { shortChecksum } from '@/app/_components/format'
import { getReport, setChoices } from '@/db/queries/reports'
import { listLogs } from '@/db/queries/logs'
import { RATING_KEYS, RATING_LABELS, SEVERITY_LABELS } from '@/app/_schemas/report'
import { SafetyBadge, surfaceLabel } from '../../report-table'
import { SafetyPanel } from '../safety-panel'
import { LogsPanel } from '../logs-panel'
import { ReportDiscussion } from '../report-discussion'
import { SetCorrection } from '../set-correction'
import { loadCaseLabel } from '@/physics/load-cases'
import { MarkdownNotes } from '@/app/_components/markdown-notes'

export const metadata = { title: 'Drive report' }

export default async function ReportPage(props: { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePageUser()
  const report = await getReport(pageId((await props.params).id, 'Report id'))
  if (!report) notFound()
  const isLead = user.role === 'lead_engineer'
  const [logs, choices] = await Promise.all([listLogs(report.id), isLead ? setChoices({ programId: report.programId }) : []])
  const filed = (await props.searchParams).filed === '1'
  const parts = [
    { kind: 'Drive map', mapId: report.driveMapId, mapName: report.driveMapName, number: report.driveNumber, checksum: report.driveChecksum },
    { kind: 'Regen map', mapId: report.regenMapId, mapName: report.regenMapName, number: report.regenNumber, checksum: report.regenChecksum },
  ]
  return (
    <div className="space-y-4">
      {filed && <p role="status" className="rounded bg-accent-soft px-3 py-2 text-sm">Report filed. You can attach the data log below.</p>}
      <div>
        <p className="text-sm text-slate-500">
          <Link href="/reports" className="hover:underline">Drive reports</Link> · {report.programName}
        </p>
        <h1 className="text-2xl font-bold">
          <Link href={`/sets/${report.setId}`} className="text-accent underline">Set {report.setNumber}</Link> — {report.drivenOn}
        </h1>
        <p className="text-sm text-slate-600">
          {user.id === report.driverId && !report.leadReadAt && (
            <Link href={`/reports/${report.id}/edit`} className="btn mr-2">Edit</Link>
          )}
          {report.driverName} · unit {report.vehicleUnit} · {report.route} <SafetyBadge safety={report.safety} />
        </p>
        <p className="pt-1">
          <Link href={`/reports/${report.id}/replay`} className="btn">Replay this drive through another set</Link>
        </p>
      </div>
      <section className="card grid gap-2 text-sm sm:grid-cols-3" aria-label="What the truck ran" data-testid="report-set">
        {parts.map((p) => (
          <p key={p.kind} className="break-words">
            <span className="label">{p.kind}</span>
            {p.mapId && p.number ? (
              <>
                <Link href={`/maps/${p.mapId}/revisions/${p.number}`} className="text-accent hover:underline">{p.mapName} r{p.number}</Link>
                {p.checksum && <> · <span className="font-mono text-xs">{shortChecksum(p.checksum)}</span></>}
              </>
            ) : (
              'none in this set'
            )}
          </p>
        ))}
        <p><span className="label">Parameters</span>version {report.paramVersion}</p>
      </section>
      <section className="card grid gap-2 text-sm sm:grid-cols-3">
        <p><span className="label">Surface</span>{surfaceLabel(report.surface)}</p>
        <p><span className="label">Weather</span>{report.weather}, {report.ambientC} °C</p>
        <p><span className="label">Load</span>{loadCaseLabel(report.loadCase)}, payload {report.payloadKg} kg{report.trailer ? ', trailer' : ''}</p>
        {RATING_KEYS.map((k) => (
          <p key={k}><span className="label">{RATING_LABELS[k]}</span>{report.ratings[k]} / 5</p>
        ))}
        {report.comments && <div className="sm:col-span-3"><span className="label">How it felt</span><MarkdownNotes text={report.comments} /></div>}
      </section>
      {report.flags.length > 0 && (
        <section className="card">
          <h2 className="mb-2 font-semibold">Flagged points</h2>
          <ul className="space-y-1 text-sm">
            {report.flags.map((f, i) => (
              <li key={i} className={f.severity === 4 ? 'font-semibold text-danger' : ''}>
                {f.map === 'regen' ? 'Regen map' : 'Drive map'}: {f.pedalPct} % {f.map === 'regen' ? 'brake' : 'pedal'} at {f.speedKmh} km/h — {f.what} ({SEVERITY_LABELS[f.severity]})
              </li>
            ))}
          </ul>
        </section>
      )}
      <SafetyPanel reportId={report.id} safety={report.safety} resolution={report.safetyResolution} canResolve={user.role === 'lead_engineer'} />
      <ReportDiscussion reportId={report.id} canComment={user.role === 'lead_engineer' || user.role === 'calibration_engineer' || user.id === report.driverId} canMarkRead={user.role === 'lead_engineer'} isDriver={user.id === report.driverId} readAt={report.leadReadAt?.toISOString() ?? null} />
      {isLead && (
        <SetCorrection
          reportId={report.id}
          choices={choices.filter((c) => c.id !== report.setId)}
        />
      )}
      <LogsPanel
        reportId={report.id}
        setId={report.setId}
        initialLogs={logs.map((l) => ({ ...l, createdAt: l.createdAt.toISOString(), analysedAt: l.analysedAt?.toISOString() ?? null }))}
        isDriver={user.id === report.driverId}
        isLead={isLead}
        read={Boolean(report.leadReadAt)}
        needsBrake={!report.driveMapId}
      />
    </div>
  )
}
