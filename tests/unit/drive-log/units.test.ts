// Each accepted unit variant, decoded through the real header + row decoder.
import { describe, expect, it } from 'vitest'
import { createRowDecoder, resolveLogHeader } from '@/physics'

/** Decodes one row given column name → cell; the other required columns are filled with 0. */
function decode(cols: Record<string, string>, wheelRadiusM?: number) {
  const fill: Record<string, string> = { time_s: '0', road_speed_kmh: '0', wheel_speed_kmh: '0', accel_pedal_pct: '0' }
  const all = { ...fill, ...cols }
  // Drop the default column of any channel the test supplies in another unit.
  for (const n of Object.keys(cols)) {
    if (/^time_/.test(n) && n !== 'time_s') delete all.time_s
    if (/^road_speed_/.test(n) && n !== 'road_speed_kmh') delete all.road_speed_kmh
    if (/^wheel_speed_/.test(n) && n !== 'wheel_speed_kmh') delete all.wheel_speed_kmh
  }
  const layout = resolveLogHeader(Object.keys(all), { wheelRadiusM })
  return createRowDecoder(layout)(Object.values(all), 2)
}

describe('unit conversions (exact factors)', () => {
  it('mph → km/h: 1 mi = 1609.344 m exactly (NIST SP 811, Appendix B.9), so 1 mph = 1.609344 km/h', () => {
    expect(decode({ road_speed_mph: '50' }).roadSpeedKmh).toBe(50 * 1.609344) // 80.4672
    expect(decode({ road_speed_mph: '50' }).roadSpeedKmh).toBeCloseTo(80.4672, 12)
    expect(decode({ wheel_speed_mph: '10' }).wheelSpeedsKmh[0]).toBeCloseTo(16.09344, 12)
  })
  it('m/s → km/h: × 3.6 (1 km/h = 1000 m / 3600 s, SI definition)', () => {
    expect(decode({ road_speed_mps: '10' }).roadSpeedKmh).toBe(36)
  })
  it('ms → s: × 0.001', () => {
    expect(decode({ time_ms: '1500' }).timeS).toBe(1.5)
  })
  it('wheel rad/s → tread surface speed: v = Ω·R; 1 rad/s × 0.5 m = 0.5 m/s = 1.8 km/h', () => {
    expect(decode({ wheel_speed_rad_s: '1' }, 0.5).wheelSpeedsKmh[0]).toBeCloseTo(1.8, 14)
    expect(decode({ wheel_speed_left_rad_s: '20' }, 0.52).wheelSpeedsKmh[0]).toBeCloseTo(20 * 0.52 * 3.6, 12)
  })
  it('wheel rpm → surface speed: Ω = rpm·2π/60; 60 rpm on R = 0.5 m is π m/s = 3.6π km/h', () => {
    expect(decode({ wheel_speed_rpm: '60' }, 0.5).wheelSpeedsKmh[0]).toBeCloseTo(3.6 * Math.PI, 12)
  })
  it('lbf·ft → N·m: 0.3048 m × 4.4482216152605 N (NIST SP 811, B.9)', () => {
    expect(decode({ motor_torque_lbf_ft: '100' }).motorTorqueNm).toBeCloseTo(100 * 0.3048 * 4.4482216152605, 10)
  })
  it('motor rad/s → rpm: × 60/(2π)', () => {
    expect(decode({ motor_speed_rad_s: String(2 * Math.PI) }).motorSpeedRpm).toBeCloseTo(60, 12)
  })
  it('units already in the working unit pass through unchanged', () => {
    const s = decode({ brake_pedal_pct: '12.5', motor_torque_nm: '-800', motor_speed_rpm: '3000', battery_current_a: '-150.5', battery_voltage_v: '650' })
    expect([s.brakePedalPct, s.motorTorqueNm, s.motorSpeedRpm, s.batteryCurrentA, s.batteryVoltageV]).toEqual([12.5, -800, 3000, -150.5, 650])
  })
})
