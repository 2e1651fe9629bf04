import { z } from 'zod'
import { MAX_ID } from './query'
import { FLAG_SEVERITIES, SEVERITY_LABELS } from '@/domain/report-safety'
import { LOAD_CASE_IDS, MAP_KINDS, SURFACE_IDS } from '@/physics'
import { findLogColumn } from '@/physics/drive-log/columns'
import { atMost } from './text'

export { SEVERITY_LABELS }

export const RATING_KEYS = ['launch', 'tipIn', 'steadyPedal', 'liftOffRegen', 'brakeBlending'] as const
export const RATING_LABELS: Record<(typeof RATING_KEYS)[number], string> = {
  launch: 'Launch',
  tipIn: 'Tip-in',
  steadyPedal: 'Steady pedal control',
  liftOffRegen: 'Lift-off regen',
  brakeBlending: 'Brake blending',
}
/** 1 = unacceptable … 5 = good; a short fixed scale a driver can answer with a thumb. */
export const RATING_SCALE = [1, 2, 3, 4, 5] as const

const rating = (label: string) =>
  z.number({ error: `${label}: choose a rating from 1 to 5` }).int(`${label}: choose a rating from 1 to 5`).min(1, `${label}: choose a rating from 1 to 5`).max(5, `${label}: choose a rating from 1 to 5`)

export const flagSchema = z.object({
  /** Which map of the set the point is on; the set must hold that map. */
  map: z.enum(MAP_KINDS, { error: 'Choose which map of the set the point is on: drive or regen' }),
  pedalPct: z.number({ error: 'Flag pedal must be a number (%)' }).min(0, 'Flag pedal must be 0–100 %').max(100, 'Flag pedal must be 0–100 %'),
  speedKmh: z.number({ error: 'Flag speed must be a number (km/h)' }).min(0, 'Flag speed must not be negative').max(200, 'Flag speed must be at most 200 km/h'),
  what: z.string().trim().min(1, 'Say what happened at the flagged point').max(500, atMost('What happened', 500)),
  severity: z.literal(FLAG_SEVERITIES, { error: 'Severity must be 1, 2, 3 or 4' }),
})

const setIdSchema = z.number({ error: 'Choose the set the vehicle was flashed with' }).int('Choose the set the vehicle was flashed with').positive('Choose the set the vehicle was flashed with').max(MAX_ID, 'Choose the set the vehicle was flashed with')

/**
 * One schema for the report form and the API, so both refuse the same input with the same words.
 * `setId` is chosen when the report is filed; an edit must send the same one (only a lead corrects it).
 */
export const reportInputSchema = z.object({
  setId: setIdSchema,
  drivenOn: z.iso
    .date('Date must be a calendar date (YYYY-MM-DD)')
    .refine((d) => d >= '1970-01-01' && d <= '9999-12-31', 'Date must be from 1970-01-01 to 9999-12-31'),
  vehicleUnit: z.string().trim().min(1, 'Vehicle unit is required (e.g. its fleet number)').max(60, atMost('Vehicle unit', 60)),
  route: z.string().trim().min(1, 'Route or course is required').max(200, atMost('Route', 200)),
  surface: z.enum(SURFACE_IDS, { error: 'Choose a road surface' }),
  weather: z.string().trim().min(1, 'Weather is required').max(120, atMost('Weather', 120)),
  ambientC: z.number({ error: 'Ambient temperature must be a number (°C)' }).min(-50, 'Ambient temperature must be at least −50 °C').max(60, 'Ambient temperature must be at most 60 °C'),
  loadCase: z.enum(LOAD_CASE_IDS, { error: 'Choose a load case' }),
  payloadKg: z.number({ error: 'Payload must be a number (kg)' }).min(0, 'Payload must not be negative').max(60_000, 'Payload must be at most 60,000 kg'),
  trailer: z.boolean(),
  ratings: z.object({
    launch: rating('Launch'),
    tipIn: rating('Tip-in'),
    steadyPedal: rating('Steady pedal control'),
    liftOffRegen: rating('Lift-off regen'),
    brakeBlending: rating('Brake blending'),
  }),
  comments: z.string().max(10_000, 'Comments must be at most 10,000 characters').default(''),
  flags: z.array(flagSchema).max(100, 'At most 100 flagged points').default([]),
})

export type ReportInput = z.infer<typeof reportInputSchema>

/** A drive log's column mapping: our column name → the header in the driver's file. */
export const logColumnMappingSchema = z
  .record(z.string().max(100, atMost('A column name', 100)), z.string().max(200, atMost('A header name', 200)))
  .refine((m) => Object.keys(m).length <= 40, 'At most 40 mapped columns')

/** A corrected column mapping for a stored log (the driver retries a failed analysis): only our own column names, each header used once. */
export const logRemapSchema = z.object({
  mapping: logColumnMappingSchema.superRefine((m, ctx) => {
    const seen = new Map<string, string>()
    for (const [ours, theirs] of Object.entries(m)) {
      if (!findLogColumn(ours)) ctx.addIssue({ code: 'custom', path: [ours], message: `${ours} is not a column Mapwright reads` })
      else if (theirs.trim() === '') ctx.addIssue({ code: 'custom', path: [ours], message: `the header name for ${ours} is empty` })
      else if (seen.has(theirs)) ctx.addIssue({ code: 'custom', path: [ours], message: `header "${theirs}" is already mapped to ${seen.get(theirs)}` })
      seen.set(theirs, ours)
    }
  }),
})

/** A comment on a drive report. */
export const reportCommentSchema = z.object({ body: z.string().trim().min(1, 'The comment is empty').max(5000, atMost('The comment', 5000)) })

/** A lead moves a report to the set the truck really ran (same program), saying why. */
export const reportSetCorrectionSchema = z.object({
  setId: setIdSchema,
  reason: z.string().trim().min(1, 'Say why the report belongs to that set (e.g. what the vehicle reported)').max(2000, atMost('The reason', 2000)),
})

export const resolveSafetySchema = z.object({
  comment: z.string().trim().min(1, 'Say how the safety concern was resolved').max(5000, atMost('The comment', 5000)),
})
