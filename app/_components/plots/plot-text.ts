/**
 * Plotly draws titles, trace names and annotations as a small subset of HTML (<a href>, <b>, <br>,
 * entities). Names in this app are typed by people, so they reach a plot only as text: `<` and `&`
 * are written as entities, which Plotly shows literally. No React or Plotly import: unit-tested.
 */
import type { Config, Layout } from 'plotly.js'
import type { PlotTrace } from './trace-types'

/** A person's text as Plotly shows it literally (no link, no markup). */
export function plotText(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;')
}

type Titled = { title?: unknown } | undefined

/** A `title` that is either a string or `{ text }`, with its text escaped. */
function titleAsText<T>(title: T): T {
  if (typeof title === 'string') return plotText(title) as T
  const text: unknown = title && typeof title === 'object' ? (title as { text?: unknown }).text : undefined
  return typeof text === 'string' ? { ...title, text: plotText(text) } : title
}

const withTitle = <T extends Titled>(o: T): T => (o && o.title !== undefined ? { ...o, title: titleAsText(o.title) } : o)

/** Every axis (xaxis, yaxis2, …) and scene axis of a layout. */
const AXIS_KEY = /^[xyz]axis\d*$/

/** The layout with its title, axis titles and annotation texts made plain text. */
export function layoutAsText(layout: Partial<Layout>): Partial<Layout> {
  const out: Record<string, unknown> = { ...layout }
  if (layout.title !== undefined) out.title = titleAsText(layout.title)
  for (const [k, v] of Object.entries(layout)) {
    if (AXIS_KEY.test(k)) out[k] = withTitle(v as Titled)
    if (/^scene\d*$/.test(k) && v && typeof v === 'object') {
      const scene: Record<string, unknown> = { ...v }
      for (const a of ['xaxis', 'yaxis', 'zaxis']) if (scene[a]) scene[a] = withTitle(scene[a] as Titled)
      out[k] = scene
    }
  }
  if (layout.annotations) out.annotations = layout.annotations.map((a) => (typeof a.text === 'string' ? { ...a, text: plotText(a.text) } : a))
  return out as Partial<Layout>
}

/** Traces with their names and colour-bar titles made plain text. */
export function dataAsText(data: PlotTrace[]): PlotTrace[] {
  return data.map((d) => {
    const t = { ...d } as Record<string, unknown>
    if (typeof t.name === 'string') t.name = plotText(t.name)
    const bar = t.colorbar as Titled
    if (bar?.title !== undefined) t.colorbar = withTitle(bar)
    return t as PlotTrace
  })
}

/**
 * The mode bar: zoom, pan, rotate, reset and save-as-PNG (Plotly's defaults for each plot type),
 * and nothing that sends the figure to an outside service or shows a vendor logo.
 */
export function plotConfig(filename: string): Partial<Config> {
  return {
    // plotly.js 4 shows its logo and a "send chart to cloud" button unless told not to; with no
    // server URL that button (were it ever shown) has nowhere to send. (4.x has no Chart Studio options.)
    displaylogo: false,
    showSendToCloud: false,
    plotlyServerURL: '',
    modeBarButtonsToRemove: ['sendChartToCloud'],
    displayModeBar: true,
    responsive: true,
    toImageButtonOptions: { format: 'png', filename, scale: 2 },
  }
}
