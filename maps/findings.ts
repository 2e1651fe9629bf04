/**
 * What validate reports. A finding is data, not an exception: the editor lists them beside
 * the table and highlights the cells.
 */

export type Severity = 'error' | 'warning'

export type RuleId =
  | 'axis-size'
  | 'axis-order'
  | 'axis-range'
  | 'shape'
  | 'not-finite'
  | 'pedal-monotonic'
  | 'regen-negative'
  | 'motor-envelope'
  | 'charge-power'
  | 'discharge-power'
  | 'envelope-between'
  | 'steep-step'

export interface Finding {
  severity: Severity
  rule: RuleId
  /** Row (pedal breakpoint) index, 0-based, when the finding concerns a row or a cell. */
  row?: number
  /** Column (speed breakpoint) index, 0-based, when the finding concerns a column or a cell. */
  col?: number
  /** Human sentence naming the cell, e.g. "at 40 % pedal, 20 km/h: 2,400 N·m exceeds …". */
  message: string
}

/** One line per rule, for the UI legend and the docs; severities are those validate uses. */
export const VALIDATION_RULES: Readonly<Record<RuleId, { severity: Severity | 'error (drive) / warning (regen)'; needsLimits: boolean; summary: string }>> = {
  'axis-size': { severity: 'error', needsLimits: false, summary: 'each axis has 2 to 64 breakpoints' },
  'axis-order': { severity: 'error', needsLimits: false, summary: 'breakpoints strictly increasing' },
  'axis-range': { severity: 'error', needsLimits: false, summary: 'pedal breakpoints within 0–100 %, speed breakpoints ≥ 0 km/h' },
  shape: { severity: 'error', needsLimits: false, summary: 'one row per pedal breakpoint, one value per speed breakpoint' },
  'not-finite': { severity: 'error', needsLimits: false, summary: 'no NaN, infinite or non-number value or breakpoint' },
  'pedal-monotonic': { severity: 'error (drive) / warning (regen)', needsLimits: false, summary: 'torque never falls as the pedal rises at a given speed' },
  'regen-negative': { severity: 'error', needsLimits: false, summary: 'regen braking torque ≥ 0' },
  'motor-envelope': { severity: 'error', needsLimits: true, summary: '|torque| ≤ min(peak torque, peak power ÷ shaft speed); 0 beyond the motor speed limit' },
  'charge-power': { severity: 'error', needsLimits: true, summary: 'braking torque × shaft speed ≤ battery charge power (losses not credited)' },
  'discharge-power': { severity: 'warning', needsLimits: true, summary: 'drive torque × shaft speed ≤ battery discharge power' },
  'envelope-between': { severity: 'warning', needsLimits: true, summary: 'interpolated torque between speed breakpoints stays within the envelope and charge limit' },
  'steep-step': { severity: 'warning', needsLimits: true, summary: 'neighbouring cells differ by at most maxStepNm (default 25 % of peak torque)' },
}
