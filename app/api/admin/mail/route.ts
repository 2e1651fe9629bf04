import { z } from 'zod'
import { withRole } from '@/app/_lib/http/access'
import { ConflictError, NotFoundError } from '@/app/_lib/http/errors'
import { readJson } from '@/app/_lib/http/request'
import { deliverPending } from '@/app/_lib/mail/sender'
import { mailById, retryMail } from '@/db/queries/mail'

// POST /api/admin/mail — retry a failed message now (admin); a message sent or still queued is refused
export const POST = withRole(['admin'], async (req) => {
  const { id } = await readJson(req, z.object({ id: z.number().int().positive() }))
  if (!(await retryMail(id))) {
    const m = await mailById(id)
    if (!m) throw new NotFoundError(`message ${id}`)
    if (m.status === 'sent') throw new ConflictError(`message ${id} was sent at ${m.sentAt?.toISOString() ?? 'an unrecorded time'} and is not sent again`)
    if (m.status === 'failed') throw new ConflictError(`message ${id} changed while it was being retried; reload the page and try again`)
    throw new ConflictError(`message ${id} is still pending; its next attempt is due at ${m.nextAttemptAt.toISOString()}`)
  }
  return Response.json(await deliverPending())
})
