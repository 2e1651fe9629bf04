import { z } from 'zod'
import { vehicleParamsSchema } from '@/physics/vehicle'
import { LOAD_CASE_IDS } from '@/physics/load-cases'
import { SURFACE_IDS } from '@/physics/surfaces'
import { atMost } from './text'

/** What the release gate checks a set's maps over: surfaces × load cases, and the traction margin. */
export const releaseConditionsSchema = z.object({
  surfaces: z.array(z.enum(SURFACE_IDS, { error: `each surface must be one of ${SURFACE_IDS.join(', ')}` })).min(1, 'Name at least one surface').max(SURFACE_IDS.length),
  loadCases: z.array(z.enum(LOAD_CASE_IDS, { error: `each load case must be one of ${LOAD_CASE_IDS.join(', ')}` })).min(1, 'Name at least one load case').max(LOAD_CASE_IDS.length),
  marginPct: z.number().min(0, 'The margin is 0 % or more').max(50, 'The margin is at most 50 %'),
  /** Steady lateral acceleration at the tyres of the sharpest curve taken at speed, m/s²; absent = the physics default, DEFAULT_DESIGN_LATERAL_ACCEL_MPS2 (physics/lateral-margin.ts). */
  designLateralAccelMps2: z
    .number({ error: 'The design lateral acceleration must be a number (m/s²)' })
    .min(0.5, 'The design lateral acceleration is at least 0.5 m/s²')
    .max(6, 'The design lateral acceleration is at most 6 m/s²')
    .optional(),
})

export const DEFAULT_RELEASE_CONDITIONS = { surfaces: ['wet-asphalt', 'packed-snow'], loadCases: ['empty', 'laden'], marginPct: 10 } satisfies z.input<typeof releaseConditionsSchema>

/**
 * A vehicle program as the form and the API exchange it; the same schema validates both ends.
 * A change to the parameters or release conditions makes a new parameter version and needs a reason.
 */
export const programInputSchema = z.object({
  name: z.string().trim().min(1, 'Name is required').max(120, 'Name must be at most 120 characters'),
  description: z.string().max(2000, 'Description must be at most 2,000 characters').default(''),
  params: vehicleParamsSchema,
  releaseConditions: releaseConditionsSchema.optional(),
  reason: z.string().trim().max(2000, atMost('The reason', 2000)).default(''),
})

export type ProgramInput = z.infer<typeof programInputSchema>
