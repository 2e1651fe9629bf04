import { describe, expect, it } from 'vitest'
import { DRIVE_LOG_COLUMNS, LogFormatError, findLogColumn, resolveLogHeader } from '@/physics'

const BASE = ['time_s', 'road_speed_kmh', 'wheel_speed_kmh', 'accel_pedal_pct']

function headerError(f: () => unknown): LogFormatError {
  try { f() } catch (e) { if (e instanceof LogFormatError) return e; throw e }
  throw new Error('expected a LogFormatError')
}

describe('column model', () => {
  it('has unique snake_case names with the unit last', () => {
    const names = DRIVE_LOG_COLUMNS.map((c) => c.name)
    expect(new Set(names).size).toBe(names.length)
    for (const n of names) expect(n).toMatch(/^[a-z0-9_]+_(s|ms|kmh|mph|mps|rad_s|rpm|pct|nm|lbf_ft|a|v)$/)
    expect(findLogColumn('road_speed_mph')?.channel).toBe('roadSpeed')
    expect(findLogColumn('nope')).toBeUndefined()
  })
})

describe('resolveLogHeader', () => {
  it('matches case-insensitively and trimmed, strips a BOM, keeps the header text as found', () => {
    const l = resolveLogHeader(['\uFEFF Time_S ', 'ROAD_SPEED_KMH', ' wheel_speed_kmh', 'Accel_Pedal_Pct'])
    expect(l.byChannel.time?.header).toBe('Time_S')
    expect(l.byChannel.time?.index).toBe(0)
    expect(l.byChannel.accelPedal?.index).toBe(3)
    expect(l.ignored).toEqual([])
  })
  it('reports unknown extra columns as ignored, not as an error', () => {
    const l = resolveLogHeader([...BASE, 'gps_lat', 'driver_note'])
    expect(l.ignored.map((g) => [g.index, g.header])).toEqual([[4, 'gps_lat'], [5, 'driver_note']])
    expect(l.ignored[0].reason).toMatch(/not a column/)
  })
  it('names a missing required column and lists the headers found', () => {
    const e = headerError(() => resolveLogHeader(['time_s', 'wheel_speed_kmh', 'accel_pedal_pct', 'x']))
    expect(e.code).toBe('header')
    expect(e.line).toBe(1)
    expect(e.message).toContain('road_speed_kmh')
    expect(e.message).toContain('found: "time_s", "wheel_speed_kmh", "accel_pedal_pct", "x"')
  })
  it('requires at least one drive-wheel speed, and accepts any one of them', () => {
    expect(headerError(() => resolveLogHeader(['time_s', 'road_speed_kmh', 'accel_pedal_pct'])).message).toMatch(/drive-wheel speed/)
    expect(resolveLogHeader(['time_s', 'road_speed_kmh', 'accel_pedal_pct', 'wheel_speed_right_2_kmh']).byChannel.wheelRight2?.index).toBe(3)
  })
  it('applies a mapping { ourColumn: theirHeader } before our own names', () => {
    const l = resolveLogHeader(['t', 'Speed MPH', 'WheelL', 'Pedal', 'road_speed_kmh'], {
      mapping: { time_s: 't', road_speed_mph: 'speed mph', wheel_speed_left_kmh: 'WheelL', accel_pedal_pct: ' Pedal ' },
    })
    expect(l.byChannel.roadSpeed?.spec.name).toBe('road_speed_mph')
    expect(l.byChannel.roadSpeed?.index).toBe(1)
    expect(l.ignored).toEqual([{ index: 4, header: 'road_speed_kmh', reason: 'roadSpeed already read from "Speed MPH"' }])
  })
  it('refuses a mapping that names an unknown column, a header not in the file, or one channel twice', () => {
    expect(headerError(() => resolveLogHeader(BASE, { mapping: { speed: 'x' } })).message).toMatch(/"speed", which is not a column/)
    expect(headerError(() => resolveLogHeader(BASE, { mapping: { road_speed_mph: 'Speed' } })).message).toMatch(/not in the header; found: "time_s"/)
    expect(headerError(() => resolveLogHeader([...BASE, 'a', 'b'], { mapping: { road_speed_mph: 'a', road_speed_mps: 'b' } })).message).toMatch(/twice/)
    expect(headerError(() => resolveLogHeader(BASE, { mapping: { road_speed_mph: 3 } as unknown as Record<string, string> })).message).toMatch(/non-empty header/)
  })
  it('prefers the first listed unit when a log carries two units of one quantity', () => {
    const l = resolveLogHeader(['road_speed_mph', ...BASE])
    expect(l.byChannel.roadSpeed?.spec.name).toBe('road_speed_kmh')
    expect(l.ignored[0].header).toBe('road_speed_mph')
  })
  it('refuses a used header that appears twice', () => {
    expect(headerError(() => resolveLogHeader([...BASE, 'TIME_S'])).message).toMatch(/appears more than once/)
  })
  it('needs the wheel radius for angular wheel speeds', () => {
    const h = ['time_s', 'road_speed_kmh', 'wheel_speed_rpm', 'accel_pedal_pct']
    expect(headerError(() => resolveLogHeader(h)).message).toMatch(/wheel radius/)
    expect(resolveLogHeader(h, { wheelRadiusM: 0.5 }).byChannel.wheel?.factor).toBeCloseTo((2 * Math.PI / 60) * 0.5 * 3.6, 15)
  })
  it('asks for the brake pedal when regen occupancy needs it', () => {
    expect(headerError(() => resolveLogHeader(BASE, { requireBrake: true })).message).toMatch(/brake_pedal_pct/)
  })
})
