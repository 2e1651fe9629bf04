import Link from 'next/link'
import { notFound } from 'next/navigation'
import { pageId } from '@/app/_lib/http/page-params'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { EDITORS } from '@/app/_lib/auth/roles'
import { RevisionViewerLazy } from '@/app/_components/map-grid/lazy'
import { limitsOrNull } from '@/app/_components/map-grid/limits-or-null'
import { MapPageHeader } from '@/app/_components/map-grid/map-page-header'
import { getMap } from '@/db/queries/maps'
import { getRevision } from '@/db/queries/revisions'
import { MarkdownNotes } from '@/app/_components/markdown-notes'

export const metadata = { title: 'Map revision' }

// Any signed-in user may read a revision; only editors get the way into a new draft.
export default async function RevisionPage(props: { params: Promise<{ id: string; number: string }> }) {
  const user = await requirePageUser()
  const params = await props.params
  const [id, number] = [pageId(params.id, 'Map id'), pageId(params.number, 'Revision number')]
  const map = await getMap(id)
  if (!map) notFound()
  const revision = await getRevision(map.id, number)
  if (!revision) notFound()
  const canEdit = EDITORS.includes(user.role)
  return (
    <div className="space-y-4">
      <MapPageHeader
        map={map}
        revision={revision}
        title={`Revision ${revision.number}`}
        actions={
          canEdit && (
            <Link className="btn-primary" href={`/maps/${map.id}/edit?from=${revision.number}`}>
              Start a new draft from this revision
            </Link>
          )
        }
      />
      <section aria-label="Revision details" className="card space-y-1 text-sm">
        <p className="font-semibold">{revision.message}</p>
        <p className="text-slate-600">
          by {revision.authorName} · <time dateTime={revision.createdAt.toISOString()}>{revision.createdAt.toISOString().replace('T', ' ').slice(0, 16)} UTC</time> · checksum{' '}
          <code className="break-all text-xs">{revision.checksum}</code>
        </p>
        <MarkdownNotes text={revision.notes} />
        <p className="text-slate-600" data-testid="judged-with">
          Findings below are judged with parameter version {map.programParamVersion} of {map.programName} (its latest); a map set is judged with the version it names.
        </p>
      </section>
      <RevisionViewerLazy mapId={map.id} number={revision.number} table={revision.table} limits={limitsOrNull(map.programParams)} />
    </div>
  )
}
