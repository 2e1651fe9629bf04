'use client'
/**
 * Predicted slip ratio per map cell as a heat map, with the cells beyond the tyre curve's peak
 * (no steady slip exists: the wheel spins in drive or locks in regen) filled solid red. The
 * colour saturates at the surface's peak slip, so "dark" means "close to the edge". The hover and
 * the caption add the lateral acceleration the drive axle can still hold in a curve (friction ellipse).
 */
import type { PlotTrace } from './trace-types'
import { mapGridLayout } from './figure-layout'
import type { MapTable } from '@/maps'
import { SLIP_SCALE, SOLID_BEYOND } from './palette'
import { Plot } from './plot'
import { tableNumber, type UnitSet } from '@/maps'

export interface SlipOverlay {
  slip: (number | null)[][]
  spin: boolean[][]
  utilisation: number[][]
  spinCount: number
  tyrePeakSlip: number | null
  /** Friction-ellipse fields (absent from overlays served before they existed). */
  lateralCapacityMps2?: number[][]
  lateralShortCount?: number
  designLateralAccelMps2?: number
  freeRollingLateralMps2?: number
  liftOffJackknifeCells?: number | null
}

export interface SlipHeatmapProps {
  table: MapTable
  overlay: SlipOverlay
  units: UnitSet
  title: string
  filename: string
  testId: string
}

export function SlipHeatmap({ table, overlay, units: u, title, filename, testId }: SlipHeatmapProps) {
  // Categories, not numbers: the breakpoints are uneven, and every cell should be as wide as in the grid.
  const x = table.colAxis.map((s) => tableNumber(u.speedOut(s)))
  const y = table.rowAxis.map((p) => `${tableNumber(p)} %`)
  const beyond = table.kind === 'regen' ? 'lock' : 'spin'
  const lat = overlay.lateralCapacityMps2
  const util = overlay.utilisation.map((row) => row.map((v) => `${Math.round(v * 100)} %`))
  const lateral = overlay.utilisation.map((row, r) => row.map((_, c) => (lat ? lat[r][c].toFixed(2) : '–')))
  const data: PlotTrace[] = [
    {
      type: 'heatmap', x, y, z: overlay.slip, colorscale: SLIP_SCALE, zmin: 0, zmax: overlay.tyrePeakSlip ?? undefined,
      customdata: util,
      text: lateral, // hover only: a heat map shows text on its cells only with a texttemplate
      colorbar: { title: { text: 'slip ratio', side: 'right' }, thickness: 12 },
      hovertemplate: `%{y}, %{x} ${u.speed}<br>slip %{z:.3f}, grip used %{customdata}<br>lateral still held %{text} m/s²<extra></extra>`,
      xgap: 1, ygap: 1,
    },
    {
      type: 'heatmap', x, y, z: overlay.spin.map((row) => row.map((s) => (s ? 1 : null))), colorscale: SOLID_BEYOND, showscale: false,
      text: overlay.spin.map((row) => row.map((s) => (s ? beyond : ''))), texttemplate: '%{text}', textfont: { color: '#ffffff', size: 10 },
      hovertemplate: `%{y}, %{x} ${u.speed}<br>beyond the tyre peak (${beyond})<extra></extra>`,
      xgap: 1, ygap: 1,
    },
  ]
  return (
    <figure data-testid={testId} data-spin-count={overlay.spinCount} className="space-y-1">
      <Plot
        filename={filename}
        height={360}
        data={data}
        layout={mapGridLayout(title, table.kind, u)}
      />
      <figcaption className="text-sm text-slate-700" data-testid={`${testId}-caption`}>
        {overlay.spinCount === 0
          ? 'No cell beyond the tyre peak.'
          : `${overlay.spinCount} ${overlay.spinCount === 1 ? 'cell' : 'cells'} beyond the tyre peak (${beyond}).`}
        {overlay.tyrePeakSlip !== null && ` Peak slip of this surface: ${overlay.tyrePeakSlip.toFixed(3)}.`}
        {lateralCaption(overlay)}
      </figcaption>
    </figure>
  )
}

/** The friction-ellipse result in one sentence: cells short of the design lateral acceleration, and the jackknife finding. */
function lateralCaption(o: SlipOverlay): string {
  if (o.designLateralAccelMps2 === undefined || o.freeRollingLateralMps2 === undefined) return ''
  const design = `${o.designLateralAccelMps2} m/s²`
  if (o.freeRollingLateralMps2 < o.designLateralAccelMps2) return ` This surface holds only ${o.freeRollingLateralMps2.toFixed(2)} m/s² lateral free rolling, below the design ${design}.`
  const n = o.lateralShortCount ?? 0
  const jk = o.liftOffJackknifeCells ? ` ${o.liftOffJackknifeCells} of them on lift-off with a semitrailer: jackknife risk in a curve.` : ''
  return n === 0 ? ` Every cell leaves the drive axle at least ${design} of lateral grip.` : ` ${n} ${n === 1 ? 'cell leaves' : 'cells leave'} the drive axle less than ${design} of lateral grip.${jk}`
}
