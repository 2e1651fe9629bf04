/** A revision reference in the compare URL: `<mapId>:<number>`, e.g. `a=3:2`. */
export interface RevisionRef { mapId: number; number: number }

/** Parses `3:2`; null for anything else. @example parseRef('3:2') // { mapId: 3, number: 2 } */
export function parseRef(v: string | string[] | undefined): RevisionRef | null {
  if (typeof v !== 'string') return null
  const m = /^(\d{1,9}):(\d{1,9})$/.exec(v.trim())
  if (!m) return null
  const [mapId, number] = [Number(m[1]), Number(m[2])]
  return mapId > 0 && number > 0 ? { mapId, number } : null
}

export const refText = (r: RevisionRef): string => `${r.mapId}:${r.number}`
