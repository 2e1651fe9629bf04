import type { BatteryPowerTable, VehicleParams } from '../../physics/vehicle'

// Every number in this file is INVENTED demo data for a fictional conversion shop; none is a
// measurement of a real vehicle. The numbers are chosen to be plausible to a truck engineer:
//
// - Axle loads stay within the EU limits of Directive 96/53/EC as amended (recalled from memory, not
//   re-checked): steer (non-driven single) axle 10 t; driven single axle 11.5 t; motor-vehicle tandem
//   with 1.3–1.8 m spread 18 t (19 t with twin tyres and air suspension); three-axle rigid 26 t with
//   twin tyres and air suspension on the drive axles; five- or six-axle articulated vehicle 40 t;
//   tri-axle semitrailer group with more than 1.3 m spread 24 t. (The extra allowance for zero-emission
//   trucks is not used.) Each truck's comment works its axle loads out by hand.
// - Motors: a constant-power range (speed limit ÷ base speed) of about 3.5:1, a common figure for
//   heavy-vehicle permanent-magnet traction motors (common practice, recalled from memory), and a
//   single reduction (the physics evaluates one gear) that puts 5,000 rpm at about 95 km/h, so the
//   truck is governed to 90 km/h below the motor's limit (EU speed limiters are set at 90 km/h at most,
//   Directive 92/6/EEC, recalled from memory).
// - Rotor inertia scales with torque as J ∝ T^(5/3): at a fixed air-gap shear stress T ∝ D²·l and
//   J ∝ D⁴·l, with l ∝ D for geometrically similar machines. Reference: about 0.04 kg·m² for a
//   300 N·m passenger-car traction motor (recalled from memory) ⇒ J ≈ 0.04·(T/300)^(5/3).
// - Drive-wheel inertia: about 12 kg·m² per 22.5-inch wheel and tyre (recalled from memory) per
//   driven wheel (twin tyres: four wheels per driven axle).
// - Battery tables: charge power falls at high state of charge (little voltage headroom) and at low
//   temperature (plating risk), discharge power at low charge and in the cold — the usual shape
//   (common practice); the numbers themselves are invented.

/** Demo pack table for the tipper: SoC 10/50/95 % × −10/10/25 °C, W. Invented. */
const tipperPack: BatteryPowerTable = {
  socPct: [10, 50, 95],
  temperatureC: [-10, 10, 25],
  chargePowerW: [
    [60_000, 180_000, 250_000],
    [45_000, 160_000, 250_000],
    [25_000, 70_000, 120_000],
  ],
  dischargePowerW: [
    [150_000, 300_000, 380_000],
    [250_000, 420_000, 450_000],
    [300_000, 450_000, 450_000],
  ],
}

/**
 * Demo: a 6×4 battery-electric tipper (dump) truck. Invented.
 * Axle loads (L = 4.3 m to the tandem centre): empty 14.0 t at a = 1.94 m ⇒ steer 7.68 t, tandem 6.32 t
 * (cab, batteries behind it and the body's front end load the steer axle of an empty tipper);
 * laden 26.0 t at a = 2.97 m ⇒ steer 8.04 t, tandem 17.96 t (≤ 18 t; 26 t three-axle rigid).
 * 3,400 N·m / 450 kW: base speed 132.4 rad/s (1,264 rpm), 5,000 rpm limit ⇒ constant-power range 4.0:1.
 * Overall ratio 2.3 × 4.48 = 10.30, R = 0.52 m (315/80 R22.5-class tyre, recalled): 5,000 rpm = 95.1 km/h;
 * 62.6 kN at the wheels, about 24 % gradeability laden — site work needs it.
 * Rotor 0.04·(3400/300)^(5/3) = 2.29 kg·m²; eight driven wheels × 12 = 96 kg·m².
 * Open inter-axle differential (locked only off-road) with an inter-axle transfer ε = 0.08 N/N (invented).
 */
export const demoTipper: VehicleParams = {
  axleLayout: '6x4',
  tandem: { interAxleDifferential: 'open', interAxleTransfer: 0.08 },
  emptyMassKg: 14_000,
  grossMassKg: 26_000,
  wheelbaseM: 4.3,
  emptyCgToFrontAxleM: 1.94,
  emptyCgHeightM: 1.1,
  ladenCgToFrontAxleM: 2.97,
  ladenCgHeightM: 1.75,
  wheelRadiusM: 0.52,
  gearRatios: [2.3],
  finalDriveRatio: 4.48,
  drivelineEfficiency: 0.93,
  motorPeakTorqueNm: 3_400,
  motorPeakPowerW: 450_000,
  motorMaxSpeedRpm: 5_000,
  batteryDischargePowerW: 480_000,
  batteryChargePowerW: 250_000,
  batteryPowerTable: tipperPack,
  frontalAreaM2: 8.5,
  dragCoefficient: 0.65,
  rollingResistanceCoeff: 0.007,
  motorInertiaKgM2: 2.29,
  driveWheelsInertiaKgM2: 96,
  trailer: null,
}

/**
 * Demo: a 6×2 battery-electric tractor (forward tandem axle driven, tag axle behind) with a three-axle
 * semitrailer. Invented. L = 4.1 m to the tandem group's load centre (driven axle carries 60 %).
 * Solo: empty 11.5 t at a = 1.78 m ⇒ steer 6.51 t, group 4.99 t; "laden" 25.5 t (tractor plus 14 t on
 * the fifth wheel) at a = 2.86 m ⇒ steer 7.71 t, group 17.79 t (driven axle 10.7 t ≤ 11.5 t).
 * With the laden trailer (28.5 t, CG mid-deck: 13.6 m deck, kingpin 1.6 m behind its front ⇒ 5.2 m):
 * kingpin 28.5·(7.8 − 5.2)/7.8 = 9.5 t, trailer axles 19.0 t (≤ 24 t); tractor steer 7.31 t, group
 * 13.69 t (driven 8.21 t); combination 40.0 t.
 * 3,000 N·m / 450 kW: base 150 rad/s (1,432 rpm), 5,000 rpm ⇒ 3.5:1; ratio 2.3 × 4.4 = 10.12,
 * R = 0.51 m: 5,000 rpm = 95.0 km/h. Rotor 0.04·(3000/300)^(5/3) = 1.86 kg·m²; four driven wheels × 12 = 48 kg·m².
 */
export const demoTractor: VehicleParams = {
  axleLayout: '6x2',
  tandem: { drivenAxle: 'forward', drivenLoadShare: 0.6 },
  emptyMassKg: 11_500,
  grossMassKg: 25_500,
  wheelbaseM: 4.1,
  emptyCgToFrontAxleM: 1.78,
  emptyCgHeightM: 1.1,
  ladenCgToFrontAxleM: 2.86,
  ladenCgHeightM: 1.25,
  wheelRadiusM: 0.51,
  gearRatios: [2.3],
  finalDriveRatio: 4.4,
  drivelineEfficiency: 0.93,
  motorPeakTorqueNm: 3_000,
  motorPeakPowerW: 450_000,
  motorMaxSpeedRpm: 5_000,
  batteryDischargePowerW: 500_000,
  batteryChargePowerW: 300_000,
  batteryPowerTable: {
    socPct: [10, 50, 95],
    temperatureC: [-10, 10, 25],
    chargePowerW: [
      [70_000, 200_000, 300_000],
      [55_000, 180_000, 300_000],
      [30_000, 80_000, 140_000],
    ],
    dischargePowerW: [
      [180_000, 350_000, 450_000],
      [300_000, 480_000, 500_000],
      [350_000, 500_000, 500_000],
    ],
  },
  frontalAreaM2: 9.6,
  dragCoefficient: 0.6,
  rollingResistanceCoeff: 0.0065,
  motorInertiaKgM2: 1.86,
  driveWheelsInertiaKgM2: 48,
  trailer: {
    fifthWheelToFrontAxleM: 3.75,
    fifthWheelHeightM: 1.15,
    kingpinToAxleM: 7.8,
    emptyMassKg: 7_000,
    grossMassKg: 28_500,
    emptyCgToKingpinM: 5.4,
    emptyCgHeightM: 1.0,
    ladenCgToKingpinM: 5.2,
    ladenCgHeightM: 2.0,
  },
}

/** Battery corners the demo programs declare (release conditions). Invented thresholds. */
export const DEMO_BATTERY_CORNERS = [
  { label: 'Full and cold', socPct: 95, temperatureC: -10 },
  { label: 'Half and mild', socPct: 50, temperatureC: 10 },
]
