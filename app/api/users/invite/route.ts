import { randomBytes } from 'node:crypto'
import { z } from 'zod'
import { withRole } from '@/app/_lib/http/access'
import { readJson } from '@/app/_lib/http/request'
import { hashPassword } from '@/app/_lib/auth/password'
import { sendOneTimeLink } from '@/app/_lib/auth/one-time-links'
import { createUserSchema } from '@/app/_schemas/user'
import { createUser } from '@/db/queries/users'
import { recordAudit } from '@/db/queries/audit'

const inviteSchema = createUserSchema.omit({ password: true })

// POST /api/users/invite — create a user and e-mail them a one-time link to set their password (admin)
export const POST = withRole(['admin'], async (req, { user }) => {
  const input: z.infer<typeof inviteSchema> = await readJson(req, inviteSchema)
  // An unguessable password nobody knows until the invitee sets their own.
  const created = await createUser({ ...input, passwordHash: await hashPassword(randomBytes(32).toString('base64url')), invited: true })
  await recordAudit({ actorId: user.id, action: 'user.invite', entityType: 'user', entityId: created.id, details: { email: created.email, role: created.role } })
  await sendOneTimeLink(created, 'invite', user.id)
  return Response.json({ user: created }, { status: 201 })
})
