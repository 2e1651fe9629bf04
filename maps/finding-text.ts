/**
 * Finding sentences as data: text with the quantities kept as numbers in SI units (N·m, km/h),
 * rendered for a unit system by one function. The stored message is the metric rendering.
 */
import { humanNumber } from './number-format'
import type { MapKind } from './table'
import { UNITS, type UnitSet } from './units'

/** A quantity inside a sentence; `bare` prints the number without its unit (the first of a range). */
export interface Quantity {
  value: number
  unit: 'N·m' | 'km/h'
  bare?: true
}

export type MessagePart = string | Quantity

/** N·m in a sentence. */
export const nm = (value: number): Quantity => ({ value, unit: 'N·m' })
/** km/h in a sentence; `bare` for the first number of a range ("between 20 and 40 km/h"). */
export const kmh = (value: number, bare = false): Quantity => (bare ? { value, unit: 'km/h', bare } : { value, unit: 'km/h' })

type Piece = MessagePart | readonly MessagePart[] | number

/**
 * A sentence from a template: numbers are written with humanNumber, quantities kept as data.
 * @example sentence`${nm(2400)} exceeds ${nm(1500)}` // [{ value: 2400, unit: 'N·m' }, ' exceeds ', { value: 1500, unit: 'N·m' }]
 */
export function sentence(text: TemplateStringsArray, ...pieces: Piece[]): MessagePart[] {
  const out: MessagePart[] = []
  const push = (p: MessagePart) => {
    const last = out[out.length - 1]
    if (typeof p === 'string' && typeof last === 'string') out[out.length - 1] = last + p
    else if (p !== '') out.push(p)
  }
  text.forEach((t, i) => {
    push(t)
    if (i >= pieces.length) return
    const p = pieces[i]
    if (typeof p === 'number') push(humanNumber(p))
    else if (Array.isArray(p)) (p as readonly MessagePart[]).forEach(push)
    else push(p as MessagePart)
  })
  return out
}

/**
 * The sentence in a unit system; the one place a finding's numbers meet display units.
 * @example renderParts(sentence`${nm(9999)} exceeds`, UNITS.imperial) // "7,374.9 lbf·ft exceeds"
 */
export function renderParts(parts: readonly MessagePart[], units: UnitSet = UNITS.metric): string {
  return parts
    .map((p) => {
      if (typeof p === 'string') return p
      const speed = p.unit === 'km/h'
      const shown = humanNumber(speed ? units.speedOut(p.value) : units.torqueOut(p.value))
      return p.bare ? shown : `${shown} ${speed ? units.speed : units.torque}`
    })
    .join('')
}

/** The pedal word of a map kind. */
export const pedalWord = (kind: MapKind): string => (kind === 'regen' ? 'brake pedal' : 'pedal')

/**
 * Which pedal row, in the words a calibration engineer uses.
 * @example renderParts(rowLabel('regen', 0)) // "at 0 % brake pedal (lift-off)"
 */
export function rowLabel(kind: MapKind, pedalPct: number): MessagePart[] {
  const pedal = kind === 'regen' && pedalPct === 0 ? 'brake pedal (lift-off)' : pedalWord(kind)
  return [`at ${humanNumber(pedalPct)} % ${pedal}`]
}

/**
 * Where a cell is.
 * @example renderParts(cellLabel('drive', 40, 20)) // "at 40 % pedal, 20 km/h"
 */
export function cellLabel(kind: MapKind, pedalPct: number, speedKmh: number): MessagePart[] {
  return sentence`${rowLabel(kind, pedalPct)}, ${kmh(speedKmh)}`
}
