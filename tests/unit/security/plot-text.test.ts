import { describe, expect, it } from 'vitest'
import type { Layout } from 'plotly.js'
import type { PlotTrace } from '@/app/_components/plots/trace-types'
import { dataAsText, layoutAsText, plotConfig, plotText } from '@/app/_components/plots/plot-text'

// Plotly's pseudo-HTML in titles: <a href>, <b>, <i>, <br>, <sup>, <sub>, <span style> and entities
// (plotly.js documentation, "Text and font styling"). A name must reach it with no tag left intact.
const NAME = '<a href="https://evil.example/">Site drive</a> & <b>bold</b>'
const noTag = (s: unknown) => expect(String(s)).not.toMatch(/<[a-z/]/i)

describe('plot text', () => {
  it('writes <, > and & as entities, which Plotly shows literally', () => {
    expect(plotText('<a href=x>A & B</a>')).toBe('&lt;a href=x&gt;A &amp; B&lt;/a&gt;')
    // An entity typed by a person stays visible as typed, not decoded.
    expect(plotText('&lt;')).toBe('&amp;lt;')
    expect(plotText('Site drive r3')).toBe('Site drive r3')
  })

  it('makes the title, axis and scene titles and annotations of a layout plain text', () => {
    const layout: Partial<Layout> = {
      title: { text: `A: ${NAME} r2` },
      xaxis: { title: { text: NAME } },
      yaxis2: { title: { text: NAME } },
      scene: { xaxis: { title: { text: NAME } }, zaxis: { title: { text: NAME } } },
      annotations: [{ text: NAME, x: 0, y: 0 }],
    }
    const out = layoutAsText(layout) as Record<string, { title?: { text?: string }; xaxis?: { title?: { text: string } }; zaxis?: { title?: { text: string } } }> & Partial<Layout>
    noTag((out.title as { text: string }).text)
    noTag(out.xaxis?.title?.text)
    noTag(out.yaxis2?.title?.text)
    noTag(out.scene?.xaxis?.title?.text)
    noTag(out.scene?.zaxis?.title?.text)
    noTag(out.annotations?.[0].text)
    expect((out.title as { text: string }).text).toContain('&lt;a href=')
    // The input is left as it was.
    expect((layout.title as { text: string }).text).toContain('<a href=')
  })

  it('accepts a plain string title too', () => {
    noTag((layoutAsText({ title: NAME as unknown as Layout['title'] }) as { title: string }).title)
  })

  it('makes trace names and colour-bar titles plain text', () => {
    const data = [{ type: 'surface', name: NAME, colorbar: { title: { text: NAME } } }] as PlotTrace[]
    const [d] = dataAsText(data) as { name: string; colorbar: { title: { text: string } } }[]
    noTag(d.name)
    noTag(d.colorbar.title.text)
  })
})

describe('plot toolbar', () => {
  it('has no button that sends the figure to an outside service and no vendor logo', () => {
    const c = plotConfig('map-1-r2')
    // plotly.js 4 defaults: displaylogo true, showSendToCloud true, plotlyServerURL a cloud address
    // (its generated config schema, node_modules/plotly.js/src/types/generated/schema.d.ts).
    expect(c.displaylogo).toBe(false)
    expect(c.showSendToCloud).toBe(false)
    expect(c.plotlyServerURL).toBe('')
    expect(c.modeBarButtonsToRemove).toContain('sendChartToCloud')
  })

  it('keeps the mode bar with zoom, pan, rotate, reset and save-as-PNG (none removed)', () => {
    const c = plotConfig('map-1-r2')
    expect(c.displayModeBar).toBe(true)
    const removed = (c.modeBarButtonsToRemove ?? []).map(String)
    for (const b of ['zoom2d', 'pan2d', 'zoom3d', 'pan3d', 'orbitRotation', 'resetScale2d', 'resetCameraDefault3d', 'toImage']) expect(removed).not.toContain(b)
    expect(c.toImageButtonOptions).toEqual({ format: 'png', filename: 'map-1-r2', scale: 2 })
  })
})
