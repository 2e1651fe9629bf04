/**
 * Cell shading for the physics overlay in the grid editor (its `cellShade(row, col)` prop): cells
 * that use little of the grip stay unshaded so the torque colours still read, cells nearing the
 * limit get an amber wash that deepens towards it, and cells beyond the tyre's peak get red.
 * Translucent colours, so the grid's own background shows through. Pure; safe in the browser.
 */

/** Below this share of the available grip a cell is left unshaded. */
export const SHADE_FROM = 0.6

/** Amber of the "close to the limit" wash and red of "beyond the peak" (our own choice, matching the plots). */
const AMBER = '217, 119, 6'
const RED = '180, 35, 24'

/**
 * A CSS colour for a cell, or null for none.
 * @example utilisationShade(0.3, false) // null
 * @example utilisationShade(0.95, false) // 'rgba(217, 119, 6, 0.43)'
 * @example utilisationShade(1.4, true) // 'rgba(180, 35, 24, 0.55)'
 */
export function utilisationShade(utilisation: number, spin: boolean): string | null {
  if (spin) return `rgba(${RED}, 0.55)`
  if (!Number.isFinite(utilisation) || utilisation < SHADE_FROM) return null
  const t = Math.min(1, (utilisation - SHADE_FROM) / (1 - SHADE_FROM))
  return `rgba(${AMBER}, ${(0.12 + 0.35 * t).toFixed(2)})`
}

/** The overlay fields the shading reads, as the overlay route returns them. */
export interface ShadeSource {
  utilisation: number[][]
  spin: boolean[][]
}

/**
 * A `cellShade(row, col)` function for a whole overlay.
 * @example <MapGrid cellShade={shadeFromOverlay(overlay)} />
 */
export function shadeFromOverlay(o: ShadeSource): (row: number, col: number) => string | null {
  return (row, col) => {
    const u = o.utilisation[row]?.[col]
    return u === undefined ? null : utilisationShade(u, o.spin[row]?.[col] ?? false)
  }
}
