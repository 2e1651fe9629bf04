/**
 * Unsent work kept in the browser (localStorage), read back only through a zod schema: a draft
 * from an older version of the app, or one edited by hand, is discarded instead of crashing the
 * form that would have started from it. Pure over a Storage-like object, so it runs under tests.
 */
import type { z } from 'zod'

/** The part of the Web Storage API a draft needs. */
export type DraftStorage = Pick<Storage, 'getItem' | 'setItem' | 'removeItem'>

/** The browser's localStorage, or null where there is none or it is blocked (private mode, policy). */
export function browserStorage(): DraftStorage | null {
  try {
    return typeof window === 'undefined' ? null : window.localStorage
  } catch {
    return null
  }
}

/**
 * The draft stored under `key` as the schema reads it, or null when there is none. A draft that is
 * not JSON or fails the schema is removed, so it is not offered again.
 */
export function readDraft<S extends z.ZodType>(storage: DraftStorage | null, key: string, schema: S): z.output<S> | null {
  if (!storage) return null
  let raw: string | null
  try {
    raw = storage.getItem(key)
  } catch {
    return null
  }
  if (raw === null) return null
  let value: unknown
  try {
    value = JSON.parse(raw)
  } catch {
    value = undefined // not JSON: no schema accepts it, so it goes like any invalid draft
  }
  const parsed = schema.safeParse(value)
  if (parsed.success) return parsed.data
  removeDraft(storage, key)
  return null
}

/** Store a draft; false when the storage refused (full quota, blocked): the page keeps its state. */
export function writeDraft(storage: DraftStorage | null, key: string, value: unknown): boolean {
  if (!storage) return false
  try {
    storage.setItem(key, JSON.stringify(value))
    return true
  } catch {
    return false
  }
}

export function removeDraft(storage: DraftStorage | null, key: string): void {
  try {
    storage?.removeItem(key)
  } catch {
    // Storage blocked: nothing stored can be there to remove.
  }
}
