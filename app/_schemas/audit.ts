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
})
