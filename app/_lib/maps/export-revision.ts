import 'server-only'
import type { MapWithProgram } from '@/db/queries/maps'
import type { Revision } from '@/db/queries/revisions'
import { verifiedChecksum } from '@/db/checksum'
import { toCHeader, toCsv, toJson } from '@/maps'

export const EXPORT_FORMATS = ['csv', 'json', 'c'] as const
export type ExportFormat = (typeof EXPORT_FORMATS)[number]

/** The export format a query names, or null when it names none we write. */
export function exportFormat(s: string): ExportFormat | null {
  return EXPORT_FORMATS.find((f) => f === s) ?? null
}

/** A revision as a file: CSV for spreadsheets, JSON, or a C header for the controller firmware. */
export function exportRevision(map: MapWithProgram, rev: Revision, format: ExportFormat) {
  const base = `${map.programName}-${map.name}-r${rev.number}`.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '')
  switch (format) {
    case 'csv':
      return { body: toCsv(rev.table), contentType: 'text/csv; charset=utf-8', filename: `${base}.csv` }
    case 'json':
      return { body: toJson(rev.table), contentType: 'application/json; charset=utf-8', filename: `${base}.json` }
    case 'c':
      return {
        body: toCHeader(rev.table, {
          name: `${map.name}_${map.kind}`,
          revision: rev.number,
          mapName: map.name,
          vehicleProgram: map.programName,
          checksum: verifiedChecksum(rev.table, rev.checksum),
        }),
        contentType: 'text/x-c; charset=utf-8',
        filename: `${base}.h`,
      }
  }
}
