/**
 * Colour scales of the plots (our own choice): a sequential sand → teal → slate-blue for torque,
 * so "more" reads as "darker"; a diverging brick ↔ white ↔ teal for differences centred on zero;
 * a pale-to-amber-to-brown scale for slip, and one solid red for cells beyond the tyre's peak
 * (the same red as the grid shading in utilisation-shade.ts).
 */
type Scale = [number, string][]

export const TORQUE_SCALE: Scale = [
  [0, '#f7f4e6'],
  [0.25, '#cde6c4'],
  [0.5, '#78c0a8'],
  [0.75, '#2e8092'],
  [1, '#24406e'],
]

export const DIFF_SCALE: Scale = [
  [0, '#9f2a1f'],
  [0.25, '#e0a290'],
  [0.5, '#ffffff'],
  [0.75, '#8fcabd'],
  [1, '#0f6b5c'],
]

export const SLIP_SCALE: Scale = [
  [0, '#fbfaf3'],
  [0.2, '#f6e2a8'],
  [0.5, '#eeac4c'],
  [0.8, '#d97706'],
  [1, '#8a4b0f'],
]

export const BEYOND_PEAK = '#b42318'
export const LIMIT_COLOUR = '#b42318'
export const SOLID_BEYOND: Scale = [[0, BEYOND_PEAK], [1, BEYOND_PEAK]]
