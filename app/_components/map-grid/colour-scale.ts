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
  /** CSS gradient of the whole scale, for the legend. */
  gradient: string
}

const rgb = ([r, g, b]: [number, number, number]) => `rgb(${r}, ${g}, ${b})`

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
  return {
    min,
    max,
    colour: (v) => (Number.isFinite(v) ? rgb(at(t(v))) : '#fde2e1'),
    dark: (v) => Number.isFinite(v) && t(v) > 0.6,
    gradient: `linear-gradient(to right, ${STOPS.map(rgb).join(', ')})`,
  }
}
