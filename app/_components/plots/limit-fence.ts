import type { PlotTrace } from './trace-types'
import { LIMIT_COLOUR } from './palette'

/**
 * The traction limit depends on speed only, so its sheet is ruled: drawn as its two edges (lowest and
 * highest pedal) and a rung at every speed breakpoint. Lines, not a translucent second surface: a
 * see-through surface costs each figure extra drawing passes, which software WebGL (office machines
 * and virtual desktops without a GPU) pays in tenths of a second.
 */
export function limitFence(x: number[], y: number[], limit: number[]): PlotTrace {
  const [lo, hi] = [y[0], y[y.length - 1]]
  const fx: (number | null)[] = []
  const fy: (number | null)[] = []
  const fz: (number | null)[] = []
  const point = (px: number | null, py: number | null, pz: number | null) => { fx.push(px); fy.push(py); fz.push(pz) }
  for (const edge of [lo, hi]) { x.forEach((s, i) => point(s, edge, limit[i])); point(null, null, null) }
  x.forEach((s, i) => { point(s, lo, limit[i]); point(s, hi, limit[i]); point(null, null, null) })
  return { type: 'scatter3d', mode: 'lines', x: fx, y: fy, z: fz, name: 'Traction limit', connectgaps: false, line: { color: LIMIT_COLOUR, width: 4 } }
}
