import { notFound, redirect } from 'next/navigation'
import { pageId } from '@/app/_lib/http/page-params'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { getReport, setChoices } from '@/db/queries/reports'
import { reportInputSchema } from '@/app/_schemas/report'
import { ReportFormLoader as ReportForm } from '../../report-form-loader'

export const metadata = { title: 'Edit drive report' }

export default async function EditReportPage(props: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(['test_driver'])
  const r = await getReport(pageId((await props.params).id, 'Report id'))
  if (!r) notFound()
  // Logged in is not authorised: only the filing driver, and only until a lead has read it.
  if (r.driverId !== user.id || r.leadReadAt) redirect(`/reports/${r.id}`)
  const [set] = await setChoices({ ids: [r.setId] })
  if (!set) notFound()
  // The stored row goes through the same schema as the form, so the form gets typed values. The set is fixed.
  const values = reportInputSchema.parse({
    setId: r.setId, drivenOn: r.drivenOn, vehicleUnit: r.vehicleUnit, route: r.route, surface: r.surface, weather: r.weather, ambientC: r.ambientC,
    loadCase: r.loadCase, payloadKg: r.payloadKg, trailer: r.trailer, ratings: r.ratings, comments: r.comments, flags: r.flags,
  })
  return (
    <div className="mx-auto max-w-2xl space-y-4">
      <h1 className="text-2xl font-bold">Edit drive report</h1>
      <ReportForm sets={[set]} edit={{ reportId: r.id, values, set }} />
    </div>
  )
}
