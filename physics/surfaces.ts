/**
 * Road surfaces. A surface sets the grip, its peak friction coefficient μ; the drive tyre's slip
 * stiffness and shape come from the vehicle program (physics/drive-tyre.ts), so the tyre is as stiff on
 * ice as on asphalt and only the height of its curve changes. Each row also keeps the passenger-car
 * Magic Formula set it came from, a published reference for the tyre-machinery checks; the truck
 * physics does not use those curves.
 */
import type { MagicFormulaCoeffs } from './tyre'

/** Surface ids in display order, e.g. for `z.enum(SURFACE_IDS)`. @example SURFACE_IDS[0] // 'dry-asphalt' */
export const SURFACE_IDS = Object.freeze(['dry-asphalt', 'wet-asphalt', 'gravel', 'packed-snow', 'ice'] as const)
export type SurfaceId = (typeof SURFACE_IDS)[number]

/** One surface: its peak friction coefficient μ, where it comes from, and the reference passenger-car curve. */
export interface Surface {
  id: SurfaceId
  label: string
  /** Peak Fx/Fz of a tyre at its nominal load on this surface; scales the program's drive-tyre curve. */
  peakMu: number
  /** The passenger-car Magic Formula set the peak μ was taken from (its D); reference only. */
  passengerCarCoeffs: MagicFormulaCoeffs
  source: string
}

const TABLE_SOURCE =
  'Peak μ = D of the Magic Formula coefficient set after Pacejka (Tire and Vehicle Dynamics), as widely reproduced ' +
  'in public tyre-road interaction documentation (see docs/physics.md, Sources); recalled from memory and not ' +
  're-checked against a primary table. Wong (Theory of Ground Vehicles, ch. 1, road-adhesion table, recalled from ' +
  'memory) gives dry asphalt 0.8–0.9, wet 0.5–0.7, packed snow 0.2 and ice 0.1: the values here are kept so stored ' +
  'parameter versions judge as before; a measured μ for the site should replace them.'

/**
 * The surfaces the notebook offers.
 * @example SURFACES['packed-snow'].peakMu // 0.3
 */
export const SURFACES: Readonly<Record<SurfaceId, Surface>> = Object.freeze({
  'dry-asphalt': { id: 'dry-asphalt', label: 'Dry asphalt', peakMu: 1, passengerCarCoeffs: { B: 10, C: 1.9, D: 1, E: 0.97 }, source: TABLE_SOURCE },
  'wet-asphalt': { id: 'wet-asphalt', label: 'Wet asphalt', peakMu: 0.82, passengerCarCoeffs: { B: 12, C: 2.3, D: 0.82, E: 1 }, source: TABLE_SOURCE },
  gravel: {
    id: 'gravel',
    label: 'Gravel',
    peakMu: 0.6,
    passengerCarCoeffs: { B: 9.6, C: 1.5, D: 0.6, E: 0.7 },
    source:
      'Peak μ 0.6 (sliding μ 0.55) from the road-adhesion table in Wong, Theory of Ground Vehicles, ch. 1 (values ' +
      'recalled from memory). The reference curve was fitted in this module: D = 0.6, C = 1.5 and a peak slip of 0.3 ' +
      '(typical of loose surfaces) chosen, then B and E fitted so that Fx/Fz(1) ≈ 0.55. Not a measured tyre.',
  },
  'packed-snow': { id: 'packed-snow', label: 'Packed snow', peakMu: 0.3, passengerCarCoeffs: { B: 5, C: 2, D: 0.3, E: 1 }, source: TABLE_SOURCE },
  ice: { id: 'ice', label: 'Ice', peakMu: 0.1, passengerCarCoeffs: { B: 4, C: 2, D: 0.1, E: 1 }, source: TABLE_SOURCE },
})

for (const s of Object.values(SURFACES)) { Object.freeze(s.passengerCarCoeffs); Object.freeze(s) }

/** The label of a stored surface id, or the id itself when it is unknown (old rows). @example surfaceLabel('ice') // 'Ice' */
export function surfaceLabel(id: string): string {
  return (SURFACE_IDS as readonly string[]).includes(id) ? SURFACES[id as SurfaceId].label : id
}
