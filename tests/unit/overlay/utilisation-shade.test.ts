import { describe, expect, it } from 'vitest'
import { shadeFromOverlay, SHADE_FROM, utilisationShade } from '@/app/_components/plots/utilisation-shade'

describe('utilisationShade', () => {
  it('leaves low grip use unshaded, washes amber towards the limit and marks spin red', () => {
    expect(utilisationShade(0, false)).toBeNull()
    expect(utilisationShade(SHADE_FROM - 0.01, false)).toBeNull()
    expect(utilisationShade(SHADE_FROM, false)).toBe('rgba(217, 119, 6, 0.12)')
    expect(utilisationShade(1, false)).toBe('rgba(217, 119, 6, 0.47)')
    expect(utilisationShade(1.3, true)).toBe('rgba(180, 35, 24, 0.55)')
    expect(utilisationShade(NaN, false)).toBeNull()
  })

  it('gets deeper as the cell nears the limit', () => {
    const alpha = (u: number) => Number(/([\d.]+)\)$/.exec(utilisationShade(u, false) ?? '')?.[1])
    expect(alpha(0.9)).toBeGreaterThan(alpha(0.7))
  })

  it('builds a cellShade(row, col) function from an overlay and answers null outside it', () => {
    const shade = shadeFromOverlay({ utilisation: [[0.2, 0.95]], spin: [[false, false]] })
    expect(shade(0, 0)).toBeNull()
    expect(shade(0, 1)).toMatch(/^rgba\(217/)
    expect(shade(3, 3)).toBeNull()
  })
})
