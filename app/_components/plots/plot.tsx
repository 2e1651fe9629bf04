'use client'
/**
 * The one way the app draws a Plotly figure: loaded in the browser only (`ssr: false`), with the
 * mode bar always on and its "download plot as PNG" button named after the figure. Titles and trace
 * names are shown as text, never as Plotly's HTML subset (see plot-text.ts).
 */
import dynamic from 'next/dynamic'
import type { Layout } from 'plotly.js'
import type { PlotTrace } from './trace-types'
import { dataAsText, layoutAsText, plotConfig } from './plot-text'

/**
 * The plot library (several MB to fetch and run). Loaded when the first plot mounts, after the page
 * has hydrated: loading it any earlier runs it before hydration and leaves the page's buttons dead
 * for that long.
 */
export const loadPlotLibrary = () => import('./plotly-component')

const PlotlyComponent = dynamic(() => import('./plotly-component'), {
  ssr: false,
  loading: () => <div className="grid h-full min-h-40 place-items-center text-sm text-slate-500">Loading plot…</div>,
})

/** What a relayout event carries that we use: the 3D camera after a drag. */
export type RelayoutEvent = Record<string, unknown>

export interface PlotProps {
  data: PlotTrace[]
  layout: Partial<Layout>
  /** PNG file name (without extension) for the mode bar's download button. */
  filename: string
  height?: number
  onRelayout?: (e: RelayoutEvent) => void
  className?: string
}

const BASE_LAYOUT: Partial<Layout> = {
  autosize: true,
  margin: { l: 56, r: 16, t: 36, b: 48 },
  font: { family: 'Inter, ui-sans-serif, system-ui, sans-serif', size: 12, color: '#14202b' },
  paper_bgcolor: '#ffffff',
  plot_bgcolor: '#ffffff',
  // Keeps zoom and camera across data updates (a unit switch must not reset the view).
  uirevision: 'keep',
}

/**
 * WebGL figures (3-D surfaces) at the screen's own pixel density. Plotly's default draws them at
 * twice it: on an ordinary screen that is four times the pixels, which software WebGL (no GPU)
 * pays on every redraw, for a sharpness the screen cannot show.
 */
const glPixelRatio = () => (typeof window === 'undefined' ? 2 : Math.min(2, Math.max(1, window.devicePixelRatio || 1)))

export function Plot({ data, layout, filename, height = 380, onRelayout, className = '' }: PlotProps) {
  return (
    <div className={className} style={{ height }}>
      <PlotlyComponent
        data={dataAsText(data)}
        layout={layoutAsText({ ...BASE_LAYOUT, ...layout })}
        config={{ ...plotConfig(filename), plotGlPixelRatio: glPixelRatio() }}
        onRelayout={onRelayout}
        useResizeHandler
        style={{ width: '100%', height: '100%' }}
      />
    </div>
  )
}
