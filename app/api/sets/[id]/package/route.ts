import { z } from 'zod'
import { withRole } from '@/app/_lib/http/access'
import { intParam } from '@/app/_lib/http/request'
import { loadSet, packageOf } from '@/app/_lib/sets/service'
import { parseQuery } from '@/app/_schemas/query'

const query = z.strictObject({ kind: z.enum(['release', 'test'], { error: 'kind must be release or test' }).default('release') })

// GET /api/sets/:id/package?kind=release|test — the frozen release package (the stored bytes) or the test package
export const GET = withRole<{ id: string }>('signed-in', async (req, { params }) => {
  const set = await loadSet(intParam(params.id, 'Set id'))
  const { kind } = parseQuery(req, query)
  const p = await packageOf(set, kind)
  return new Response(new Blob([new Uint8Array(p.bytes)]), {
    headers: {
      'content-type': 'application/zip',
      'content-disposition': `attachment; filename="${p.filename}"`,
      'x-package-sha256': p.sha256,
      'x-package-kind': kind,
      ...(p.retired ? { 'x-package-note': 'replaced by a later release' } : {}),
    },
  })
})
