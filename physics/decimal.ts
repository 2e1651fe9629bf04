/** Strict decimal parsing shared by the map formats (maps/) and the drive-log reader. */

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
