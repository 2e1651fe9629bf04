import { z } from 'zod'
import { atMost } from './text'

export const reviewActionSchema = z.object({
  action: z.enum(['submit', 'approve', 'send_back'], { error: 'action must be submit, approve or send_back (a release or withdrawal is done on a map set: /api/sets/:id/release)' }),
  comment: z.string().max(5000, 'The comment must be at most 5,000 characters').default(''),
})

export const reviewCommentSchema = z.object({
  body: z.string().trim().min(1, 'The comment is empty').max(5000, atMost('The comment', 5000)),
  row: z.number().int().min(0).nullable().default(null),
  col: z.number().int().min(0).nullable().default(null),
})
