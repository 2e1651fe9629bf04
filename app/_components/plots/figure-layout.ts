import type { Layout } from 'plotly.js'
import type { MapKind, UnitSet } from '@/maps'

/** A figure's title as every plot shows it: small, at the top left. */
export const figureTitle = (text: string, size = 14): Layout['title'] => ({ text, font: { size }, x: 0.01, xanchor: 'left' })

/** A heat map over a map's grid: road speed across, pedal up, one category per breakpoint. */
export function mapGridLayout(title: string, kind: MapKind, u: UnitSet): Partial<Layout> {
  return {
    title: figureTitle(title),
    xaxis: { title: { text: `Road speed (${u.speed})` }, type: 'category' },
    yaxis: { title: { text: `${kind === 'regen' ? 'Brake pedal' : 'Pedal'} (%)` }, type: 'category' },
    margin: { l: 64, r: 16, t: 36, b: 48 },
  }
}
