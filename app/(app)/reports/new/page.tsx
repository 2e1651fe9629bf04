import { idOrNull } from '@/app/_lib/http/page-params'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { getMap } from '@/db/queries/maps'
import { setChoices } from '@/db/queries/reports'
import { ReportFormLoader as ReportForm } from '../report-form-loader'

export const metadata = { title: 'File a drive report' }

/** `?set=<id>` preselects the set (a "drive this set" link); `?program=<id>` or `?map=<id>` (a map's page) the program. */
export default async function NewReportPage(props: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  await requirePageUser(['test_driver'])
  const q = await props.searchParams
  const setId = idOrNull(q.set, 'Set id')
  const mapId = idOrNull(q.map, 'Map id')
  const [sets, map] = await Promise.all([setChoices(), mapId ? getMap(mapId) : null])
  const wanted = setId ? sets.find((s) => s.id === setId) : undefined
  // A set older than the newest 500 is still offered when a link names it.
  const linked = setId && !wanted ? (await setChoices({ ids: [setId] }))[0] : undefined
  return (
    <div className="mx-auto max-w-2xl space-y-4">
      <h1 className="text-2xl font-bold">File a drive report</h1>
      <ReportForm
        sets={linked ? [linked, ...sets] : sets}
        initialSetId={wanted?.id ?? linked?.id}
        initialProgramId={idOrNull(q.program, 'Program id') ?? map?.programId ?? undefined}
      />
    </div>
  )
}
