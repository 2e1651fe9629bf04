/**
 * Display units, one module for the grid, the plots and the finding messages. Tables are always
 * stored in N·m and km/h; the display converts on the way out (and typed values on the way back
 * in) with the exact factors of physics/units.ts, so a unit switch never changes a stored number.
 */
import { kmhToMph, lbfFtToNm, mphToKmh, nmToLbfFt } from '../physics/units'

export const UNIT_SYSTEMS = ['metric', 'imperial'] as const
export type UnitSystem = (typeof UNIT_SYSTEMS)[number]

export interface UnitSet {
  system: UnitSystem
  /** Unit labels as shown. */
  torque: string
  speed: string
  /** Stored N·m → shown torque, and back. */
  torqueOut: (nm: number) => number
  torqueIn: (shown: number) => number
  /** Stored km/h → shown speed, and back. */
  speedOut: (kmh: number) => number
  speedIn: (shown: number) => number
}

const same = (v: number) => v

export const UNITS: Readonly<Record<UnitSystem, UnitSet>> = {
  metric: { system: 'metric', torque: 'N·m', speed: 'km/h', torqueOut: same, torqueIn: same, speedOut: same, speedIn: same },
  imperial: { system: 'imperial', torque: 'lbf·ft', speed: 'mph', torqueOut: nmToLbfFt, torqueIn: lbfFtToNm, speedOut: kmhToMph, speedIn: mphToKmh },
}

/** A unit system from a query value; anything else is metric. @example unitSystem('imperial') // 'imperial' */
export const unitSystem = (v: string | null | undefined): UnitSystem => (v === 'imperial' ? 'imperial' : 'metric')
