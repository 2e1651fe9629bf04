// The in-place line decoder (streaming path) must read every line exactly as the cells decoder does.
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { createRowDecoders, resolveLogHeader, type LogSample } from '@/physics'

const HEAD = ['time_s', 'road_speed_kmh', 'note', 'wheel_speed_left_kmh', 'wheel_speed_right_kmh', 'accel_pedal_pct', 'battery_current_a']
const layout = resolveLogHeader(HEAD)

function outcome(f: () => LogSample): unknown {
  try { const s = f(); return { ...s, wheelSpeedsKmh: [...s.wheelSpeedsKmh] } } catch (e) { return String(e) }
}

describe('createRowDecoders: fromLine ≡ fromFields(line.split(delimiter))', () => {
  const cell = fc.oneof(
    fc.double({ noNaN: true, noDefaultInfinity: true }).map(String),
    fc.double({ min: -1000, max: 1000, noNaN: true }).chain((x) => fc.integer({ min: 0, max: 6 }).map((d) => x.toFixed(d))),
    fc.constantFrom('', ' ', 'NaN', '-', '.', '1e3', '+2', ' 4 ', '0x1', 'abc', '12345678901234567', '\r', '1.2.3', '-0'),
  )
  it.each([',', ';', '\t'])('for random cells with delimiter %j', (d) => {
    const { fromLine, fromFields } = createRowDecoders(layout, d)
    fc.assert(fc.property(fc.array(cell, { minLength: 5, maxLength: 9 }), (cells) => {
      const text = cells.join(d)
      expect(outcome(() => fromLine(text, 9))).toEqual(outcome(() => fromFields(text.split(d), 9)))
    }), { numRuns: 3000 })
  })
  it('reads a typical line', () => {
    const s = createRowDecoders(layout).fromLine('12.340,55.20,"ignored",56.1,55.3,31.5,-120.5', 4)
    expect([s.timeS, s.roadSpeedKmh, ...s.wheelSpeedsKmh, s.accelPedalPct, s.batteryCurrentA, s.line]).toEqual([12.34, 55.2, 56.1, 55.3, 31.5, -120.5, 4])
  })
})
