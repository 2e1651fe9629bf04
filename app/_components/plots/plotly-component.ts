/**
 * The Plotly React component bound to a Plotly built with only the trace types the app draws
 * (trace-types.ts): the core (scatter, shapes, colour bars, hover, mode bar) plus heatmap, surface
 * and scatter3d. The complete prebuilt bundle is 4.8 MB and took ≈ 0.44 s to run on every page
 * that plots; this one is 1.7 MB and ≈ 0.14 s (docs/performance.md). Plotly would draw an
 * unregistered type as nothing and only log a note, hence the typed list below.
 *
 * This module is the heavy chunk: it is only ever reached through the dynamic import in plot.tsx,
 * so it is fetched in the browser by the pages that plot, and never rendered on the server.
 */
import createPlotlyComponent from 'react-plotly.js/factory'
import Plotly from 'plotly.js/lib/core'
import heatmap from 'plotly.js/lib/heatmap'
import scatter3d from 'plotly.js/lib/scatter3d'
import surface from 'plotly.js/lib/surface'
import type { PlotTraceType } from './trace-types'

// Every type the figures may use, but scatter, which the core holds.
const TRACES: Record<Exclude<PlotTraceType, 'scatter'>, unknown> = { heatmap, surface, scatter3d }
Plotly.register(Object.values(TRACES))

const PlotlyComponent = createPlotlyComponent(Plotly)
export default PlotlyComponent
