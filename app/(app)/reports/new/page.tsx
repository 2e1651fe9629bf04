import { idOrNull } from '@/app/_lib/http/page-params'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { listMaps } from '@/db/queries/maps'
import { listPrograms } from '@/db/queries/programs'
import { loadCasesFor } from '@/physics/load-cases'
import { ReportFormLoader as ReportForm } from '../report-form-loader'

export const metadata = { title: 'File a drive report' }

export default async function NewReportPage(props: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  await requirePageUser(['test_driver'])
  const [maps, programs] = await Promise.all([listMaps(), listPrograms()])
  const q = await props.searchParams
  const loadCases = Object.fromEntries(programs.map((p) => [p.id, loadCasesFor(p.params)]))
  return (
    <div className="mx-auto max-w-2xl space-y-4">
      <h1 className="text-2xl font-bold">File a drive report</h1>
      <ReportForm
        maps={maps.map((m) => ({ id: m.id, name: m.name, kind: m.kind, programId: m.programId, programName: m.programName, latestNumber: m.latestNumber }))}
        loadCases={loadCases}
        initialMapId={idOrNull(q.map, 'Map id') ?? undefined}
      />
    </div>
  )
}
