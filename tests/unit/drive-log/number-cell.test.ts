import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { NOT_A_NUMBER, parseLogNumber } from '@/physics'

describe('parseLogNumber', () => {
  it('parses decimals exactly like Number()', () => {
    for (const s of ['0', '-0', '12.5', '-12.50', '.5', '5.', '0001.250', ' 7 ', '1e3', '-2.5E-3', '+4', '123456789012345678', '0.1', '9007199254740993'])
      expect(Object.is(parseLogNumber(s), Number(s))).toBe(true)
  })
  it('property: any double printed by toString / toFixed parses back to Number(s)', () => {
    fc.assert(fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), fc.integer({ min: 0, max: 12 }), (x, d) => {
      for (const s of [String(x), Math.abs(x) < 1e21 ? x.toFixed(d) : String(x)]) expect(Object.is(parseLogNumber(s), Number(s))).toBe(true)
    }), { numRuns: 2000 })
  })
  it('empty and NaN cells are missing (NaN); anything else that is not a finite decimal is refused', () => {
    for (const s of ['', '  ', 'NaN', 'nan', '\r']) expect(Number.isNaN(parseLogNumber(s))).toBe(true)
    for (const s of ['0x10', '0b1', 'Infinity', '-Infinity', '1e400', '1,5', '12 km/h', '-', '.', '+.', '1.2.3', 'abc', '1e', '--1', '١٢'])
      expect(parseLogNumber(s)).toBe(NOT_A_NUMBER)
  })
})
