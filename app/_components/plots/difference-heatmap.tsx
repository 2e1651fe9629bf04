'use client'
/**
 * B − A per cell of A's grid as a heat map on a diverging scale centred on zero: unchanged cells
 * stay white and each changed cell carries its change written in it. A difference is mostly zeros
 * with a few islands, which a flat map shows cell for cell (a 3-D surface of it is a plain with
 * spikes, and costs a WebGL figure of its own).
 */
import type { PlotTrace } from './trace-types'
import { mapGridLayout } from './figure-layout'
import { tableNumber, type MapTable, type UnitSet } from '@/maps'
import { DIFF_SCALE } from './palette'
import { Plot } from './plot'

export interface DifferenceHeatmapProps {
  /** B − A on A's breakpoints, N·m; 0 where nothing changed. */
  delta: MapTable
  /** Which cells changed (a change can be 0 after rounding, and an unchanged cell is not a change). */
  changed: boolean[][]
  units: UnitSet
  title: string
  filename: string
}

export function DifferenceHeatmap({ delta, changed, units: u, title, filename }: DifferenceHeatmapProps) {
  const x = delta.colAxis.map((s) => tableNumber(u.speedOut(s)))
  const y = delta.rowAxis.map((p) => `${tableNumber(p)} %`)
  const z = delta.values.map((row) => row.map(u.torqueOut))
  const zMax = Math.max(1, ...z.flat().map(Math.abs).filter(Number.isFinite))
  const text = z.map((row, r) => row.map((v, c) => (changed[r][c] ? tableNumber(v, 0) : '')))
  const data: PlotTrace[] = [{
    type: 'heatmap', x, y, z, text, texttemplate: '%{text}', textfont: { size: 10 },
    colorscale: DIFF_SCALE, zmin: -zMax, zmax: zMax, zmid: 0, xgap: 1, ygap: 1,
    colorbar: { title: { text: u.torque, side: 'right' }, thickness: 12 },
    hovertemplate: `%{y}, %{x} ${u.speed}<br>B − A %{z:.1f} ${u.torque}<extra></extra>`,
  }]
  return (
    <Plot
      filename={filename}
      height={400}
      data={data}
      layout={mapGridLayout(title, delta.kind, u)}
    />
  )
}
