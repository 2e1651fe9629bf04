import { z } from 'zod'
import { withRole } from '@/app/_lib/http/access'
import { readJson } from '@/app/_lib/http/request'
import { deliverPending } from '@/app/_lib/mail/sender'
import { retryMail } from '@/db/queries/mail'

// POST /api/admin/mail — retry a failed message now (admin)
export const POST = withRole(['admin'], async (req) => {
  const { id } = await readJson(req, z.object({ id: z.number().int().positive() }))
  await retryMail(id)
  return Response.json(await deliverPending())
})
