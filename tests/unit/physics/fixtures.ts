/** Invented, generic test vehicles (no real product): a 4×2 e-tractor with a semitrailer and a 6×4 rigid truck. */
import type { VehicleParams } from '@/physics'
import type { MapTable } from '@/physics'

export const tractor: VehicleParams = {
  axleLayout: '4x2',
  emptyMassKg: 9000,
  grossMassKg: 19000,
  wheelbaseM: 3.8,
  emptyCgToFrontAxleM: 1.6,
  emptyCgHeightM: 1.1,
  ladenCgToFrontAxleM: 2.3,
  ladenCgHeightM: 1.6,
  wheelRadiusM: 0.5,
  gearRatios: [2],
  finalDriveRatio: 6,
  drivelineEfficiency: 0.95,
  motorPeakTorqueNm: 3000,
  motorPeakPowerW: 450_000,
  motorMaxSpeedRpm: 6000,
  batteryDischargePowerW: 500_000,
  batteryChargePowerW: 350_000,
  frontalAreaM2: 9.5,
  dragCoefficient: 0.6,
  rollingResistanceCoeff: 0.006,
  motorInertiaKgM2: 0.5,
  driveWheelsInertiaKgM2: 60,
  trailer: {
    fifthWheelToFrontAxleM: 3.5,
    fifthWheelHeightM: 1.2,
    kingpinToAxleM: 8,
    emptyMassKg: 7000,
    grossMassKg: 30000,
    emptyCgToKingpinM: 5.5,
    emptyCgHeightM: 1.3,
    ladenCgToKingpinM: 4.8,
    ladenCgHeightM: 2.0,
  },
}

export const rigid6x4: VehicleParams = { ...tractor, axleLayout: '6x4', wheelbaseM: 5.2, emptyCgToFrontAxleM: 2.4, ladenCgToFrontAxleM: 3.4, trailer: null }

/** A flat drive map: torque ∝ pedal, `peakNm` at 100 %. */
export function linearDriveMap(peakNm: number): MapTable {
  const rowAxis = [0, 25, 50, 75, 100]
  const colAxis = [0, 10, 20, 40, 60, 90]
  return { kind: 'drive', rowAxis, colAxis, values: rowAxis.map((p) => colAxis.map(() => (peakNm * p) / 100)) }
}

/** A regen map whose 0 % row brakes with `liftOffNm` above 10 km/h, fading to 0 at standstill. */
export function regenMap(liftOffNm: number): MapTable {
  const rowAxis = [0, 50, 100]
  const colAxis = [0, 5, 10, 40, 90]
  const fade = [0, 0.5, 1, 1, 1]
  return { kind: 'regen', rowAxis, colAxis, values: rowAxis.map((p) => colAxis.map((_, j) => liftOffNm * fade[j] * (1 + p / 100))) }
}
