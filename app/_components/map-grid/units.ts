/**
 * Display units of the editor. Tables are always stored in SI/metric (N·m, km/h, %); the
 * grid, plot and findings convert on the way out and typed values convert on the way back in,
 * so switching units never changes a stored number.
 */
import { kmhToMph, lbfFtToNm, mphToKmh, nmToLbfFt } from '@/physics/units'

export type UnitSystem = 'metric' | 'imperial'

export interface UnitSet {
  torque: string
  speed: string
  /** Stored N·m → shown torque. */
  torqueOut: (nm: number) => number
  /** Typed torque → stored N·m. */
  torqueIn: (shown: number) => number
  speedOut: (kmh: number) => number
  speedIn: (shown: number) => number
}

export const UNITS: Record<UnitSystem, UnitSet> = {
  metric: { torque: 'N·m', speed: 'km/h', torqueOut: (v) => v, torqueIn: (v) => v, speedOut: (v) => v, speedIn: (v) => v },
  imperial: { torque: 'lbf·ft', speed: 'mph', torqueOut: nmToLbfFt, torqueIn: lbfFtToNm, speedOut: kmhToMph, speedIn: mphToKmh },
}

const oneDecimal = new Intl.NumberFormat('en-US', { maximumFractionDigits: 1 })
const plain = new Intl.NumberFormat('en-US', { maximumFractionDigits: 1, useGrouping: false })

/** A number for labels and messages: thousands separators, at most one decimal. */
export function fmt(n: number): string {
  return Number.isFinite(n) ? oneDecimal.format(n) : String(n)
}

/** A number for a grid cell: no grouping, so a copied block pastes back into any spreadsheet as numbers. */
export function fmtCell(n: number): string {
  return Number.isFinite(n) ? plain.format(n) : String(n)
}

const NUM = String.raw`(-?\d[\d,]*(?:\.\d+)?)`
const parse = (s: string) => Number(s.replace(/,/g, ''))

/**
 * A finding message (written by maps/validate in N·m and km/h) in the chosen units. Ranges such
 * as "between 20 and 40 km/h" carry the unit once, after the second number, so they are
 * converted as a pair first.
 * @example toUnits('at 40 % pedal, 20 km/h: 2,400 N·m …', UNITS.imperial) // "at 40 % pedal, 12.4 mph: 1,770.2 lbf·ft …"
 */
export function toUnits(message: string, u: UnitSet): string {
  if (u === UNITS.metric) return message
  return message
    .replace(new RegExp(`${NUM}( and | to )${NUM} km/h`, 'g'), (_m, a: string, mid: string, b: string) => `${fmt(u.speedOut(parse(a)))}${mid}${fmt(u.speedOut(parse(b)))} ${u.speed}`)
    .replace(new RegExp(`${NUM} km/h`, 'g'), (_m, a: string) => `${fmt(u.speedOut(parse(a)))} ${u.speed}`)
    .replace(new RegExp(`${NUM} N·m`, 'g'), (_m, a: string) => `${fmt(u.torqueOut(parse(a)))} ${u.torque}`)
}
