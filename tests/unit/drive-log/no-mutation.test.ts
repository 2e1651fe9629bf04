import { describe, expect, it } from 'vitest'
import { createLogAnalyser, resolveLogHeader, type LogAnalyserOptions, type LogSample } from '@/physics'
import { series } from './helpers'

function deepFreeze<T>(x: T): T {
  if (x && typeof x === 'object') { Object.values(x).forEach(deepFreeze); Object.freeze(x) }
  return x
}

describe('no mutation', () => {
  it('the analyser reads frozen options and samples and gives the same result as on copies', () => {
    const opts: LogAnalyserOptions = { map: { rowAxis: [0, 50, 100], colAxis: [0, 30, 60] }, surface: 'wet-asphalt', thresholds: { minDurationS: 0.05 } }
    const samples: LogSample[] = series(30, 0.02, (t) => ({ wheelSpeedsKmh: [36 * (1 + (t > 10 && t < 11 ? 0.4 : 0.01)), 36], batteryVoltageV: 600, batteryCurrentA: 50 }))
    const before = JSON.stringify([opts, samples])
    const frozen = deepFreeze(structuredClone({ opts, samples }))
    const a = createLogAnalyser(frozen.opts)
    frozen.samples.forEach((s) => a.push(s))
    const r1 = a.finish()
    const b = createLogAnalyser(opts)
    samples.forEach((s) => b.push(s))
    expect(r1).toEqual(b.finish())
    expect(JSON.stringify([opts, samples])).toBe(before)
    // The result owns its arrays: changing it does not reach the options.
    r1.occupancy!.rowAxis.push(1)
    expect(opts.map!.rowAxis).toEqual([0, 50, 100])
  })
  it('header resolution leaves the header and the mapping untouched', () => {
    const headers = deepFreeze([' T ', 'road_speed_kmh', 'wheel_speed_kmh', 'accel_pedal_pct'])
    const mapping = deepFreeze({ time_s: 't' })
    expect(resolveLogHeader(headers, { mapping }).byChannel.time?.header).toBe('T')
  })
})
