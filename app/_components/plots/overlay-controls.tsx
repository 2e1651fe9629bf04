'use client'
/** The selects that choose the physics overlay (load case, surface, grade) and the display units. */
import { LOAD_CASE_LABELS, SURFACE_IDS, SURFACES, type LoadCase, type SurfaceId } from '@/physics'
import type { UnitSystem } from '@/maps'

export interface OverlayChoice {
  loadCase: LoadCase
  surface: SurfaceId
  gradePct: number
  units: UnitSystem
}

export function OverlayControls({ value, loadCases, onChange }: { value: OverlayChoice; loadCases: LoadCase[]; onChange: (v: OverlayChoice) => void }) {
  return (
    <div className="flex flex-wrap items-end gap-3">
      <label className="w-52">
        <span className="label">Load case</span>
        <select className="field" value={value.loadCase} onChange={(e) => onChange({ ...value, loadCase: e.target.value as LoadCase })}>
          {loadCases.map((l) => <option key={l} value={l}>{LOAD_CASE_LABELS[l]}</option>)}
        </select>
      </label>
      <label className="w-48">
        <span className="label">Surface</span>
        <select className="field" value={value.surface} onChange={(e) => onChange({ ...value, surface: e.target.value as SurfaceId })}>
          {SURFACE_IDS.map((s) => <option key={s} value={s}>{SURFACES[s].label} (μ {SURFACES[s].peakMu})</option>)}
        </select>
      </label>
      <label className="w-28">
        <span className="label">Grade (%)</span>
        <input className="field" type="number" min={-30} max={30} step={1} value={value.gradePct}
          onChange={(e) => { const g = Number(e.target.value); if (Number.isFinite(g) && g >= -30 && g <= 30) onChange({ ...value, gradePct: g }) }} />
      </label>
      <label className="w-36">
        <span className="label">Units</span>
        <select className="field" value={value.units} onChange={(e) => onChange({ ...value, units: e.target.value as UnitSystem })}>
          <option value="metric">N·m, km/h</option>
          <option value="imperial">lbf·ft, mph</option>
        </select>
      </label>
    </div>
  )
}
