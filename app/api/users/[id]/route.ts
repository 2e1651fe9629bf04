import { withRole } from '@/app/_lib/http/access'
import { ConflictError, NotFoundError } from '@/app/_lib/http/errors'
import { intParam, readJson } from '@/app/_lib/http/request'
import { hashPassword } from '@/app/_lib/auth/password'
import { updateUserSchema } from '@/app/_schemas/user'
import { countActiveAdmins, getUserById, updateUser } from '@/db/queries/users'

// PATCH /api/users/:id — change a user's name, role, password or disabled flag (admin)
export const PATCH = withRole<{ id: string }>(['admin'], async (req, { user, params }) => {
  const id = intParam(params.id, 'User id')
  const input = await readJson(req, updateUserSchema)
  const current = await getUserById(id)
  if (!current) throw new NotFoundError(`User ${id}`)
  const losesAdmin = current.role === 'admin' && !current.disabled && (input.disabled || (input.role && input.role !== 'admin'))
  // Keep at least one admin, or nobody could manage users again.
  if (losesAdmin && (await countActiveAdmins()) <= 1) throw new ConflictError('This is the last active admin; make another admin first')
  const { password, ...rest } = input
  const updated = await updateUser(
    id,
    { ...rest, ...(password ? { passwordHash: await hashPassword(password) } : {}) },
    { actorId: user.id, action: 'user.update', entityType: 'user', entityId: id, details: { ...rest, passwordChanged: Boolean(password) } },
  )
  return Response.json({ user: updated })
})
