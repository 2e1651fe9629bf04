/**
 * Number ↔ text, two ways: exact (files must round-trip bit for bit) and human (messages).
 */

/**
 * Shortest text that reads back to the same double (ECMAScript `String(n)` already gives the
 * shortest round-trip digits). -0 is written as "-0" so even its sign survives a round trip.
 * @example formatExact(0.1) // "0.1";  formatExact(1e21) // "1e+21"
 */
export function formatExact(n: number): string {
  return Object.is(n, -0) ? '-0' : String(n)
}

// Plain decimal or scientific notation only: no hex, no "Infinity", no empty string, which
// `Number()` would silently accept (Number('') === 0 is exactly the silent error to avoid).
const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/

/**
 * Parse one cell strictly; `undefined` when the text is not a finite decimal number.
 * @example parseExact(' 12.5 ') // 12.5;  parseExact('abc') // undefined;  parseExact('1e999') // undefined
 */
export function parseExact(text: string): number | undefined {
  const s = text.trim()
  if (!DECIMAL.test(s)) return undefined
  const n = Number(s)
  return Number.isFinite(n) ? n : undefined
}

const human = new Intl.NumberFormat('en-US', { maximumFractionDigits: 1 })

/**
 * Number for messages: thousands separators, at most one decimal.
 * @example humanNumber(2400) // "2,400";  humanNumber(12.345) // "12.3"
 */
export function humanNumber(n: number): string {
  return Number.isFinite(n) ? human.format(n) : String(n)
}

/**
 * Which pedal row, in the words a calibration engineer uses.
 * @example rowLabel('regen', 0) // "at 0 % brake pedal (lift-off)"
 */
export function rowLabel(kind: 'drive' | 'regen', pedalPct: number): string {
  const pedal = kind === 'regen' ? (pedalPct === 0 ? 'brake pedal (lift-off)' : 'brake pedal') : 'pedal'
  return `at ${humanNumber(pedalPct)} % ${pedal}`
}

/**
 * Where a cell is.
 * @example cellLabel('drive', 40, 20) // "at 40 % pedal, 20 km/h"
 *          cellLabel('regen', 0, 60)  // "at 0 % brake pedal (lift-off), 60 km/h"
 */
export function cellLabel(kind: 'drive' | 'regen', pedalPct: number, speedKmh: number): string {
  return `${rowLabel(kind, pedalPct)}, ${humanNumber(speedKmh)} km/h`
}
