'use client'
/**
 * A torque map as a 3D surface: road speed across, pedal into the page, torque up. Optionally the
 * traction limit (the motor-shaft torque the drive axle can transmit at each speed) is drawn over it
 * as a fence of lines, so cells poking through the fence are the ones that would spin or lock.
 */
import type { Scene } from 'plotly.js'
import type { PlotTrace } from './trace-types'
import { figureTitle } from './figure-layout'
import type { MapTable } from '@/maps'
import { limitFence } from './limit-fence'
import { TORQUE_SCALE } from './palette'
import { Plot, type RelayoutEvent } from './plot'
import type { UnitSet } from '@/maps'

export interface SurfacePlotProps {
  table: MapTable
  units: UnitSet
  title: string
  filename: string
  /** Shared colour range, in stored N·m (so two plots compare colour for colour). */
  range?: { min: number; max: number }
  /** Traction limit per speed column, N·m; omitted = no sheet. */
  limitBySpeed?: number[]
  camera?: Camera
  onCamera?: (c: Camera) => void
  height?: number
}

/** A 3D camera (eye, centre, up) as Plotly lays it out. */
export type Camera = NonNullable<Scene['camera']>

/** Looking from low speed, low pedal towards the far corner, far enough out that the axis titles fit. */
export const DEFAULT_CAMERA: Camera = { eye: { x: -1.5, y: -1.7, z: 0.95 }, center: { x: 0, y: 0, z: -0.1 }, up: { x: 0, y: 0, z: 1 } }

/** The camera a 3D relayout event carries, if any. */
export function cameraOf(e: RelayoutEvent): Camera | null {
  const c = e['scene.camera']
  return c && typeof c === 'object' ? (c as Camera) : null
}

export function SurfacePlot(p: SurfacePlotProps) {
  const u = p.units
  const x = p.table.colAxis.map(u.speedOut)
  const y = p.table.rowAxis
  const z = p.table.values.map((row) => row.map(u.torqueOut))
  const pedalWord = p.table.kind === 'regen' ? 'Brake pedal' : 'Pedal'
  const zLabel = `${p.table.kind === 'regen' ? 'Regen torque' : 'Torque'} (${u.torque})`
  const data: PlotTrace[] = [
    {
      type: 'surface', x, y, z, name: p.title, colorscale: TORQUE_SCALE,
      ...(p.range ? { cmin: u.torqueOut(p.range.min), cmax: u.torqueOut(p.range.max) } : {}),
      colorbar: { title: { text: u.torque, side: 'right' }, thickness: 12, len: 0.7 },
      hovertemplate: `%{x:.1f} ${u.speed}, %{y} %<br>%{z:.1f} ${u.torque}<extra></extra>`,
      contours: { z: { show: true, usecolormap: true, width: 1, highlightcolor: '#14202b' } },
    },
  ]
  if (p.limitBySpeed) data.push({ ...limitFence(x, y, p.limitBySpeed.map(u.torqueOut)), hovertemplate: `Traction limit at %{x:.1f} ${u.speed}: %{z:.0f} ${u.torque}<extra></extra>` })
  return (
    <Plot
      filename={p.filename}
      height={p.height ?? 400}
      data={data}
      onRelayout={(e) => { const c = cameraOf(e); if (c && p.onCamera) p.onCamera(c) }}
      layout={{
        title: figureTitle(p.title),
        margin: { l: 0, r: 0, t: 36, b: 0 },
        showlegend: false,
        scene: {
          xaxis: { title: { text: `Road speed (${u.speed})` } },
          yaxis: { title: { text: `${pedalWord} (%)` } },
          zaxis: { title: { text: zLabel } },
          aspectmode: 'manual',
          aspectratio: { x: 1.25, y: 1, z: 0.75 },
          camera: p.camera ?? DEFAULT_CAMERA,
        },
      }}
    />
  )
}
