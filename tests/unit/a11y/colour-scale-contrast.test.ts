import { describe, expect, it } from 'vitest'
import { CELL_TEXT, colourScale, contrast, luminance } from '@/app/_components/map-grid/colour-scale'

const parse = (css: string) => css.match(/\d+/g)!.map(Number) as [number, number, number]
const WHITE: [number, number, number] = [255, 255, 255]

describe('grid cell colours', () => {
  it('computes luminance and contrast as WCAG 2.1 defines them', () => {
    // WCAG 2.1, definitions of "relative luminance" and "contrast ratio": white 1, black 0, 21:1 between them.
    expect(luminance(WHITE)).toBeCloseTo(1, 12)
    expect(luminance([0, 0, 0])).toBe(0)
    expect(contrast(WHITE, [0, 0, 0])).toBeCloseTo(21, 12)
    // #777777 on white is 4.48:1, the usual example of grey text just failing AA (common practice, recalled from memory).
    expect(contrast([0x77, 0x77, 0x77], WHITE)).toBeCloseTo(4.48, 2)
  })

  it('every cell of the scale gets text with at least 4.5:1 contrast (WCAG 2.1 AA, small text)', () => {
    const scale = colourScale([[0, 2800]], 2800)
    for (let v = 0; v <= 2800; v += 7) {
      const bg = parse(scale.colour(v))
      const text = parse(scale.text(v))
      expect(text).toEqual(scale.dark(v) ? WHITE : CELL_TEXT)
      expect(contrast(bg, text), `${v} N·m on ${scale.colour(v)}`).toBeGreaterThanOrEqual(4.5)
    }
  })
})
