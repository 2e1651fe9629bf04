/**
 * The traction shading as marks on the grid's cells, not a wash over the torque colours: a wash
 * mixes with the colour scale until amber over teal reads as neither. Each cell beyond a share of
 * the available grip gets a small chip with a glyph, its own colours, and its share in words.
 */
import { SHADE_FROM } from '@/app/_components/plots/utilisation-shade'

export type TractionLevel = 'margin' | 'near' | 'beyond'

/** One cell's traction as the grid shows it: its share of the available grip (1 = the tyre's peak). */
export interface CellTraction {
  level: TractionLevel
  share: number
}

/** From this share of the grip a cell counts as near the limit (the overlay plots use the same threshold). */
export const NEAR_FROM = SHADE_FROM

/**
 * The level of a cell from its share of the grip and whether the physics puts it beyond the peak.
 * @example tractionLevel(0.3, false) // 'margin'
 * @example tractionLevel(0.8, false) // 'near'
 * @example tractionLevel(1.2, true) // 'beyond'
 */
export function tractionLevel(share: number, beyond: boolean): TractionLevel {
  if (beyond || share >= 1) return 'beyond'
  return share >= NEAR_FROM ? 'near' : 'margin'
}

/**
 * Chip colours: a white chip with a black ring, so against any torque colour one of the two
 * edges stands out (black and white together give ≥ 4.58:1 on every background, see
 * colour-scale.ts), and a glyph whose colour is ≥ 4.5:1 on the white chip.
 */
export const TRACTION_STYLE: Record<Exclude<TractionLevel, 'margin'>, { glyph: string; colour: [number, number, number]; label: string }> = {
  near: { glyph: '▲', colour: [146, 64, 14], label: 'near the limit' },
  beyond: { glyph: '✕', colour: [180, 35, 24], label: 'beyond the tyre peak' },
}
export const CHIP_FILL: [number, number, number] = [255, 255, 255]
export const CHIP_RING: [number, number, number] = [0, 0, 0]

/** The hover and screen-reader sentence of a cell, e.g. "uses 87 % of the available grip (near the limit)". */
export function tractionText(t: CellTraction): string {
  const pct = Math.round(t.share * 100)
  const what = t.level === 'margin' ? 'within margin' : TRACTION_STYLE[t.level].label
  return `uses ${pct} % of the available grip (${what})`
}

/** A per-cell lookup for the grid from the overlay's utilisation and beyond-peak grids. */
export function tractionFromOverlay(o: { utilisation: number[][]; spin: boolean[][] }): (row: number, col: number) => CellTraction | null {
  return (row, col) => {
    const share = o.utilisation[row]?.[col]
    if (share === undefined || !Number.isFinite(share)) return null
    return { share, level: tractionLevel(share, o.spin[row]?.[col] ?? false) }
  }
}
