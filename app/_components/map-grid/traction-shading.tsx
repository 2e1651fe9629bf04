'use client'
/**
 * The physics overlay as cell marks in the grid: pick a load case and a surface and every cell
 * near the drive axle's grip limit or beyond the tyre's peak is marked, with its share of the
 * grip on hover, and the count of cells that leave the drive axle less lateral grip than the design
 * curve needs. Computed in the browser on the unsaved draft, so the engineer sees the margin while typing.
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

/** What the shading shows besides the colours. */
export interface ShadingCounts {
  spinCount: number
  /** Cells below the design lateral acceleration (friction ellipse), with the design value, m/s². */
  lateralShortCount: number
  designLateralAccelMps2: number | null
  /** Free rolling already below the design value: the surface, not the map, is short. */
  surfaceShort: boolean
  /** Lift-off cells of a regen map on a semitrailer case that are lateral-short; null when not applicable. */
  liftOffJackknifeCells: number | null
}

const NONE: ShadingCounts = { spinCount: 0, lateralShortCount: 0, designLateralAccelMps2: null, surfaceShort: false, liftOffJackknifeCells: null }

/** The shading function for a table, or undefined when shading is off or the physics refuses the input. */
export function useTractionShade(table: MapTable, vehicle: VehicleParams | null, choice: ShadingChoice | null, designLateralAccelMps2?: number) {
  return useMemo(() => {
    if (!vehicle || !choice) return { shade: undefined, ...NONE }
    try {
      const o = mapOverlay({ vehicle, loadCase: choice.loadCase, surface: choice.surface, gradeRad: 0, map: table, designLateralAccelMps2 })
      return {
        shade: tractionFromOverlay(o),
        spinCount: o.spinCount,
        lateralShortCount: o.lateralShortCount,
        designLateralAccelMps2: o.designLateralAccelMps2,
        surfaceShort: o.freeRollingLateralMps2 < o.designLateralAccelMps2,
        liftOffJackknifeCells: o.liftOffJackknifeCells,
      }
    } catch {
      return { shade: undefined, ...NONE }
    }
  }, [table, vehicle, choice, designLateralAccelMps2])
}

export function TractionShadingControls(props: { vehicle: VehicleParams | null; choice: ShadingChoice | null; onChange: (c: ShadingChoice | null) => void; counts: ShadingCounts; kind: MapTable['kind'] }) {
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
          <span data-testid="shading-spin-count" className={props.counts.spinCount ? 'font-semibold text-danger' : 'text-slate-600'}>
            {props.counts.spinCount} cell(s) beyond the tyre’s peak ({props.kind === 'drive' ? 'wheel spin' : 'lock-up'})
          </span>
          <LateralNote counts={props.counts} />
        </>
      )}
    </div>
  )
}

/** The friction-ellipse check in words: lateral grip left for the design curve, and the jackknife finding on lift-off. */
function LateralNote({ counts: c }: { counts: ShadingCounts }) {
  if (c.designLateralAccelMps2 === null) return null
  const design = `${c.designLateralAccelMps2} m/s²`
  if (c.surfaceShort) return <span data-testid="shading-lateral" className="text-slate-600">· this surface cannot hold {design} lateral even free rolling</span>
  return (
    <span data-testid="shading-lateral" className={c.lateralShortCount ? 'font-semibold text-danger' : 'text-slate-600'}>
      · {c.lateralShortCount} cell(s) leave the drive axle less than {design} lateral grip
      {c.liftOffJackknifeCells ? ` — ${c.liftOffJackknifeCells} on lift-off: jackknife risk in a curve` : ''}
    </span>
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
