'use client'
/**
 * The physics overlay as a cell shading in the grid: pick a load case and a surface and every
 * cell is shaded by how much of the drive axle's grip it asks for (red beyond the tyre's peak).
 * Computed in the browser on the unsaved draft, so the engineer sees the margin while typing.
 */
import { useMemo } from 'react'
import type { MapTable } from '@/maps'
import { SURFACES, SURFACE_IDS, type SurfaceId } from '@/physics'
import { mapOverlay } from '@/physics/overlay'
import { loadCasesFor, type LoadCase } from '@/physics/load-cases'
import type { VehicleParams } from '@/physics/vehicle'
import { shadeFromOverlay } from '@/app/_components/plots/utilisation-shade'

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
      return { shade: shadeFromOverlay(o), spinCount: o.spinCount }
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
            {cases.map((l) => <option key={l} value={l}>{l}</option>)}
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
