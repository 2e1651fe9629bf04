/**
 * Shared test data: a single-speed vehicle with round numbers, so envelopes can be worked
 * out by hand from P = T·ω, and tables built inside or outside that envelope.
 */
import type { VehicleParams } from '../../../physics/vehicle'
import type { MapKind, MapTable } from '../../../maps'

/**
 * Wheel radius 0.5 m, gear 9 × final drive 2 = 18: ω = v/3.6/0.5·18 = 10 rad/s per km/h.
 * 2,000 N·m and 300 kW: base speed 150 rad/s = 15 km/h. 9,000 rpm = 942.48 rad/s = 94.25 km/h.
 */
export const vehicle: VehicleParams = {
  axleLayout: '6x4',
  emptyMassKg: 12_000,
  grossMassKg: 26_000,
  wheelbaseM: 4.2,
  emptyCgToFrontAxleM: 1.8,
  emptyCgHeightM: 1.1,
  ladenCgToFrontAxleM: 2.4,
  ladenCgHeightM: 1.6,
  wheelRadiusM: 0.5,
  gearRatios: [9],
  finalDriveRatio: 2,
  drivelineEfficiency: 0.95,
  motorPeakTorqueNm: 2000,
  motorPeakPowerW: 300_000,
  motorMaxSpeedRpm: 9000,
  batteryDischargePowerW: 350_000,
  batteryChargePowerW: 200_000,
  frontalAreaM2: 9,
  dragCoefficient: 0.6,
  rollingResistanceCoeff: 0.006,
  motorInertiaKgM2: 0.3,
  driveWheelsInertiaKgM2: 60,
}

/** Hand envelope for `vehicle`: min(2000, 300000 / (10·v)), 0 above 94.25 km/h. */
export function handEnvelope(speedKmh: number): number {
  const omega = (speedKmh / 3.6 / 0.5) * 18
  if (speedKmh > (9000 * 2 * Math.PI) / 60 / 10) return 0
  return omega === 0 ? 2000 : Math.min(2000, 300_000 / omega)
}

/** Hand charge-limited braking torque: 200 kW / ω. */
export function handChargeLimit(speedKmh: number): number {
  const omega = (speedKmh / 3.6 / 0.5) * 18
  return omega === 0 ? Infinity : 200_000 / omega
}

export const SPEEDS = [0, 10, 15, 20, 30, 60, 90]
export const PEDALS = [0, 25, 50, 75, 100]

/**
 * values[r][c] = pedal share × factor × bound(speed): within every rule when factor ≤ 0.7
 * (vertical steps ≤ 0.25·0.7·2000 = 350 N·m, horizontal ≤ 0.7·533 N·m; chords under the curve).
 */
export function insideTable(kind: MapKind, factor = 0.7): MapTable {
  const bound = (s: number) => (kind === 'regen' ? Math.min(handEnvelope(s), handChargeLimit(s)) : handEnvelope(s))
  return {
    kind,
    rowAxis: [...PEDALS],
    colAxis: [...SPEEDS],
    values: PEDALS.map((p) => SPEEDS.map((s) => (p / 100) * factor * bound(s))),
  }
}

/** A small hand-written drive table for editing tests. */
export function small(): MapTable {
  return {
    kind: 'drive',
    rowAxis: [0, 50, 100],
    colAxis: [0, 10, 40],
    values: [
      [0, 0, 0],
      [400, 300, 100],
      [800, 700, 400],
    ],
  }
}

/** Freeze recursively so any mutation by the code under test throws (ES modules are strict). */
export function deepFreeze<T>(x: T): T {
  if (typeof x === 'object' && x !== null) {
    for (const v of Object.values(x)) deepFreeze(v)
    Object.freeze(x)
  }
  return x
}
