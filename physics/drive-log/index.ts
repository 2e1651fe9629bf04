/** Drive logs: column model, header mapping, row decoding and the incremental analyser (pure TypeScript). */
export * from './errors'
export * from './columns'
export * from './header'
export { parseLogNumber, NOT_A_NUMBER } from './number-cell'
export * from './row-decoder'
export * from './types'
export {
  resolveThresholds, DEFAULT_SPIN_SLIP, DEFAULT_MIN_EVENT_S, DEFAULT_MIN_SLIP_SPEED_KMH, DEFAULT_EXIT_FRACTION,
  DEFAULT_MIN_SPEED_DIFF_KMH, DEFAULT_EXIT_SPEED_DIFF_KMH,
} from './thresholds'
export { createWheelCombiner, DEFAULT_DRIVE_TRACK_WIDTH_M, type WheelCombiner } from './wheel-speed'
export { createRadiusCalibrator, type RadiusCalibrator, type RadiusCalibrationOptions } from './radius-calibration'
export { positiveEnergyJ, J_PER_KWH } from './energy'
export { createLogAnalyser, type LogAnalyser } from './analyser'
