import { z } from 'zod'
import { vehicleParamsSchema } from '@/physics/vehicle'
import { LOAD_CASE_IDS } from '@/physics/load-cases'
import { SURFACE_IDS } from '@/physics/surfaces'
import { atMost } from './text'

/** A battery state the regen and drive checks evaluate, e.g. "Full and cold": 95 %, −10 °C. */
export const batteryCornerSchema = z.object({
  label: z.string().trim().min(1, 'Name the battery corner').max(40, atMost('A battery corner name', 40)),
  socPct: z.number({ error: 'State of charge must be a number (%)' }).min(0, 'State of charge is 0 % or more').max(100, 'State of charge is at most 100 %'),
  temperatureC: z.number({ error: 'Battery temperature must be a number (°C)' }).min(-40, 'Battery temperature is −40 °C or more').max(80, 'Battery temperature is at most 80 °C'),
})

/**
 * What the release gate checks a set's maps over: surfaces × load cases, and the traction margin.
 * Battery corners and the minimum lift-off deceleration were added later and are optional: without
 * corners nothing is checked; with corners but no minimum they are shown and nothing is found.
 */
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
  batteryCorners: z.array(batteryCornerSchema).max(8, 'At most 8 battery corners').optional(),
  minLiftOffDecelMps2: z.number({ error: 'The minimum lift-off deceleration must be a number (m/s²)' }).min(0, 'The minimum lift-off deceleration is 0 m/s² or more').max(5, 'The minimum lift-off deceleration is at most 5 m/s²').optional(),
  /** Comfort limits of the drivability manoeuvres (absent: the defaults of app/_lib/sets/drivability.ts, stated as common practice). */
  maxPeakJerkMps3: z.number({ error: 'The largest peak jerk must be a number (m/s³)' }).min(0.5, 'The largest peak jerk is at least 0.5 m/s³').max(50, 'The largest peak jerk is at most 50 m/s³').optional(),
  maxTimeTo90S: z.number({ error: 'The longest time to 90 % torque must be a number (s)' }).min(0.05, 'The longest time to 90 % torque is at least 0.05 s').max(10, 'The longest time to 90 % torque is at most 10 s').optional(),
  comfortSource: z.string().trim().max(300, atMost('The source of the comfort limits', 300)).optional(),
  /** When declared, the gate replays the program's evidence logs through the set: its request may exceed what was driven by at most this, N·m. */
  replayMarginNm: z.number({ error: 'The replay margin must be a number (N·m)' }).min(0, 'The replay margin is 0 N·m or more').max(10_000, 'The replay margin is at most 10,000 N·m').optional(),
  /** Startability and gradeability, laden (absent: not checked; physics/gradeability.ts). Grades in % (rise per 100 run). */
  startGradePct: z.number({ error: 'The start grade must be a number (%)' }).gt(0, 'The start grade is more than 0 %').max(60, 'The start grade is at most 60 %').optional(),
  holdGradePct: z.number({ error: 'The hold grade must be a number (%)' }).gt(0, 'The hold grade is more than 0 %').max(60, 'The hold grade is at most 60 %').optional(),
  holdSpeedKmh: z.number({ error: 'The hold speed must be a number (km/h)' }).min(1, 'The hold speed is at least 1 km/h').max(120, 'The hold speed is at most 120 km/h').optional(),
}).superRefine((c, ctx) => {
  // A hold is a grade at a speed: one without the other cannot be checked.
  if (c.holdGradePct !== undefined && c.holdSpeedKmh === undefined) ctx.addIssue({ code: 'custom', path: ['holdSpeedKmh'], message: 'Give the speed to hold on the hold grade (km/h)' })
  if (c.holdSpeedKmh !== undefined && c.holdGradePct === undefined) ctx.addIssue({ code: 'custom', path: ['holdGradePct'], message: 'Give the grade to hold the hold speed on (%)' })
})

/** Suggested corners for a new program's release conditions (the engineer edits them). */
export const SUGGESTED_BATTERY_CORNERS = [
  { label: 'Full and cold', socPct: 95, temperatureC: -10 },
  { label: 'Half and warm', socPct: 50, temperatureC: 25 },
]

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
