/**
 * Number ↔ text, the one set of formatters: exact (files must round-trip bit for bit), human
 * (messages and labels), cell (grid text that pastes back into a spreadsheet) and table (figures
 * where a missing value shows as a dash).
 */

/**
 * Shortest text that reads back to the same double (ECMAScript `String(n)` already gives the
 * shortest round-trip digits). -0 is written as "-0" so even its sign survives a round trip.
 * @example formatExact(0.1) // "0.1";  formatExact(1e21) // "1e+21"
 */
export function formatExact(n: number): string {
  return Object.is(n, -0) ? '-0' : String(n)
}

export { parseExact } from '../physics/decimal'

const formats = new Map<string, Intl.NumberFormat>()
function format(n: number, digits: number, grouping: boolean): string {
  const key = `${digits}:${grouping}`
  let f = formats.get(key)
  if (!f) formats.set(key, (f = new Intl.NumberFormat('en-US', { maximumFractionDigits: digits, useGrouping: grouping })))
  return f.format(n)
}

/**
 * Number for messages and labels: thousands separators, at most `digits` decimals (default 1).
 * @example humanNumber(2400) // "2,400";  humanNumber(12.345) // "12.3"
 */
export function humanNumber(n: number, digits = 1): string {
  return Number.isFinite(n) ? format(n, digits, true) : String(n)
}

/**
 * Number for a grid cell: no grouping, at most one decimal, so a copied block pastes back into any spreadsheet as numbers.
 * @example cellNumber(7374.93) // "7374.9"
 */
export function cellNumber(n: number): string {
  return Number.isFinite(n) ? format(n, 1, false) : String(n)
}

/**
 * Number for tables of figures: like humanNumber, but a missing (non-finite) value is a dash.
 * @example tableNumber(1234.56, 0) // "1,235";  tableNumber(NaN) // "—"
 */
export function tableNumber(n: number, digits = 1): string {
  return Number.isFinite(n) ? format(n, digits, true) : '—'
}
