import { describe, expect, it } from 'vitest'
import { chargeLimitTorqueAt, dischargeLimitTorqueAt, limitsFromVehicle, MapInputError, motorEnvelopeAt, stepThresholdNm } from '../../../maps'
import { handEnvelope, vehicle } from '@/tests/support/fixtures'

const limits = limitsFromVehicle(vehicle)

describe('limitsFromVehicle', () => {
  it('derives the shaft speed per km/h from wheel radius and ratios', () => {
    // (1 / 3.6) / 0.5 m × 9 × 2 = 10 rad/s per km/h.
    expect(limits.shaftRadPerKmh).toBeCloseTo(10, 12)
    // 9,000 rpm = 942.48 rad/s → 94.25 km/h.
    expect(limits.maxRoadSpeedKmh).toBeCloseTo((9000 * 2 * Math.PI) / 60 / 10, 9)
    expect(limits).toMatchObject({ motorPeakTorqueNm: 2000, motorPeakPowerW: 300_000, batteryChargePowerW: 200_000, batteryDischargePowerW: 350_000, drivelineEfficiency: 0.95 })
  })

  it('uses the lowest gear for shaft speed and the top gear for the speed limit', () => {
    const twoSpeed = limitsFromVehicle({ ...vehicle, gearRatios: [3, 1] })
    expect(twoSpeed.shaftRadPerKmh).toBeCloseTo((1 / 3.6 / 0.5) * 3 * 2, 12)
    expect(twoSpeed.maxRoadSpeedKmh).toBeCloseTo(((9000 * 2 * Math.PI) / 60) / ((1 / 3.6 / 0.5) * 1 * 2), 9)
  })

  it('refuses parameters that give no meaningful limit', () => {
    expect(() => limitsFromVehicle({ ...vehicle, wheelRadiusM: 0 })).toThrow(MapInputError)
    expect(() => limitsFromVehicle({ ...vehicle, motorPeakPowerW: Number.NaN })).toThrow(/motor peak power/)
    expect(() => limitsFromVehicle({ ...vehicle, gearRatios: [] })).toThrow(/gear/)
  })

  it('defaults the step threshold to 25 % of peak torque', () => {
    expect(stepThresholdNm(limits)).toBe(500)
    expect(stepThresholdNm({ ...limits, maxStepNm: 120 })).toBe(120)
  })
})

describe('motorEnvelopeAt', () => {
  it('is the peak torque up to base speed (P / T = 300 kW / 2,000 N·m = 150 rad/s = 15 km/h)', () => {
    expect(motorEnvelopeAt(limits, 0)).toBe(2000)
    expect(motorEnvelopeAt(limits, 10)).toBe(2000)
    expect(motorEnvelopeAt(limits, 15)).toBeCloseTo(2000, 9)
  })

  it('is peak power ÷ shaft speed above base speed (T = P / ω)', () => {
    // 30 km/h: ω = 30 / 3.6 / 0.5 × 18 = 300 rad/s; T = 300,000 W / 300 rad/s = 1,000 N·m.
    expect(motorEnvelopeAt(limits, 30)).toBeCloseTo(1000, 9)
    expect(motorEnvelopeAt(limits, 60)).toBeCloseTo(500, 9)
    for (const s of [17, 23.5, 44, 80, 94]) expect(motorEnvelopeAt(limits, s)).toBeCloseTo(handEnvelope(s), 9)
  })

  it('is zero beyond the motor speed limit and symmetric in reverse', () => {
    expect(motorEnvelopeAt(limits, 95)).toBe(0)
    expect(motorEnvelopeAt(limits, -30)).toBeCloseTo(1000, 9)
  })

  it('refuses a non-finite speed', () => {
    expect(() => motorEnvelopeAt(limits, Number.NaN)).toThrow(MapInputError)
  })
})

describe('battery limits', () => {
  it('charge limit is charge power ÷ ω (losses not credited), infinite at standstill', () => {
    // 40 km/h: ω = 400 rad/s, 200 kW / 400 = 500 N·m.
    expect(chargeLimitTorqueAt(limits, 40)).toBeCloseTo(500, 9)
    expect(chargeLimitTorqueAt(limits, 0)).toBe(Infinity)
  })

  it('discharge limit is discharge power ÷ ω', () => {
    // 35 km/h: ω = 350 rad/s, 350 kW / 350 = 1,000 N·m.
    expect(dischargeLimitTorqueAt(limits, 35)).toBeCloseTo(1000, 9)
  })
})
