// Notes are GitHub-flavoured markdown, rendered without any HTML the writer typed.
import { createElement } from 'react'
import { renderToStaticMarkup } from 'react-dom/server'
import { describe, expect, it } from 'vitest'
import { MarkdownNotes } from '@/app/_components/markdown-notes'

const render = (text: string) => renderToStaticMarkup(createElement(MarkdownNotes, { text }))

describe('markdown notes', () => {
  it('renders a GFM table (GitHub Flavored Markdown spec, "Tables" extension) inside a focusable scroll box', () => {
    const html = render('| Speed | Torque |\n| --- | ---: |\n| 10 km/h | 2400 N·m |')
    expect(html).toContain('<th>Speed</th>')
    expect(html).toContain('<td style="text-align:right">2400 N·m</td>')
    expect(html).toMatch(/<div class="overflow-x-auto" tabindex="0" role="region" aria-label="Table in the notes"><table>/)
  })

  it('renders strikethrough and bare links (GFM extensions) and ordinary lists', () => {
    const html = render('~~old~~ see https://example.org/notes\n\n- one\n- two')
    expect(html).toContain('<del>old</del>')
    expect(html).toContain('<a href="https://example.org/notes">https://example.org/notes</a>')
    expect(html).toContain('<li>one</li>')
  })

  it('drops raw HTML and script links instead of rendering them', () => {
    const html = render('<script>alert(1)</script>\n\n<b onclick="x()">bold</b> and [click](javascript:alert(1))')
    expect(html).not.toContain('<script')
    expect(html).not.toContain('onclick')
    expect(html).not.toContain('<b')
    expect(html).not.toContain('javascript:')
    expect(html).toContain('click')
  })

  it('renders nothing for blank notes', () => {
    expect(render('  \n ')).toBe('')
  })
})
