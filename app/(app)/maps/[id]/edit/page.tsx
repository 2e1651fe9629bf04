import { notFound } from 'next/navigation'
import { idOrNull, pageId } from '@/app/_lib/http/page-params'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { EDITORS } from '@/app/_lib/auth/roles'
import { MapEditorLazy } from '@/app/_components/map-grid/lazy'
import { limitsOrNull } from '@/app/_components/map-grid/limits-or-null'
import { MapPageHeader } from '@/app/_components/map-grid/map-page-header'
import { getMap } from '@/db/queries/maps'
import { getRevision } from '@/db/queries/revisions'

export const metadata = { title: 'Edit map' }

// Editors only. `?from=N` starts the draft from revision N, otherwise from the latest.
export default async function EditMapPage(props: { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePageUser(EDITORS)
  const map = await getMap(pageId((await props.params).id, 'Map id'))
  if (!map) notFound()
  const { from } = await props.searchParams
  // `?from=` names a revision: absent means the latest, anything else must be a revision number.
  const fromNumber = idOrNull(from, 'Revision number')
  if (from !== undefined && fromNumber === null) notFound()
  const revision = await getRevision(map.id, fromNumber ?? undefined)
  if (!revision) notFound()
  return (
    <div className="space-y-4">
      <MapPageHeader map={map} revision={revision} title="Edit" />
      <MapEditorLazy mapId={map.id} limits={limitsOrNull(map.programParams)} vehicle={map.programParams} designLateralAccelMps2={map.programReleaseConditions?.designLateralAccelMps2} releaseConditions={map.programReleaseConditions} base={{ number: revision.number, table: revision.table }} canSave={EDITORS.includes(user.role)} />
    </div>
  )
}
