import { describe, expect, it } from 'vitest'
import { createRadiusCalibrator, type LogSample, type RadiusCalibrationOptions } from '@/physics'
import { analyse, series } from './helpers'

// Hand case (issue 20): a drive tyre of 0.52 m nominal dynamic radius (a 315/80 R22.5 is about 0.52 m —
// recalled from memory) worn by 20 mm rolls on 0.50 m. The logged wheel speed Ω·R_nom is then 0.52/0.50 = 1.04
// times the road speed at zero slip: κ_raw = 4.0 % on every straight stretch (20/520 = 3.8 % of the new radius).
const R_NOM = 0.52
const R_EFF = 0.5
const RHO = R_NOM / R_EFF

/** 60 s at 50 km/h coasting (zero torque), then 20 s pulling 1500 N·m with a true slip of 1 %. Wheel speeds as logged with R_nom. */
function wornTyreLog(extra: Partial<LogSample> = {}): LogSample[] {
  return series(80, 0.1, (t) => {
    const pulling = t > 60
    const trueWheel = pulling ? 50 * 1.01 : 50 // tread speed Ω·R_eff
    return { roadSpeedKmh: 50, wheelSpeedsKmh: [trueWheel * RHO], motorTorqueNm: pulling ? 1500 : 0, accelPedalPct: pulling ? 40 : 0, ...extra }
  })
}

function calibrate(samples: readonly LogSample[], opts: RadiusCalibrationOptions = {}) {
  const c = createRadiusCalibrator(opts)
  samples.forEach((s) => c.push(s))
  return c.result()
}

describe('per-log effective-radius calibration', () => {
  it('uncalibrated, 20 mm of tread wear reads as 4.0 % slip while coasting', () => {
    const { slips } = analyse(wornTyreLog())
    expect(slips[100]).toBeCloseTo(RHO - 1, 12)
    expect(RHO - 1).toBeCloseTo(0.04, 12)
  })
  it('recovers the known radius error from the zero-torque stretch (ρ = 1.04, R_eff = R_nom − 3.85 %)', () => {
    const cal = calibrate(wornTyreLog())
    expect(cal.status).toBe('applied')
    expect(cal.ratio).toBeCloseTo(RHO, 12)
    expect(cal.radiusChangePct).toBeCloseTo((R_EFF / R_NOM - 1) * 100, 10) // −3.846 %
    expect(cal.seconds).toBeCloseTo(60, 6) // 600 intervals of 0.1 s up to t = 60 s (the first sample, with no predecessor, counts none)
  })
  it('applied, coasting reads 0 and the pulling stretch its true 1 % slip', () => {
    const log = wornTyreLog()
    const { slips, result } = analyse(log, { radiusCalibration: calibrate(log) })
    expect(Math.abs(slips[100])).toBeLessThan(1e-12)
    expect(slips[700]).toBeCloseTo(0.01, 12)
    expect(result.calibration?.status).toBe('applied')
  })
  it('refuses (and does not apply) a ratio beyond ±5 %: a wrong radius or speed source is fixed, not calibrated away', () => {
    const log = series(30, 0.1, () => ({ roadSpeedKmh: 50, wheelSpeedsKmh: [50 * 1.08], motorTorqueNm: 0 }))
    const cal = calibrate(log)
    expect(cal.status).toBe('rejected')
    expect(cal.reason).toMatch(/beyond ±5 %/)
    const { slips } = analyse(log, { radiusCalibration: cal })
    expect(slips[10]).toBeCloseTo(0.08, 12)
  })
  it('uses only qualifying stretches: torque, braking, turning, accelerating or slow samples are left out', () => {
    const base = { roadSpeedKmh: 50, wheelSpeedsKmh: [52], motorTorqueNm: 0 }
    const bad: Partial<LogSample>[] = [
      { motorTorqueNm: 400 }, { brakePedalPct: 30 }, { yawRateRadS: 0.05 }, { roadSpeedKmh: 20, wheelSpeedsKmh: [20.8] },
    ]
    for (const b of bad) expect(calibrate(series(30, 0.1, () => ({ ...base, ...b }))).status).toBe('insufficient')
    // Accelerating at 1 m/s² (3.6 km/h per s) is not steady.
    expect(calibrate(series(30, 0.1, (t) => ({ ...base, roadSpeedKmh: 40 + 3.6 * t, wheelSpeedsKmh: [(40 + 3.6 * t) * 1.04] }))).status).toBe('insufficient')
    // Left and right apart by 2 % without a yaw rate: a turn, not straight.
    expect(calibrate(series(30, 0.1, () => ({ ...base, wheelSpeedsKmh: [51.5, 52.5] })), { wheelChannels: ['wheelLeft', 'wheelRight'] }).status).toBe('insufficient')
  })
  it('needs a torque column and at least 10 s', () => {
    expect(calibrate(series(30, 0.1, () => ({ wheelSpeedsKmh: [52], roadSpeedKmh: 50 }))).reason).toMatch(/no motor torque/)
    expect(calibrate(series(5, 0.1, () => ({ wheelSpeedsKmh: [52], roadSpeedKmh: 50, motorTorqueNm: 0 }))).reason).toMatch(/10 s needed/)
  })
})

describe('the calibrator as a first pass', () => {
  it('refuses time going backwards with the analyser’s own error, and never changes a sample', () => {
    const log = wornTyreLog().slice(0, 5).map((s) => Object.freeze({ ...s, wheelSpeedsKmh: Object.freeze([...s.wheelSpeedsKmh]) }))
    const back = [...log, { ...log[1], timeS: 0.05, line: 7 }]
    const c = createRadiusCalibrator({ timeColumn: { index: 1, name: 'time_s' } })
    let err: unknown
    try { back.forEach((s) => c.push(s)) } catch (e) { err = e }
    expect(err).toMatchObject({ code: 'time-order', line: 7, message: 'line 7, column 1 (time_s): time 0.05 s is earlier than the previous row (0.4 s); time must not decrease' })
    expect(() => analyse(back, { timeColumn: { index: 1, name: 'time_s' } })).toThrow((err as Error).message)
  })
})
