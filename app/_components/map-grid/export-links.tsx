/** Download links for one saved revision, with the safety caution every export carries. */
import { SafetyCaution } from '@/app/_components/safety-caution'

const FORMATS = [
  { format: 'csv', label: 'CSV' },
  { format: 'json', label: 'JSON' },
  { format: 'c', label: 'C header' },
] as const

export interface ExportLinksProps {
  mapId: number
  number: number
  note?: string
  /** Why the C header would be refused (errors in the saved revision), or null. */
  cRefusal?: string | null
}

export function ExportLinks({ mapId, number, note, cRefusal }: ExportLinksProps) {
  return (
    <section aria-label="Export" className="card space-y-2">
      <h2 className="text-sm font-semibold">Export revision {number}</h2>
      {note && <p className="text-xs text-slate-600">{note}</p>}
      <div className="flex flex-wrap gap-2">
        {FORMATS.map((f) =>
          f.format === 'c' && cRefusal ? (
            <span key={f.format} className="btn cursor-not-allowed opacity-50" title={cRefusal} aria-disabled="true">
              {f.label}
            </span>
          ) : (
            <a key={f.format} className="btn" href={`/api/maps/${mapId}/revisions/${number}/export?format=${f.format}`} download>
              {f.label}
            </a>
          ),
        )}
      </div>
      {cRefusal && <p className="text-xs text-danger">No C header: {cRefusal}</p>}
      <SafetyCaution />
    </section>
  )
}
