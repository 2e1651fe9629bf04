import type { TrailerParams, VehicleParams } from '@/physics/vehicle'

/** One numeric field of the program form: stored in SI, shown in `unit` (value shown = stored ÷ scale). */
export interface NumberField<K extends string> {
  key: K
  label: string
  unit: string
  scale?: number
  hint?: string
}

type NumKeys<T> = { [K in keyof T]-?: T[K] extends number ? K : never }[keyof T] & string

export const VEHICLE_FIELDS: { group: string; fields: NumberField<NumKeys<VehicleParams>>[] }[] = [
  {
    group: 'Masses',
    fields: [
      { key: 'emptyMassKg', label: 'Empty (kerb) mass', unit: 'kg' },
      { key: 'grossMassKg', label: 'Gross vehicle mass', unit: 'kg' },
    ],
  },
  {
    group: 'Geometry',
    fields: [
      { key: 'wheelbaseM', label: 'Wheelbase (steer axle to drive axle or the tandem group’s load centre)', unit: 'm' },
      { key: 'emptyCgToFrontAxleM', label: 'Empty CG behind steer axle', unit: 'm' },
      { key: 'emptyCgHeightM', label: 'Empty CG height', unit: 'm' },
      { key: 'ladenCgToFrontAxleM', label: 'Laden CG behind steer axle', unit: 'm' },
      { key: 'ladenCgHeightM', label: 'Laden CG height', unit: 'm' },
      { key: 'wheelRadiusM', label: 'Drive tyre dynamic rolling radius', unit: 'm' },
    ],
  },
  {
    group: 'Driveline and motor',
    fields: [
      { key: 'finalDriveRatio', label: 'Final drive ratio', unit: ':1' },
      { key: 'drivelineEfficiency', label: 'Driveline efficiency', unit: '%', scale: 0.01 },
      { key: 'motorPeakTorqueNm', label: 'Motor peak torque', unit: 'N·m' },
      { key: 'motorPeakPowerW', label: 'Motor peak power', unit: 'kW', scale: 1000 },
      { key: 'motorMaxSpeedRpm', label: 'Motor speed limit', unit: 'rpm' },
      { key: 'motorInertiaKgM2', label: 'Motor rotor inertia', unit: 'kg·m²' },
      { key: 'driveWheelsInertiaKgM2', label: 'Drive wheels inertia (all together)', unit: 'kg·m²' },
    ],
  },
  {
    group: 'Battery',
    fields: [
      { key: 'batteryDischargePowerW', label: 'Discharge power limit', unit: 'kW', scale: 1000 },
      { key: 'batteryChargePowerW', label: 'Charge power limit (limits regen)', unit: 'kW', scale: 1000 },
    ],
  },
  {
    group: 'Resistances',
    fields: [
      { key: 'frontalAreaM2', label: 'Frontal area', unit: 'm²' },
      { key: 'dragCoefficient', label: 'Drag coefficient', unit: '' },
      { key: 'rollingResistanceCoeff', label: 'Rolling-resistance coefficient', unit: '' },
    ],
  },
]

export const TRAILER_FIELDS: NumberField<keyof TrailerParams>[] = [
  { key: 'fifthWheelToFrontAxleM', label: 'Fifth wheel behind steer axle', unit: 'm' },
  { key: 'fifthWheelHeightM', label: 'Fifth-wheel height', unit: 'm' },
  { key: 'kingpinToAxleM', label: 'Kingpin to trailer axle group centre', unit: 'm' },
  { key: 'emptyMassKg', label: 'Trailer empty mass', unit: 'kg' },
  { key: 'grossMassKg', label: 'Trailer gross mass', unit: 'kg' },
  { key: 'emptyCgToKingpinM', label: 'Trailer empty CG behind kingpin', unit: 'm' },
  { key: 'emptyCgHeightM', label: 'Trailer empty CG height', unit: 'm' },
  { key: 'ladenCgToKingpinM', label: 'Trailer laden CG behind kingpin', unit: 'm' },
  { key: 'ladenCgHeightM', label: 'Trailer laden CG height', unit: 'm' },
]

/** A starting trailer when the engineer ticks "with semitrailer" (generic placeholder geometry to edit). */
export const TRAILER_START: TrailerParams = {
  fifthWheelToFrontAxleM: 3.5,
  fifthWheelHeightM: 1.2,
  kingpinToAxleM: 7.5,
  emptyMassKg: 7000,
  grossMassKg: 34000,
  emptyCgToKingpinM: 4.5,
  emptyCgHeightM: 1.3,
  ladenCgToKingpinM: 4,
  ladenCgHeightM: 2,
}
