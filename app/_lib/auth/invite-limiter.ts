import 'server-only'
import { RequestLimiter } from './request-limiter'

/**
 * Sending an invitation again: three times an hour per invitee — enough for "it went to spam", not
 * enough to flood their mailbox. Counted in the database, so the budget holds across every app server.
 */
export const INVITE_RESENDS_PER_HOUR = 3
export const inviteResendLimiter = new RequestLimiter('invite-resend', INVITE_RESENDS_PER_HOUR, 3600_000)
