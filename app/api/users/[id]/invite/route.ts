import { withRole } from '@/app/_lib/http/access'
import { ConflictError, HttpError, NotFoundError } from '@/app/_lib/http/errors'
import { intParam } from '@/app/_lib/http/request'
import { sendOneTimeLink } from '@/app/_lib/auth/one-time-links'
import { INVITE_RESENDS_PER_HOUR, inviteResendLimiter } from '@/app/_lib/auth/invite-limiter'
import { recordAudit } from '@/db/queries/audit'
import { getUserById, isInvited } from '@/db/queries/users'

// POST /api/users/:id/invite — e-mail an invited user a fresh one-time link; the earlier link stops working (admin)
export const POST = withRole<{ id: string }>(['admin'], async (_req, { user, params }) => {
  const id = intParam(params.id, 'User id')
  const invitee = await getUserById(id)
  if (!invitee) throw new NotFoundError(`User ${id}`)
  if (invitee.disabled) throw new ConflictError(`${invitee.email} is disabled; enable the account before inviting again`)
  if (!(await isInvited(id))) throw new ConflictError(`${invitee.email} has already set a password; they can ask for a reset link on the sign-in page`)
  const wait = await inviteResendLimiter.take([`user:${id}`])
  if (wait > 0) throw new HttpError(429, 'too_many_requests', `The invitation to ${invitee.email} was sent ${INVITE_RESENDS_PER_HOUR} times in the last hour; try again in ${Math.ceil(wait / 60)} minute(s)`)
  await recordAudit({ actorId: user.id, action: 'user.invite-resend', entityType: 'user', entityId: id, details: { email: invitee.email } })
  await sendOneTimeLink(invitee, 'invite', user.id)
  return Response.json({ message: `A new invitation is on its way to ${invitee.email}; the earlier link no longer works.` })
})
