'use client'
import { useQuery } from '@tanstack/react-query'
import { api } from '@/app/_components/api-client'
import { shortChecksum } from '@/app/_components/format'

export interface MapOption {
  id: number
  name: string
  kind: 'drive' | 'regen'
  programId: number
  programName: string
  latestNumber: number | null
}

interface RevisionItem {
  id: number
  number: number
  checksum: string
  message: string
}

/** Choose the map and the exact revision the vehicle was flashed with; the checksum is shown to compare. */
export function RevisionPicker(props: {
  maps: MapOption[]
  mapId: number | undefined
  revisionId: number | undefined
  onMap: (id: number) => void
  onRevision: (id: number, number: number) => void
  error?: string
}) {
  const revisions = useQuery({
    queryKey: ['revisions', props.mapId],
    enabled: Boolean(props.mapId),
    queryFn: () => api<{ revisions: RevisionItem[] }>(`/api/maps/${props.mapId}/revisions?limit=50`),
  })
  const chosen = revisions.data?.revisions.find((r) => r.id === props.revisionId)
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      <div>
        <label htmlFor="map" className="label">Map</label>
        <select id="map" className="field" value={props.mapId ?? ''} onChange={(e) => props.onMap(Number(e.target.value))}>
          <option value="" disabled>Choose…</option>
          {props.maps.map((m) => (
            <option key={m.id} value={m.id}>{m.programName} — {m.name}</option>
          ))}
        </select>
      </div>
      <div>
        <label htmlFor="revision" className="label">Revision flashed</label>
        <select id="revision" className="field" value={props.revisionId ?? ''} onChange={(e) => {
            const r = revisions.data?.revisions.find((x) => x.id === Number(e.target.value))
            if (r) props.onRevision(r.id, r.number)
          }} disabled={!revisions.data}>
          <option value="" disabled>Choose…</option>
          {revisions.data?.revisions.map((r) => (
            <option key={r.id} value={r.id}>r{r.number} — {r.message.slice(0, 50)}</option>
          ))}
        </select>
        {props.error && <p className="error-text">{props.error}</p>}
      </div>
      {chosen && (
        <p className="rounded bg-slate-100 px-2 py-1 font-mono text-xs sm:col-span-2" data-testid="revision-checksum">
          Checksum {shortChecksum(chosen.checksum)}… — check it matches the one the vehicle reports.
        </p>
      )}
    </div>
  )
}
