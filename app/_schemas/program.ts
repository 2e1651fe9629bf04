import { z } from 'zod'
import { vehicleParamsSchema } from '@/physics/vehicle'

/** A vehicle program as the form and the API exchange it; the same schema validates both ends. */
export const programInputSchema = z.object({
  name: z.string().trim().min(1, 'Name is required').max(120, 'Name must be at most 120 characters'),
  description: z.string().max(2000, 'Description must be at most 2,000 characters').default(''),
  params: vehicleParamsSchema,
})

export type ProgramInput = z.infer<typeof programInputSchema>
