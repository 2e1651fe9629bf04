/**
 * Unsaved edits in localStorage, one draft per map, so a reload or a crashed tab loses nothing.
 * The draft remembers the revision it started from: a save goes on top of that revision, and a
 * 409 tells the calibrator someone saved in between.
 */
import { z } from 'zod'
import { mapTableSchema, type MapTable } from '@/maps'

export interface Draft {
  /** Sent as the Idempotency-Key of the save: saving the same draft twice makes one revision. */
  id?: string
  baseNumber: number
  /** The revision's table as it was when the draft began, to tell what changed. */
  baseTable: MapTable
  table: MapTable
  message: string
  notes: string
  /** ISO time of the last change. */
  savedAt: string
}

const draftSchema = z.object({
  id: z.string().optional(),
  baseNumber: z.number().int().min(0),
  baseTable: mapTableSchema,
  table: mapTableSchema,
  message: z.string().default(''),
  notes: z.string().default(''),
  savedAt: z.string(),
})

const key = (mapId: number) => `mapwright:draft:map-${mapId}`

/** The stored draft of a map, or null when there is none or it is unreadable (e.g. from an older version). */
export function loadDraft(mapId: number): Draft | null {
  try {
    const raw = window.localStorage.getItem(key(mapId))
    if (!raw) return null
    const parsed = draftSchema.safeParse(JSON.parse(raw))
    return parsed.success ? parsed.data : null
  } catch {
    return null
  }
}

/** Store the draft; a full or blocked storage is skipped (the edits stay in the open page). */
export function saveDraft(mapId: number, draft: Draft): void {
  try {
    window.localStorage.setItem(key(mapId), JSON.stringify(draft))
  } catch {
    // Private mode or a full quota: nothing more can be done here without losing the page state.
  }
}

export function clearDraft(mapId: number): void {
  try {
    window.localStorage.removeItem(key(mapId))
  } catch {
    // Storage blocked: there is nothing stored to clear either.
  }
}
