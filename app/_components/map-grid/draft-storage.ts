/**
 * Unsaved edits of a map kept in the browser, one draft per map, so a reload or a crashed tab
 * loses nothing. The draft remembers the revision it started from: a save goes on top of that
 * revision, and a 409 tells the calibrator someone saved in between.
 */
import { z } from 'zod'
import { mapTableSchema } from '@/maps'

/** What a stored map draft must be to be restored; anything else (an older app version) is dropped. */
export const mapDraftSchema = z.object({
  /** Sent as the Idempotency-Key of the save: saving the same draft twice makes one revision. */
  id: z.string().max(100).optional(),
  baseNumber: z.number().int().min(0),
  /** The revision's table as it was when the draft began, to tell what changed. */
  baseTable: mapTableSchema,
  table: mapTableSchema,
  message: z.string().default(''),
  notes: z.string().default(''),
  /** ISO time of the last change. */
  savedAt: z.string(),
})

export type Draft = z.output<typeof mapDraftSchema>

/** The storage key of a map's draft (unchanged since drafts were first kept, so old drafts still load). */
export const mapDraftKey = (mapId: number) => `mapwright:draft:map-${mapId}`
