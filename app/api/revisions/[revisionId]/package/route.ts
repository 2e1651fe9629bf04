import { withRole } from '@/app/_lib/http/access'
import { ConflictError } from '@/app/_lib/http/errors'
import { intParam } from '@/app/_lib/http/request'
import { loadRevisionContext } from '@/app/_lib/review/service'
import { releasePackage } from '@/app/_lib/review/release-package'
import { listRevisionEvents } from '@/db/queries/review'

// GET /api/revisions/:revisionId/package — the release package (zip) of a released revision
export const GET = withRole<{ revisionId: string }>('signed-in', async (_req, { params }) => {
  const ctx = await loadRevisionContext(intParam(params.revisionId, 'Revision id'))
  if (!['released', 'retired', 'withdrawn'].includes(ctx.revision.state)) throw new ConflictError(`Revision ${ctx.revision.number} has not been released`)
  const events = await listRevisionEvents({ revisionId: ctx.revision.id })
  const approved = events.find((e) => e.action === 'approve')
  const released = events.find((e) => e.action === 'release')
  const pkg = releasePackage(ctx, { approverName: approved?.actorName ?? 'unknown', releaserName: released?.actorName ?? 'unknown', releasedAt: released?.at ?? new Date() })
  return new Response(new Blob([pkg.bytes as BlobPart]), {
    headers: { 'content-type': 'application/zip', 'content-disposition': `attachment; filename="${pkg.filename}"`, 'x-revision-checksum': ctx.revision.checksum },
  })
})
