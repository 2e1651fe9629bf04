// The one ingest path (record parser → record decoder, numbers read in place) must read every line exactly
// as the cells decoder reads the same line split at the delimiter.
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { createRecordParser } from '@/app/_lib/reports/log-ingest/record-parser'
import { createRecordDecoder, createRowDecoder, resolveLogHeader, type LogSample } from '@/physics'

const HEAD = ['time_s', 'road_speed_kmh', 'note', 'wheel_speed_left_kmh', 'wheel_speed_right_kmh', 'accel_pedal_pct', 'battery_current_a']
const layout = resolveLogHeader(HEAD)

function outcome(f: () => LogSample): unknown {
  try { const s = f(); return { ...s, wheelSpeedsKmh: [...s.wheelSpeedsKmh] } } catch (e) { return String(e) }
}

/** Parses one line with the record parser and decodes it with the record decoder. */
function viaParser(text: string, d: string, line: number): LogSample {
  const decode = createRecordDecoder(layout)
  let out: LogSample | null = null
  const p = createRecordParser(d, '\n', (t, s, e, n) => { out = decode(t, s, e, n, line) })
  p.push(text)
  p.end()
  if (!out) throw new Error('no record')
  return out
}

describe('record parser + record decoder ≡ cells decoder(line.split(delimiter))', () => {
  const cell = fc.oneof(
    fc.double({ noNaN: true, noDefaultInfinity: true }).map(String),
    fc.double({ min: -1000, max: 1000, noNaN: true }).chain((x) => fc.integer({ min: 0, max: 6 }).map((d) => x.toFixed(d))),
    fc.constantFrom('', ' ', 'NaN', '-', '.', '1e3', '+2', ' 4 ', '0x1', 'abc', '12345678901234567', '\r', '1.2.3', '-0'),
  )
  it.each([',', ';', '\t'])('for random cells with delimiter %j', (d) => {
    const fromFields = createRowDecoder(layout)
    fc.assert(fc.property(fc.array(cell, { minLength: 5, maxLength: 9 }), (cells) => {
      const text = cells.join(d)
      expect(outcome(() => viaParser(text, d, 9))).toEqual(outcome(() => fromFields(text.split(d), 9)))
    }), { numRuns: 3000 })
  })
  it('reads a typical line', () => {
    const s = viaParser('12.340,55.20,"ignored",56.1,55.3,31.5,-120.5', ',', 4)
    expect([s.timeS, s.roadSpeedKmh, ...s.wheelSpeedsKmh, s.accelPedalPct, s.batteryCurrentA, s.line]).toEqual([12.34, 55.2, 56.1, 55.3, 31.5, -120.5, 4])
  })
})
