import { withRole } from '@/app/_lib/http/access'
import { readJson } from '@/app/_lib/http/request'
import { hashPassword } from '@/app/_lib/auth/password'
import { createUserSchema } from '@/app/_schemas/user'
import { createUser, listUsers } from '@/db/queries/users'
import { recordAudit } from '@/db/queries/audit'

// GET /api/users — list users (admin)
export const GET = withRole(['admin'], async () => Response.json({ users: await listUsers() }))

// POST /api/users — create a user (admin)
export const POST = withRole(['admin'], async (req, { user }) => {
  const input = await readJson(req, createUserSchema)
  const created = await createUser({ ...input, passwordHash: await hashPassword(input.password) })
  await recordAudit({ actorId: user.id, action: 'user.create', entityType: 'user', entityId: created.id, details: { email: created.email, role: created.role } })
  return Response.json({ user: created }, { status: 201 })
})
