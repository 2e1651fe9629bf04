/**
 * A sequential colour scale for torque: pale sand for little torque through green-teal to deep
 * slate blue for the most, so the eye reads "more" as "darker" and hot spots stand out without
 * a rainbow. Stops are interpolated in RGB; the scale is our own choice.
 */
const STOPS: [number, number, number][] = [
  [247, 244, 230],
  [205, 230, 196],
  [120, 192, 168],
  [46, 128, 146],
  [36, 64, 110],
]

export interface ColourScale {
  min: number
  max: number
  /** Background colour for a value. */
  colour: (v: number) => string
  /** True when text on that background should be light. */
  dark: (v: number) => boolean
  /** The text colour for a value's cell: white on dark colours, near black on light ones. */
  text: (v: number) => string
  /** CSS gradient of the whole scale, for the legend. */
  gradient: string
}

const rgb = ([r, g, b]: [number, number, number]) => `rgb(${r}, ${g}, ${b})`

/**
 * Text on the light end of the scale. Black, because only black and white together guarantee 4.5:1
 * on every background: where the two tie, the ratio is 4.58:1; any lighter dark text ties below 4.5.
 */
export const CELL_TEXT: [number, number, number] = [0, 0, 0]
const WHITE: [number, number, number] = [255, 255, 255]

/** Relative luminance of an sRGB colour (WCAG 2.1, "relative luminance"). */
export function luminance([r, g, b]: [number, number, number]): number {
  const lin = (c: number) => (c / 255 <= 0.04045 ? c / 255 / 12.92 : ((c / 255 + 0.055) / 1.055) ** 2.4)
  return 0.2126 * lin(r) + 0.7152 * lin(g) + 0.0722 * lin(b)
}

/** Contrast ratio of two colours, 1 to 21 (WCAG 2.1, "contrast ratio"). */
export function contrast(a: [number, number, number], b: [number, number, number]): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x)
  return (hi + 0.05) / (lo + 0.05)
}

function at(t: number): [number, number, number] {
  const x = Math.min(1, Math.max(0, t)) * (STOPS.length - 1)
  const i = Math.min(STOPS.length - 2, Math.floor(x))
  const f = x - i
  const [a, b] = [STOPS[i], STOPS[i + 1]]
  return [0, 1, 2].map((k) => Math.round(a[k] + (b[k] - a[k]) * f)) as [number, number, number]
}

/**
 * A scale from 0 (or the lowest value) to `ceiling`, normally the motor peak torque, so colours
 * mean the same thing across maps and do not shift while one wild value is being typed in;
 * values above it take the darkest colour. Without a ceiling the scale spans the table's values.
 */
export function colourScale(values: number[][], ceiling?: number): ColourScale {
  let min = 0
  let max = 0
  for (const row of values) for (const v of row) if (Number.isFinite(v)) [min, max] = [Math.min(min, v), Math.max(max, v)]
  if (ceiling !== undefined && ceiling > 0) max = ceiling
  const span = max - min || 1
  const t = (v: number) => (v - min) / span
  // White text only where it reads better than the dark text: a fixed cut-off put white on mid teal
  // at 3.2:1, below the 4.5:1 that WCAG 2.1 AA asks for small text.
  const dark = (v: number) => Number.isFinite(v) && contrast(at(t(v)), WHITE) > contrast(at(t(v)), CELL_TEXT)
  return {
    min,
    max,
    colour: (v) => (Number.isFinite(v) ? rgb(at(t(v))) : '#fde2e1'),
    dark,
    text: (v) => rgb(dark(v) ? WHITE : CELL_TEXT),
    gradient: `linear-gradient(to right, ${STOPS.map(rgb).join(', ')})`,
  }
}
