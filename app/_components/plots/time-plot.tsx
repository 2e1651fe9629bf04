'use client'
/** Lines against time for the simulation results: one plot, one or two quantities sharing a unit. */
import type { PlotTrace } from './trace-types'
import { figureTitle } from './figure-layout'
import { Plot } from './plot'
import { plotText } from './plot-text'

export interface TimeLine {
  name: string
  y: number[]
  colour: string
  dash?: 'solid' | 'dash' | 'dot'
}

export interface TimePlotProps {
  t: number[]
  lines: TimeLine[]
  title: string
  yLabel: string
  filename: string
  /** Horizontal reference lines (e.g. the tyre's peak slip). */
  refs?: { y: number; label: string }[]
}

export function TimePlot({ t, lines, title, yLabel, filename, refs = [] }: TimePlotProps) {
  const data: PlotTrace[] = lines.map((l) => ({
    type: 'scatter', mode: 'lines', x: t, y: l.y, name: l.name, line: { color: l.colour, width: 2, dash: l.dash ?? 'solid' },
    hovertemplate: `%{x:.2f} s: %{y:.3~f}<extra>${plotText(l.name)}</extra>`,
  }))
  return (
    <Plot
      filename={filename}
      height={260}
      data={data}
      layout={{
        title: figureTitle(title, 13),
        xaxis: { title: { text: 'Time (s)' }, zeroline: false, gridcolor: '#eceee8' },
        yaxis: { title: { text: yLabel }, gridcolor: '#eceee8' },
        legend: { x: 0.99, xanchor: 'right', y: 0.04, yanchor: 'bottom', bgcolor: 'rgba(255,255,255,0.75)' },
        margin: { l: 60, r: 12, t: 40, b: 44 },
        shapes: refs.map((r) => ({ type: 'line', xref: 'paper', x0: 0, x1: 1, y0: r.y, y1: r.y, line: { color: '#b42318', dash: 'dot', width: 1 } })),
        annotations: refs.map((r) => ({ xref: 'paper', x: 1, y: r.y, text: r.label, showarrow: false, xanchor: 'right', yanchor: 'bottom', font: { size: 10, color: '#b42318' } })),
      }}
    />
  )
}
