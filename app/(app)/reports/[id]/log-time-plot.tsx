'use client'
import type { Layout, Shape } from 'plotly.js'
import type { PlotTrace } from '@/app/_components/plots/trace-types'
import { Plot } from '@/app/_components/plots/plot'
import type { AnalysisResult, SeriesChannel } from '@/physics'

// Bucket maxima are plotted: a spike inside a bucket still shows (the series keeps min and max).
const line = (t: number[], ch: SeriesChannel, name: string, yaxis: string, color: string): PlotTrace => ({
  x: t,
  y: ch.max,
  name,
  yaxis,
  type: 'scatter',
  mode: 'lines',
  line: { width: 1.2, color },
  connectgaps: false,
})

/** Speed, pedals, torque and slip against time, with spin (orange) and lock-up (blue) events shaded. */
export function LogTimePlot({ analysis: a }: { analysis: AnalysisResult }) {
  const s = a.series
  const data: PlotTrace[] = [
    line(s.tS, s.roadSpeedKmh, 'Road speed (km/h)', 'y', '#0f6b5c'),
    line(s.tS, s.wheelSpeedKmh, 'Wheel speed (km/h)', 'y', '#8fb8ad'),
    line(s.tS, s.accelPedalPct, 'Accelerator (%)', 'y2', '#14202b'),
    line(s.tS, s.brakePedalPct, 'Brake (%)', 'y2', '#b42318'),
    line(s.tS, s.motorTorqueNm, 'Motor torque (N·m)', 'y3', '#5b4bb7'),
    line(s.tS, s.slip, 'Slip ratio (–)', 'y4', '#a35a00'),
  ]
  const shapes: Partial<Shape>[] = a.events.slice(0, 300).map((e) => ({
    type: 'rect',
    xref: 'x',
    yref: 'paper',
    x0: e.startS,
    x1: Math.max(e.endS, e.startS + 0.2),
    y0: 0,
    y1: 1,
    fillcolor: e.kind === 'spin' ? 'rgba(234,140,0,0.25)' : 'rgba(40,90,220,0.25)',
    line: { width: 0 },
  }))
  const layout: Partial<Layout> = {
    height: 560,
    showlegend: true,
    // Above the plots, clear of the time axis title; on a phone it wraps to three rows, which the top margin holds.
    legend: { orientation: 'h', x: 0, xanchor: 'left', y: 1.01, yanchor: 'bottom' },
    margin: { l: 56, r: 16, t: 100, b: 48 },
    grid: { rows: 4, columns: 1, pattern: 'coupled' },
    xaxis: { title: { text: 'Time (s)' } },
    yaxis: { title: { text: 'km/h' } },
    yaxis2: { title: { text: '%' } },
    yaxis3: { title: { text: 'N·m' } },
    yaxis4: { title: { text: 'slip' } },
    shapes,
  }
  return <Plot data={data} layout={layout} height={560} filename="drive-log" />
}
