import { notFound, redirect } from 'next/navigation'
import { pageId } from '@/app/_lib/http/page-params'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { getReport } from '@/db/queries/reports'
import { listMaps } from '@/db/queries/maps'
import { listPrograms } from '@/db/queries/programs'
import { loadCasesFor } from '@/physics/load-cases'
import { reportInputSchema } from '@/app/_schemas/report'
import { ReportFormLoader as ReportForm } from '../../report-form-loader'

export const metadata = { title: 'Edit drive report' }

export default async function EditReportPage(props: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(['test_driver'])
  const r = await getReport(pageId((await props.params).id, 'Report id'))
  if (!r) notFound()
  // Logged in is not authorised: only the filing driver, and only until a lead has read it.
  if (r.driverId !== user.id || r.leadReadAt) redirect(`/reports/${r.id}`)
  const [maps, programs] = await Promise.all([listMaps(), listPrograms()])
  // The stored row goes through the same schema as the form, so the form gets typed values.
  const values = reportInputSchema.parse({
    revisionId: r.revisionId, drivenOn: r.drivenOn, vehicleUnit: r.vehicleUnit, route: r.route, surface: r.surface, weather: r.weather, ambientC: r.ambientC,
    loadCase: r.loadCase, payloadKg: r.payloadKg, trailer: r.trailer, ratings: r.ratings, comments: r.comments, flags: r.flags,
  })
  return (
    <div className="mx-auto max-w-2xl space-y-4">
      <h1 className="text-2xl font-bold">Edit drive report</h1>
      <ReportForm
        maps={maps.map((m) => ({ id: m.id, name: m.name, kind: m.kind, programId: m.programId, programName: m.programName, latestNumber: m.latestNumber }))}
        loadCases={Object.fromEntries(programs.map((p) => [p.id, loadCasesFor(p.params)]))}
        initialMapId={r.mapId}
        edit={{ reportId: r.id, values, revisionNumber: r.revisionNumber }}
      />
    </div>
  )
}
