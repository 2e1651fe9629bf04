import { z } from 'zod'
import { rampLimitsSchema } from '@/maps/ramps'
import { atMost } from './text'

/** A new ramp version: the limits and why they change (every version says why). */
export const rampVersionInputSchema = z.strictObject({
  limits: rampLimitsSchema,
  reason: z.string().trim().min(1, 'Say why the ramp limits change (the change makes a new version)').max(2000, atMost('The reason', 2000)),
})
