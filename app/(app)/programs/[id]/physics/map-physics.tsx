'use client'
/** The chosen revision as a surface under its traction-limit fence, its slip heat map and the traction-safe draft. */
import { useQuery } from '@tanstack/react-query'
import { api } from '@/app/_components/api-client'
import type { OverlayChoice } from '@/app/_components/plots/overlay-controls'
import { ProposalPanel } from '@/app/_components/plots/proposal-panel'
import { SlipHeatmap } from '@/app/_components/plots/slip-heatmap'
import { SurfacePending } from '@/app/_components/plots/surface-pending'
import { SurfacePlot } from '@/app/_components/plots/surface-plot'
import { useSurfacesLater } from '@/app/_components/plots/use-surfaces-later'
import type { UnitSet } from '@/maps'
import { useOverlay } from '@/app/_components/plots/use-overlay'
import type { MapTable } from '@/maps'
import type { InitialPlots, ProgramMap } from './physics-state'

export function MapPhysics({ map, rev, choice, units, canEdit, initial }: { map: ProgramMap; rev: number; choice: OverlayChoice; units: UnitSet; canEdit: boolean; initial: InitialPlots | null }) {
  // The server worked out the first revision's table and overlay: no request before the first plot.
  const first = initial && initial.map === map.id && initial.rev === rev ? initial : null
  const table = useQuery({
    queryKey: ['revision-table', map.id, rev],
    queryFn: () => api<{ revision: { table: MapTable } }>(`/api/maps/${map.id}/revisions/${rev}`).then((r) => r.revision.table),
    initialData: first?.table,
    staleTime: Infinity,
  })
  const overlay = useOverlay(map.id, rev, choice, first ? { choice: first.choice, overlay: first.overlay } : undefined)
  const draw = useSurfacesLater() // the slip heat map first, the WebGL surface after
  const err = table.error ?? overlay.error
  const title = `${map.name} r${rev}`
  return (
    <section className="space-y-2">
      <h2 className="text-lg font-semibold">{title} against the traction limit</h2>
      {err && <p className="error-text" role="alert">{err.message}</p>}
      {table.data && overlay.data ? (
        <div className="grid gap-4 lg:grid-cols-2">
          <div className="card p-2">
            {draw ? <SurfacePlot table={table.data} units={units} title={title} filename={`map-${map.id}-r${rev}`} limitBySpeed={overlay.data.tractionLimitBySpeed.map((p) => p.tractionLimitNm)} /> : <SurfacePending />}
          </div>
          <div className="card">
            <SlipHeatmap table={table.data} overlay={overlay.data} units={units} title={`Predicted slip, ${title}`} filename={`slip-${map.id}-r${rev}`} testId="slip-heatmap" />
          </div>
        </div>
      ) : (
        !err && <p className="text-sm text-slate-500">Loading the map…</p>
      )}
      {canEdit && <ProposalPanel mapId={map.id} mapName={map.name} baseNumber={rev} choice={choice} units={units} />}
    </section>
  )
}
