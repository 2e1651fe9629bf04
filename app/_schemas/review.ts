import { z } from 'zod'
import { atMost } from './text'

export const reviewActionSchema = z.object({
  action: z.enum(['submit', 'approve', 'send_back', 'release', 'withdraw'], { error: 'action must be submit, approve, send_back, release or withdraw' }),
  comment: z.string().max(5000, 'The comment must be at most 5,000 characters').default(''),
  acknowledgements: z
    .array(z.object({ key: z.string().max(200, atMost('An exception key', 200)), reason: z.string().trim().min(1, 'Each acknowledged exception needs a reason').max(2000, atMost('The reason', 2000)) }))
    .max(50)
    .default([]),
})

export const reviewCommentSchema = z.object({
  body: z.string().trim().min(1, 'The comment is empty').max(5000, atMost('The comment', 5000)),
  row: z.number().int().min(0).nullable().default(null),
  col: z.number().int().min(0).nullable().default(null),
})
