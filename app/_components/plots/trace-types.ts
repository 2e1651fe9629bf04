import type { Data } from 'plotly.js'

/**
 * The trace types the app's Plotly is built with (plotly-component.ts registers each). A figure
 * of any other type would be drawn empty without an error, so figures are typed with PlotTrace:
 * a new type fails the type check until it is registered there too.
 */
export type PlotTraceType = 'scatter' | 'heatmap' | 'surface' | 'scatter3d'

/** One trace of a figure; without `type` Plotly draws a scatter, which the core holds. */
export type PlotTrace = Data & { type?: PlotTraceType }
