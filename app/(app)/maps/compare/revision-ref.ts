import 'server-only'
import { idOrNull } from '@/app/_lib/http/page-params'

/** A revision reference in the compare URL: `<mapId>:<number>`, e.g. `a=3:2`. */
export interface RevisionRef { mapId: number; number: number }

/**
 * Parses `3:2` with the API's id rule for both parts; null for anything else (the picker then
 * says how to write it). @example parseRef('3:2') // { mapId: 3, number: 2 }
 */
export function parseRef(v: string | string[] | undefined): RevisionRef | null {
  if (typeof v !== 'string') return null
  const parts = v.trim().split(':')
  if (parts.length !== 2) return null
  const [mapId, number] = [idOrNull(parts[0], 'Map id'), idOrNull(parts[1], 'Revision number')]
  return mapId !== null && number !== null ? { mapId, number } : null
}

export const refText = (r: RevisionRef): string => `${r.mapId}:${r.number}`
