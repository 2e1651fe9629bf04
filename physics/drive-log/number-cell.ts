/** Strict, fast decimal parse for log cells: one pass over the characters, no regular expression, no allocation. */

/** Returned by {@link parseLogNumber} for text that is not a decimal number. */
export const NOT_A_NUMBER = Number.NEGATIVE_INFINITY

// Exact powers of ten: a ≤ 15-digit integer mantissa divided by one of these is correctly rounded
// (both operands are exact doubles and IEEE division rounds once), so the fast path equals Number(s).
const POW10 = [1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22]

const isSpace = (c: number) => c === 32 || c === 9 || c === 13 || c === 10

/**
 * Parses a decimal such as `-12.5`, `3`, `.5`, `1e-3` (surrounding blanks allowed). Returns NaN for a
 * missing value (empty cell, or `NaN`/`nan`), {@link NOT_A_NUMBER} for anything else that is not a
 * finite decimal (hex, `Infinity`, `1,5`, `12 km/h` …).
 * @example parseLogNumber(' 12.50 ') // 12.5
 * @example parseLogNumber('') // NaN
 */
export function parseLogNumber(s: string): number {
  let i = 0
  let end = s.length
  while (i < end && isSpace(s.charCodeAt(i))) i++
  while (end > i && isSpace(s.charCodeAt(end - 1))) end--
  if (i === end) return NaN
  let c = s.charCodeAt(i)
  if (c === 78 || c === 110) return end - i === 3 && s.slice(i, end).toLowerCase() === 'nan' ? NaN : NOT_A_NUMBER
  const start = i
  let neg = false
  if (c === 45 || c === 43) { neg = c === 45; i++ }
  let mant = 0
  let digits = 0
  let frac = 0
  let sawDot = false
  let sawDigit = false
  for (; i < end; i++) {
    c = s.charCodeAt(i)
    if (c >= 48 && c <= 57) {
      sawDigit = true
      if (digits > 0 || c !== 48) digits++
      mant = mant * 10 + (c - 48)
      if (sawDot) frac++
    } else if (c === 46 && !sawDot) sawDot = true
    else break
  }
  if (!sawDigit) return NOT_A_NUMBER
  if (i === end) {
    if (digits <= 15 && frac <= 22) { const v = frac ? mant / POW10[frac] : mant; return neg ? -v : v }
    return Number(s.slice(start, end))
  }
  if (c !== 101 && c !== 69) return NOT_A_NUMBER
  i++
  if (i < end && (s.charCodeAt(i) === 45 || s.charCodeAt(i) === 43)) i++
  const expStart = i
  while (i < end && s.charCodeAt(i) >= 48 && s.charCodeAt(i) <= 57) i++
  if (i === expStart || i !== end) return NOT_A_NUMBER
  const v = Number(s.slice(start, end)) // exponent form: rare in logs, let the engine round it
  return Number.isFinite(v) ? v : NOT_A_NUMBER
}
