// Any /api path no route matches: a JSON 404 in the one error shape, not Next's HTML page
import { noStore } from '@/app/_lib/http/access'
import { jsonError } from '@/app/_lib/http/errors'

// Public by nature (it answers nothing); declared so the access-matrix test sees it.
const notFound = Object.assign(async (req: Request) => noStore(jsonError(404, 'not_found', `There is no API at ${new URL(req.url).pathname}`)), { access: 'public' as const })

export { notFound as GET, notFound as POST, notFound as PUT, notFound as PATCH, notFound as DELETE }
