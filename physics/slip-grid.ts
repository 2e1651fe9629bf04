/** Whole-map slip prediction and traction-limit overlays, built on {@link prepareCellSlip}. */
import { prepareCellSlip, type CellContext, type CellSlipResult } from './cell-slip'
import { deliverableAtShaft } from './envelope'
import { overallRatio } from './driveline'
import type { MapKind, MapTable } from './table'
import { checkMap } from './table-lookup'
import { kmhToMps } from './units'

/**
 * Per-cell slip results, result[row][col], for a drive or regen map. Regen map values are braking
 * magnitudes (≥ 0 = regen) and are evaluated as motor torque −value.
 * @example slipGrid({ vehicle: truck, loadCase: 'laden', surface: 'packed-snow', gradeRad: 0, ...driveMap })[3][0].slip
 */
export function slipGrid(args: CellContext & MapTable): CellSlipResult[][] {
  checkMap(args, '')
  const at = prepareCellSlip(args)
  const sign = args.kind === 'regen' ? -1 : 1
  return args.values.map((row) => row.map((v, c) => at(sign * v, args.colAxis[c])))
}

/** One overlay point: magnitudes in N·m at the motor shaft. */
export interface TorqueLimitPoint {
  speedKmh: number
  /** Torque at which the drive axle reaches its traction (drive) or lock-up (regen) limit. */
  tractionLimitNm: number
  /** Motor envelope and battery power limit at this speed. */
  envelopeLimitNm: number
  /** The smaller of the two. */
  limitNm: number
}

/**
 * Motor-shaft torque limits per speed breakpoint, for plotting over a map (positive magnitudes;
 * for `kind: 'regen'` these are braking torques, matching the regen map convention).
 * @example tractionLimitTorqueBySpeed({ vehicle: truck, loadCase: 'laden', surface: 'ice', colAxis: [0, 20, 40], kind: 'drive' })
 */
export function tractionLimitTorqueBySpeed(args: CellContext & { colAxis: number[]; kind: MapKind }): TorqueLimitPoint[] {
  checkMap({ rowAxis: [0], colAxis: args.colAxis, values: [args.colAxis.map(() => 0)] }, '')
  const at = prepareCellSlip({ ...args, applyEnvelope: false })
  const G = overallRatio(args.vehicle, args.gearIndex ?? 0)
  const probe = args.kind === 'regen' ? -1 : 1
  return args.colAxis.map((speedKmh) => {
    const tractionLimitNm = Math.abs(at(probe, speedKmh).motorTorqueAtLimitNm)
    const envelopeLimitNm = deliverableAtShaft(args.vehicle, (kmhToMps(speedKmh) / args.vehicle.wheelRadiusM) * G, args.kind)
    return { speedKmh, tractionLimitNm, envelopeLimitNm, limitNm: Math.min(tractionLimitNm, envelopeLimitNm) }
  })
}
