import { z } from 'zod'
import { MAX_ID } from './query'
import { atMost } from './text'

const revisionId = (label: string) => z.number({ error: `Choose the ${label} map revision` }).int().positive().max(MAX_ID, `Choose the ${label} map revision`)

/** A new set: one drive revision, one regen revision, the parameter version and the ramp version by their numbers (latest when left out). */
export const setInputSchema = z.strictObject({
  driveRevisionId: revisionId('drive'),
  regenRevisionId: revisionId('regen'),
  paramVersion: z.number({ error: 'paramVersion must be a version number' }).int().positive().max(MAX_ID).optional(),
  /** The ramp version by its number; the latest when left out; null: none (the controller keeps its own ramps). */
  rampVersion: z.number({ error: 'rampVersion must be a version number or null' }).int().positive().max(MAX_ID).nullable().optional(),
  note: z.string().trim().max(2000, atMost('The note', 2000)).default(''),
})

export const releaseSetSchema = z.strictObject({
  acknowledgements: z
    .array(z.strictObject({ key: z.string().max(200, atMost('An exception key', 200)), reason: z.string().trim().min(1, 'Each acknowledged exception needs a reason').max(2000, atMost('The reason', 2000)) }))
    .max(100)
    .default([])
    .superRefine((acks, ctx) => {
      // One reason per exception: a repeated key would silently lose one of the two reasons.
      acks.forEach((a, i) => {
        if (acks.findIndex((b) => b.key === a.key) < i) ctx.addIssue({ code: 'custom', path: [i, 'key'], message: `${a.key} is acknowledged twice; give one reason per exception` })
      })
    }),
})

export const withdrawSetSchema = z.strictObject({
  reason: z.string().trim().min(1, 'Say why the release is withdrawn').max(5000, atMost('The reason', 5000)),
})
