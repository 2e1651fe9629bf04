import { describe, expect, it } from 'vitest'
import { colourScale, contrast } from '@/app/_components/map-grid/colour-scale'
import { CHIP_FILL, CHIP_RING, NEAR_FROM, TRACTION_STYLE, tractionFromOverlay, tractionLevel, tractionText } from '@/app/_components/map-grid/traction-marks'

const parse = (css: string) => css.match(/\d+/g)!.slice(0, 3).map(Number) as [number, number, number]

describe('traction marks', () => {
  it('sorts a cell by its share of the grip', () => {
    expect(tractionLevel(NEAR_FROM - 0.01, false)).toBe('margin')
    expect(tractionLevel(NEAR_FROM, false)).toBe('near')
    expect(tractionLevel(0.99, false)).toBe('near')
    expect(tractionLevel(0.5, true)).toBe('beyond')
    expect(tractionLevel(1, false)).toBe('beyond')
  })

  it('says the share in words', () => {
    expect(tractionText({ level: 'near', share: 0.874 })).toBe('uses 87 % of the available grip (near the limit)')
    const at = tractionFromOverlay({ utilisation: [[0.2, 1.3]], spin: [[false, true]] })
    expect(at(0, 1)).toEqual({ level: 'beyond', share: 1.3 })
    expect(at(1, 0)).toBeNull()
  })

  // Thresholds from WCAG 2.1: 4.5:1 for text (1.4.3), 3:1 for graphical objects (1.4.11).
  it('glyphs read at ≥ 4.5:1 on the chip, and the chip edge shows at ≥ 3:1 on every torque colour', () => {
    for (const s of Object.values(TRACTION_STYLE)) expect(contrast(s.colour, CHIP_FILL)).toBeGreaterThanOrEqual(4.5)
    const scale = colourScale([[0, 1000]])
    for (let v = 0; v <= 1000; v += 10) {
      const bg = parse(scale.colour(v))
      expect(Math.max(contrast(CHIP_FILL, bg), contrast(CHIP_RING, bg))).toBeGreaterThanOrEqual(3)
    }
    // The two glyph colours differ from each other at a glance (not only by hue): distinct glyphs too.
    expect(TRACTION_STYLE.near.glyph).not.toBe(TRACTION_STYLE.beyond.glyph)
  })
})
