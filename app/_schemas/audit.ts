import { z } from 'zod'
import { dateFilter, idFilter, limitParam } from './query'

/** The audit trail's filters, for the API's query string and the audit page's search params alike. */
export const auditFilterSchema = z.strictObject({
  entityType: z.string().max(40, 'entityType must be at most 40 characters').optional(),
  action: z.string().max(60, 'action must be at most 60 characters').optional(),
  actorId: idFilter('actorId').optional(),
  since: dateFilter('since').optional(),
  until: dateFilter('until').optional(),
  format: z.enum(['json', 'csv'], { error: 'format must be json or csv' }).default('json'),
  limit: limitParam(10_000, 500),
  /** Which page of `limit` rows, newest first: page 2 skips the first `limit`. */
  page: z
    .string()
    .regex(/^[1-9][0-9]{0,5}$/, 'page must be a whole number from 1 to 999999')
    .transform(Number)
    .optional()
    .transform((n) => n ?? 1),
})

/** Rows per page on the audit page (the API's own default stays `limit`'s). */
export const AUDIT_PAGE_SIZE = 50
