/**
 * The drive-log column model: which columns Mapwright reads, their units, and the exact factor that
 * converts each one to the analyser's working unit (s, km/h, %, N·m, rpm, A, V, rad/s).
 * Names are snake_case with the unit last. Factors for US units are from NIST SP 811 via `../units`.
 */
import { KMH_PER_MPH, NM_PER_LBF_FT, mpsToKmh, radSToRpm, rpmToRadS } from '../units'

/** A quantity the analyser consumes. Wheel channels are drive wheels: one combined or per wheel. */
export type LogChannel =
  | 'time' | 'roadSpeed' | 'accelPedal' | 'brakePedal' | 'motorTorque' | 'motorSpeed'
  | 'batteryCurrent' | 'batteryVoltage' | 'yawRate'
  | 'wheel' | 'wheelLeft' | 'wheelRight' | 'wheelLeft2' | 'wheelRight2'

/** The drive-wheel channels, in the order their speeds appear in `LogSample.wheelSpeedsKmh`. */
export const WHEEL_CHANNELS: readonly WheelChannel[] = Object.freeze(['wheel', 'wheelLeft', 'wheelRight', 'wheelLeft2', 'wheelRight2'])

/** A drive-wheel channel. */
export type WheelChannel = 'wheel' | 'wheelLeft' | 'wheelRight' | 'wheelLeft2' | 'wheelRight2'

/** Channels a log must have; a wheel channel is required too (any one of {@link WHEEL_CHANNELS}). */
export const REQUIRED_CHANNELS: readonly LogChannel[] = Object.freeze(['time', 'roadSpeed', 'accelPedal'])

/** One accepted column. Working value = raw × factor × (wheel radius in m, when `timesWheelRadius`). */
export interface LogColumnSpec {
  name: string
  channel: LogChannel
  /** Unit as written in the file. */
  unit: string
  /** Multiplier to the channel's working unit. */
  factor: number
  /** Angular wheel speed: surface speed = Ω·R, so the factor is also multiplied by R (m). */
  timesWheelRadius: boolean
  description: string
}

const col = (name: string, channel: LogChannel, unit: string, factor: number, description: string, timesWheelRadius = false): LogColumnSpec =>
  Object.freeze({ name, channel, unit, factor, timesWheelRadius, description })

// Angular wheel speed → surface speed in km/h: v = Ω[rad/s]·R[m] m/s, × 3.6 for km/h.
const RAD_S_TO_KMH_PER_M = mpsToKmh(1)
const RPM_TO_KMH_PER_M = mpsToKmh(rpmToRadS(1))

const WHEELS: readonly [WheelChannel, string, string][] = [
  ['wheel', 'wheel_speed', 'drive-wheel speed (one value for the driven axle)'],
  ['wheelLeft', 'wheel_speed_left', 'left drive wheel speed'],
  ['wheelRight', 'wheel_speed_right', 'right drive wheel speed'],
  ['wheelLeft2', 'wheel_speed_left_2', 'left wheel speed, second drive axle of a tandem'],
  ['wheelRight2', 'wheel_speed_right_2', 'right wheel speed, second drive axle of a tandem'],
]

/** Every accepted column; within a channel the first listed unit is preferred when a log carries two. */
export const DRIVE_LOG_COLUMNS: readonly LogColumnSpec[] = Object.freeze([
  col('time_s', 'time', 's', 1, 'time since the log started'),
  col('time_ms', 'time', 'ms', 1e-3, 'time since the log started'),
  col('road_speed_kmh', 'roadSpeed', 'km/h', 1, 'vehicle speed over ground, from a non-driven axle or satellite positioning (never from driven wheels)'),
  col('road_speed_mph', 'roadSpeed', 'mph', KMH_PER_MPH, 'vehicle speed over ground, from a non-driven axle or satellite positioning (never from driven wheels)'),
  col('road_speed_mps', 'roadSpeed', 'm/s', mpsToKmh(1), 'vehicle speed over ground, from a non-driven axle or satellite positioning (never from driven wheels)'),
  ...WHEELS.flatMap(([ch, base, what]) => [
    col(`${base}_kmh`, ch, 'km/h', 1, `${what}, tread surface speed Ω·R`),
    col(`${base}_mph`, ch, 'mph', KMH_PER_MPH, `${what}, tread surface speed Ω·R`),
    col(`${base}_rad_s`, ch, 'rad/s', RAD_S_TO_KMH_PER_M, `${what}, angular; × wheel radius`, true),
    col(`${base}_rpm`, ch, 'rpm', RPM_TO_KMH_PER_M, `${what}, angular; × wheel radius`, true),
  ]),
  col('accel_pedal_pct', 'accelPedal', '%', 1, 'accelerator pedal position, 0–100'),
  col('brake_pedal_pct', 'brakePedal', '%', 1, 'brake pedal position, 0–100'),
  col('motor_torque_nm', 'motorTorque', 'N·m', 1, 'motor shaft torque (negative in regen)'),
  col('motor_torque_lbf_ft', 'motorTorque', 'lbf·ft', NM_PER_LBF_FT, 'motor shaft torque (negative in regen)'),
  col('motor_speed_rpm', 'motorSpeed', 'rpm', 1, 'motor shaft speed'),
  col('motor_speed_rad_s', 'motorSpeed', 'rad/s', radSToRpm(1), 'motor shaft speed'),
  col('battery_current_a', 'batteryCurrent', 'A', 1, 'pack current, positive when discharging'),
  col('battery_voltage_v', 'batteryVoltage', 'V', 1, 'pack terminal voltage'),
  col('yaw_rate_deg_s', 'yawRate', '°/s', Math.PI / 180, 'yaw rate, positive turning left (ISO 8855, z axis up)'),
  col('yaw_rate_rad_s', 'yawRate', 'rad/s', 1, 'yaw rate, positive turning left (ISO 8855, z axis up)'),
])

const BY_NAME: ReadonlyMap<string, LogColumnSpec> = new Map(DRIVE_LOG_COLUMNS.map((c) => [c.name, c]))

/** The spec of one of our column names (exact, lower case), or undefined. @example findLogColumn('road_speed_mph')?.factor // 1.609344 */
export function findLogColumn(name: string): LogColumnSpec | undefined {
  return BY_NAME.get(name)
}

/**
 * Raw → working-unit multiplier for a column; angular wheel speeds need the dynamic rolling radius (m).
 * @example columnFactor(findLogColumn('wheel_speed_rad_s')!, 0.5) // 1.8: 1 rad/s × 0.5 m = 0.5 m/s = 1.8 km/h
 */
export function columnFactor(spec: LogColumnSpec, wheelRadiusM?: number): number {
  if (!spec.timesWheelRadius) return spec.factor
  if (wheelRadiusM === undefined || !(wheelRadiusM > 0) || !Number.isFinite(wheelRadiusM))
    throw new RangeError(`${spec.name} needs a wheel radius > 0 m`)
  return spec.factor * wheelRadiusM
}
