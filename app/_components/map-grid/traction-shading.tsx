'use client'
/**
 * The physics overlay as cell marks in the grid: pick a load case and a surface and every cell
 * near the drive axle's grip limit or beyond the tyre's peak is marked, with its share of the
 * grip on hover. Computed in the browser on the unsaved draft, so the engineer sees the margin
 * while typing.
 */
import { useMemo } from 'react'
import type { MapTable } from '@/maps'
import { SURFACES, SURFACE_IDS, type SurfaceId } from '@/physics'
import { mapOverlay } from '@/physics/overlay'
import { LOAD_CASE_LABELS, loadCasesFor, type LoadCase } from '@/physics/load-cases'
import type { VehicleParams } from '@/physics/vehicle'
import { NEAR_FROM, TRACTION_STYLE, tractionFromOverlay } from './traction-marks'

export interface ShadingChoice {
  loadCase: LoadCase
  surface: SurfaceId
}

/** The shading function for a table, or undefined when shading is off or the physics refuses the input. */
export function useTractionShade(table: MapTable, vehicle: VehicleParams | null, choice: ShadingChoice | null) {
  return useMemo(() => {
    if (!vehicle || !choice) return { shade: undefined, spinCount: 0 }
    try {
      const o = mapOverlay({ vehicle, loadCase: choice.loadCase, surface: choice.surface, gradeRad: 0, map: table })
      return { shade: tractionFromOverlay(o), spinCount: o.spinCount }
    } catch {
      return { shade: undefined, spinCount: 0 }
    }
  }, [table, vehicle, choice])
}

export function TractionShadingControls(props: { vehicle: VehicleParams | null; choice: ShadingChoice | null; onChange: (c: ShadingChoice | null) => void; spinCount: number; kind: MapTable['kind'] }) {
  if (!props.vehicle) return null
  const cases = loadCasesFor(props.vehicle)
  const c = props.choice
  return (
    <div className="flex flex-wrap items-center gap-2 text-sm" data-testid="traction-shading">
      <label className="flex items-center gap-1">
        <input type="checkbox" checked={Boolean(c)} onChange={(e) => props.onChange(e.target.checked ? { loadCase: cases[0], surface: 'wet-asphalt' } : null)} />
        Shade by traction margin
      </label>
      {c && (
        <>
          <select aria-label="Shading load case" className="field w-auto py-0.5" value={c.loadCase} onChange={(e) => props.onChange({ ...c, loadCase: e.target.value as LoadCase })}>
            {cases.map((l) => <option key={l} value={l}>{LOAD_CASE_LABELS[l]}</option>)}
          </select>
          <select aria-label="Shading surface" className="field w-auto py-0.5" value={c.surface} onChange={(e) => props.onChange({ ...c, surface: e.target.value as SurfaceId })}>
            {SURFACE_IDS.map((s) => <option key={s} value={s}>{SURFACES[s].label}</option>)}
          </select>
          <span data-testid="shading-spin-count" className={props.spinCount ? 'font-semibold text-danger' : 'text-slate-600'}>
            {props.spinCount} cell(s) beyond the tyre’s peak ({props.kind === 'drive' ? 'wheel spin' : 'lock-up'})
          </span>
        </>
      )}
    </div>
  )
}

/** The key to the traction marks, shown while the shading is on. */
export function TractionLegend({ kind }: { kind: MapTable['kind'] }) {
  const chip = (level: 'near' | 'beyond') => (
    <span aria-hidden="true" className={`inline-block h-[13px] w-[13px] rounded-[3px] bg-white text-center text-[9px] font-bold leading-[13px] ring-1 ring-black mw-traction-${level}`} style={{ color: `rgb(${TRACTION_STYLE[level].colour.join(', ')})` }}>
      {TRACTION_STYLE[level].glyph}
    </span>
  )
  return (
    <div className="flex flex-wrap items-center gap-3 text-xs text-slate-700" role="group" aria-label="Traction key" data-testid="traction-legend">
      <span className="font-semibold">Traction</span>
      <span className="inline-flex items-center gap-1">
        <span aria-hidden="true" className="inline-block h-[13px] w-[13px] rounded-[3px] border border-slate-400" /> within margin: under {Math.round(NEAR_FROM * 100)} % of the available grip (no mark)
      </span>
      <span className="inline-flex items-center gap-1">{chip('near')} near the limit: {Math.round(NEAR_FROM * 100)}–100 %</span>
      <span className="inline-flex items-center gap-1">{chip('beyond')} beyond the tyre peak ({kind === 'drive' ? 'wheel spin' : 'lock-up'})</span>
      <span className="text-slate-600">Hover a cell for its share of the grip.</span>
    </div>
  )
}
