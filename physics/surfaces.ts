/** Road surfaces: Magic Formula coefficient sets for pure longitudinal slip. */
import type { MagicFormulaCoeffs } from './tyre'

/** Surface ids in display order, e.g. for `z.enum(SURFACE_IDS)`. @example SURFACE_IDS[0] // 'dry-asphalt' */
export const SURFACE_IDS = Object.freeze(['dry-asphalt', 'wet-asphalt', 'gravel', 'packed-snow', 'ice'] as const)
export type SurfaceId = (typeof SURFACE_IDS)[number]

/** One surface: Magic Formula coefficients, the peak friction coefficient μ and where the numbers come from. */
export interface Surface {
  id: SurfaceId
  label: string
  coeffs: MagicFormulaCoeffs
  /** Peak Fx/Fz; for C > 1 the formula's peak equals D. */
  peakMu: number
  source: string
}

const TABLE_SOURCE =
  'Magic Formula coefficient set after Pacejka (Tire and Vehicle Dynamics), as widely reproduced in public ' +
  'tyre-road interaction documentation (see docs/physics.md, Sources). Values recalled from memory and not ' +
  're-checked against a primary table while writing this module. Peak μ = D because C > 1.'

/**
 * The surfaces the notebook offers. Truck tyres are not passenger-car tyres: treat these as
 * representative shapes, and scale D to a measured μ where one exists.
 * @example SURFACES['dry-asphalt'].coeffs // { B: 10, C: 1.9, D: 1, E: 0.97 }
 */
export const SURFACES: Readonly<Record<SurfaceId, Surface>> = Object.freeze({
  'dry-asphalt': { id: 'dry-asphalt', label: 'Dry asphalt', coeffs: { B: 10, C: 1.9, D: 1, E: 0.97 }, peakMu: 1, source: TABLE_SOURCE },
  'wet-asphalt': { id: 'wet-asphalt', label: 'Wet asphalt', coeffs: { B: 12, C: 2.3, D: 0.82, E: 1 }, peakMu: 0.82, source: TABLE_SOURCE },
  gravel: {
    id: 'gravel',
    label: 'Gravel',
    coeffs: { B: 9.6, C: 1.5, D: 0.6, E: 0.7 },
    peakMu: 0.6,
    source:
      'Fitted in this module: peak μ 0.6 and sliding μ 0.55 (at κ = 1) from the road-adhesion table in Wong, ' +
      'Theory of Ground Vehicles, ch. 1 (values recalled from memory). D = 0.6; C = 1.5 and a peak slip of 0.3 ' +
      '(typical of loose surfaces) were chosen, then B and E fitted so that Fx/Fz(1) ≈ 0.55. Not a measured tyre.',
  },
  'packed-snow': { id: 'packed-snow', label: 'Packed snow', coeffs: { B: 5, C: 2, D: 0.3, E: 1 }, peakMu: 0.3, source: TABLE_SOURCE },
  ice: { id: 'ice', label: 'Ice', coeffs: { B: 4, C: 2, D: 0.1, E: 1 }, peakMu: 0.1, source: TABLE_SOURCE },
})

for (const s of Object.values(SURFACES)) { Object.freeze(s.coeffs); Object.freeze(s) }

/** The label of a stored surface id, or the id itself when it is unknown (old rows). @example surfaceLabel('ice') // 'Ice' */
export function surfaceLabel(id: string): string {
  return (SURFACE_IDS as readonly string[]).includes(id) ? SURFACES[id as SurfaceId].label : id
}
