'use client'
/**
 * The physics page body: which revision and conditions (kept in the URL), the traction table, the
 * map with its traction-limit fence and slip heat map, and the launch or lift-off simulation.
 */
import { OverlayControls } from '@/app/_components/plots/overlay-controls'
import { UNITS } from '@/maps'
import { useQueryState } from '@/app/_components/plots/use-query-state'
import type { TractionRow } from '@/app/_lib/physics/traction'
import type { LoadCase } from '@/physics'
import { MapPhysics } from './map-physics'
import { initialState, type InitialPlots, type PhysicsState, type ProgramMap } from './physics-state'
import { SimulationPanel } from './simulation-panel'
import { TractionTable } from './traction-table'

export type { ProgramMap }

interface Props {
  programId: number
  loadCases: LoadCase[]
  maps: ProgramMap[]
  initialTraction: TractionRow[]
  initialPlots: InitialPlots | null
  query: Record<string, string | string[] | undefined>
  canEdit: boolean
}

export function PhysicsWorkbench(props: Props) {
  const [state, setState] = useQueryState<PhysicsState>(initialState(props.query, props.maps, props.loadCases))
  const units = UNITS[state.units]
  const map = props.maps.find((m) => m.id === state.map)
  return (
    <div className="space-y-4">
      <div className="card flex flex-wrap items-end gap-3">
        <label className="w-56">
          <span className="label">Map</span>
          <select className="field" value={state.map} onChange={(e) => { const m = props.maps.find((x) => x.id === Number(e.target.value)); if (m) setState({ ...state, map: m.id, rev: m.latestNumber }) }}>
            {props.maps.map((m) => <option key={m.id} value={m.id}>{m.name} ({m.kind})</option>)}
          </select>
        </label>
        <label className="w-28">
          <span className="label">Revision</span>
          <select className="field" value={state.rev} onChange={(e) => setState({ ...state, rev: Number(e.target.value) })}>
            {map && Array.from({ length: map.latestNumber }, (_, i) => map.latestNumber - i).map((n) => <option key={n} value={n}>r{n}</option>)}
          </select>
        </label>
        <OverlayControls value={state} loadCases={props.loadCases} onChange={(c) => setState({ ...state, ...c })} />
      </div>
      <TractionTable programId={props.programId} initial={props.initialTraction} units={units} />
      {map ? (
        <>
          <SimulationPanel key={`${map.id}-${state.rev}`} map={map} rev={state.rev} choice={state} units={units} />
          <MapPhysics map={map} rev={state.rev} choice={state} units={units} canEdit={props.canEdit} initial={props.initialPlots} />
        </>
      ) : (
        <p className="card text-sm text-slate-600">This program has no maps yet; create one to simulate a launch or a lift-off.</p>
      )}
    </div>
  )
}
