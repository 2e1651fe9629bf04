/** Shapes of the map API answers the editor reads (see app/api/maps/[id]/revisions). */
import type { Finding, MapTable } from '@/maps'

export interface SavedRevision {
  id: number
  number: number
  checksum: string
  createdAt: string
}

export interface SaveAnswer {
  revision: SavedRevision
  findings: Finding[]
}

export interface RevisionAnswer {
  revision: SavedRevision & { message: string; notes: string; authorName: string; table: MapTable }
  findings: Finding[]
}

/** The details of a 409 from a save or an import. */
export function conflictDetails(details: unknown): { latestNumber: number } | null {
  if (typeof details !== 'object' || details === null || !('latestNumber' in details)) return null
  const n = details.latestNumber
  return typeof n === 'number' && Number.isInteger(n) ? { latestNumber: n } : null
}
