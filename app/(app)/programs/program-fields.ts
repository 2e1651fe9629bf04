import { DEFAULT_DRIVE_TYRE, type DriveTyreParams } from '@/physics/drive-tyre'
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

/** The drive tyre's fields; blank = the default truck tyre shown in the hint (physics/drive-tyre.ts). */
export const DRIVE_TYRE_FIELDS: NumberField<keyof DriveTyreParams>[] = [
  {
    key: 'slipStiffnessPerLoad',
    label: 'Slip stiffness per unit load C_κ/F_z',
    unit: '1/unit slip',
    hint: `Slope of the force-ratio/slip curve at zero slip; the tyre keeps it on every surface. Heavy-truck radials about 8–20. Blank: ${DEFAULT_DRIVE_TYRE.slipStiffnessPerLoad}.`,
  },
  {
    key: 'peakMuLoadSensitivity',
    label: 'Peak μ load sensitivity k',
    unit: '',
    hint: `μ = μ_surface·(1 − k·(F_z/F_z,nom − 1)): 0.1 loses 1 % of μ per 10 % overload. Blank: ${DEFAULT_DRIVE_TYRE.peakMuLoadSensitivity} (none).`,
  },
  {
    key: 'nominalLoadPerTyreN',
    label: 'Nominal load per drive tyre F_z,nom',
    unit: 'kN',
    scale: 1000,
    hint: `The load at which the surface table’s μ holds. Blank: ${DEFAULT_DRIVE_TYRE.nominalLoadPerTyreN / 1000} kN.`,
  },
  { key: 'shapeC', label: 'Shape factor C', unit: '', hint: `Magic Formula C, 1–2; sets sliding/peak grip. Blank: ${DEFAULT_DRIVE_TYRE.shapeC}.` },
  { key: 'shapeE', label: 'Curvature factor E', unit: '', hint: `Magic Formula E, below 1; moves the peak along the slip axis. Blank: ${DEFAULT_DRIVE_TYRE.shapeE}.` },
  { key: 'tyreCount', label: 'Tyres on the driven axle(s)', unit: '', hint: 'All of them, duals counted two per side. Blank: 4 for a 4×2, 8 for a 6×4.' },
]

/** Parameters without a drive-tyre object whose fields are all blank, so leaving them blank is no change. */
export function withoutBlankTyre<P extends { driveTyre?: DriveTyreParams | null }>(params: P): P {
  const t = params.driveTyre
  if (t && Object.values(t).every((v) => v === undefined || v === null || Number.isNaN(v))) {
    const rest = { ...params }
    delete rest.driveTyre
    return rest
  }
  return params
}
