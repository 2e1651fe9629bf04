/** An outgoing e-mail: pending (waiting or retrying), sent, or failed after its last attempt (mail_outbox.status). */
export const MAIL_STATUSES = ['pending', 'sent', 'failed'] as const
export type MailStatus = (typeof MAIL_STATUSES)[number]
