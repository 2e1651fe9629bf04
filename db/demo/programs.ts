import type { VehicleParams } from '../../physics/vehicle'

// Every number in this file is INVENTED demo data for a fictional conversion shop; none is a
// measurement of a real vehicle.

/** Demo: a 6×4 battery-electric tipper (dump) truck. Invented. */
export const demoTipper: VehicleParams = {
  axleLayout: '6x4',
  emptyMassKg: 14_500,
  grossMassKg: 32_000,
  wheelbaseM: 4.6,
  emptyCgToFrontAxleM: 2.5,
  emptyCgHeightM: 1.1,
  ladenCgToFrontAxleM: 3.1,
  ladenCgHeightM: 1.7,
  wheelRadiusM: 0.52,
  gearRatios: [3.2, 1.0],
  finalDriveRatio: 4.1,
  drivelineEfficiency: 0.93,
  motorPeakTorqueNm: 2_800,
  motorPeakPowerW: 450_000,
  motorMaxSpeedRpm: 9_000,
  batteryDischargePowerW: 500_000,
  batteryChargePowerW: 250_000,
  frontalAreaM2: 8.5,
  dragCoefficient: 0.65,
  rollingResistanceCoeff: 0.007,
  motorInertiaKgM2: 0.45,
  driveWheelsInertiaKgM2: 96,
  trailer: null,
}

/** Demo: a 6×4 battery-electric tractor with a three-axle semitrailer. Invented. */
export const demoTractor: VehicleParams = {
  axleLayout: '6x4',
  emptyMassKg: 10_200,
  grossMassKg: 26_000,
  wheelbaseM: 3.9,
  emptyCgToFrontAxleM: 1.9,
  emptyCgHeightM: 1.05,
  ladenCgToFrontAxleM: 2.3,
  ladenCgHeightM: 1.2,
  wheelRadiusM: 0.51,
  gearRatios: [2.9, 1.0],
  finalDriveRatio: 4.3,
  drivelineEfficiency: 0.93,
  motorPeakTorqueNm: 3_100,
  motorPeakPowerW: 540_000,
  motorMaxSpeedRpm: 8_500,
  batteryDischargePowerW: 600_000,
  batteryChargePowerW: 300_000,
  frontalAreaM2: 9.6,
  dragCoefficient: 0.6,
  rollingResistanceCoeff: 0.0065,
  motorInertiaKgM2: 0.5,
  driveWheelsInertiaKgM2: 92,
  trailer: {
    fifthWheelToFrontAxleM: 3.6,
    fifthWheelHeightM: 1.2,
    kingpinToAxleM: 7.8,
    emptyMassKg: 7_500,
    grossMassKg: 36_000,
    emptyCgToKingpinM: 4.6,
    emptyCgHeightM: 1.3,
    ladenCgToKingpinM: 4.1,
    ladenCgHeightM: 2.0,
  },
}
