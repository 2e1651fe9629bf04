import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { ingestLogText } from '@/app/_lib/reports/log-ingest'
import { LogFormatError, createLogAnalyser } from '@/physics'
import { HEADER, sample } from './helpers'

function caught(f: () => unknown): LogFormatError {
  try { f() } catch (e) { if (e instanceof LogFormatError) return e; throw e }
  throw new Error('expected a LogFormatError')
}

describe('typed errors with line and column', () => {
  it('a cell that is not a number: line and 1-based column index with its header', () => {
    const e = caught(() => ingestLogText(`${HEADER}\n0,10,10,5\n0.02,10,ten,5\n`))
    expect(e).toMatchObject({ code: 'row', line: 3, column: { index: 3, name: 'wheel_speed_kmh' } })
    expect(e.message).toBe('line 3, column 3 (wheel_speed_kmh): "ten" is not a number')
  })
  it('time going backwards (error with the line); equal timestamps are allowed and counted', () => {
    const e = caught(() => ingestLogText(`${HEADER}\n0,10,10,5\n0.5,10,10,5\n0.5,10,10,5\n0.4,10,10,5\n`))
    expect(e).toMatchObject({ code: 'time-order', line: 5, column: { index: 1, name: 'time_s' } })
    expect(ingestLogText(`${HEADER}\n0,10,10,5\n0.5,10,10,5\n0.5,10,10,5\n`).duplicateTimestamps).toBe(1)
  })
  it('a missing time, a wrong field count, broken quoting', () => {
    expect(caught(() => ingestLogText(`${HEADER}\n,10,10,5\n`))).toMatchObject({ line: 2, column: { index: 1 } })
    expect(caught(() => ingestLogText(`${HEADER}\n0,10,10\n`))).toMatchObject({ line: 2, column: { index: 4, name: 'accel_pedal_pct' } })
    expect(caught(() => ingestLogText(`${HEADER}\n0,10,10,5,9\n`))).toMatchObject({ line: 2, column: { index: 5 } })
    expect(caught(() => ingestLogText(`${HEADER}\n0,10,10,5\n"1,10,10,5\n`))).toMatchObject({ code: 'row', line: 3 })
  })
  it('empty cells and NaN in optional columns are missing values; blank lines are skipped but counted', () => {
    const r = ingestLogText(`${HEADER},brake_pedal_pct,battery_current_a\n0,10,10,5,,NaN\n\n0.1,10,10,5,3,\n0.2,10,10,NaN,3,1\n`)
    expect(r.samples).toBe(3)
    expect(r.incompleteSamples).toBe(1)
    expect(r.energy).toBeNull()
    expect(caught(() => ingestLogText(`${HEADER}\n0,10,10,5\n\n0.1,x,10,5\n`)).line).toBe(4)
  })
  it('not CSV: NUL bytes, no delimiter, control characters in the header; empty and header-only logs', () => {
    expect(caught(() => ingestLogText('PK\u0003\u0004\u0000\u0000binary')).code).toBe('not-csv')
    expect(caught(() => ingestLogText('just some words\nmore words\n')).code).toBe('not-csv')
    expect(caught(() => ingestLogText('a\u0001b,c\n1,2\n')).code).toBe('not-csv')
    expect(caught(() => ingestLogText('')).code).toBe('empty')
    expect(caught(() => ingestLogText(`${HEADER}\n`)).code).toBe('empty')
  })
  it('the analyser refuses a non-finite time and time going backwards with the sample line', () => {
    const a = createLogAnalyser({ timeColumn: { index: 1, name: 'time_s' } })
    a.push(sample(1, { line: 7 }))
    expect(caught(() => a.push(sample(0.5, { line: 8 })))).toMatchObject({ code: 'time-order', line: 8, column: { index: 1, name: 'time_s' } })
    expect(caught(() => createLogAnalyser().push(sample(NaN)))).toMatchObject({ line: 2 })
  })
})

describe('property: garbage never throws anything but LogFormatError, and never hangs', () => {
  const cell = fc.oneof(fc.constant(''), fc.constant('NaN'), fc.double().map(String), fc.integer().map(String), fc.string({ maxLength: 6 }), fc.constantFrom('"', '""', '\r', '\n', ',', '\u0000', 'é', '1e999', '0x1f'))
  const expectOnlyLogErrors = (text: string) => {
    try {
      const r = ingestLogText(text, { map: { rowAxis: [0, 100], colAxis: [0, 50] } })
      expect(r.samples).toBeGreaterThan(0)
    } catch (e) {
      if (!(e instanceof LogFormatError)) throw e
      expect(e.line).toBeGreaterThanOrEqual(0)
    }
  }
  it('arbitrary text', () => {
    fc.assert(fc.property(fc.string({ maxLength: 300, unit: 'binary' }), expectOnlyLogErrors), { numRuns: 500 })
  })
  it('a valid header followed by random rows of random cells', () => {
    fc.assert(fc.property(fc.array(fc.array(cell, { minLength: 0, maxLength: 6 }), { maxLength: 30 }), fc.constantFrom('\n', '\r\n'), (rows, eol) => {
      expectOnlyLogErrors([HEADER, ...rows.map((r) => r.join(','))].join(eol))
    }), { numRuns: 500 })
  })
  it('a valid log with random bytes overwritten', () => {
    const good = [HEADER, ...Array.from({ length: 40 }, (_, i) => `${i / 50},${30 + i},${31 + i},${i}`)].join('\n')
    fc.assert(fc.property(fc.array(fc.tuple(fc.nat(good.length - 1), fc.string({ minLength: 1, maxLength: 3 })), { maxLength: 5 }), (edits) => {
      let t = good
      for (const [at, s] of edits) t = t.slice(0, at) + s + t.slice(at + s.length)
      expectOnlyLogErrors(t)
    }), { numRuns: 500 })
  })
})
