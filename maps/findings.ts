/**
 * What validate reports. A finding is data, not an exception: the editor lists them beside
 * the table and highlights the cells. It carries its numbers in SI units and its sentence as
 * parts, so the UI renders it in the chosen units (findingMessage) without parsing text.
 */
import { renderParts, type MessagePart } from './finding-text'
import type { MapTable } from './table'
import type { UnitSet } from './units'

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
  /** Pedal breakpoint, %, and road speed, km/h, of the cell when the finding concerns one. */
  pedalPct?: number
  speedKmh?: number
  /** The offending value, N·m, and the bound it breaks, N·m, when the rule compares the two. */
  valueNm?: number
  limitNm?: number
  /** The sentence, with its quantities in SI units; render with findingMessage. */
  parts: MessagePart[]
  /** The sentence in metric units, e.g. "at 40 % pedal, 20 km/h: 2,400 N·m exceeds …" (API clients, logs). */
  message: string
}

/** Where a cell finding points: the cell's indices and its pedal and speed breakpoints. */
export function cellWhere(t: Pick<MapTable, 'rowAxis' | 'colAxis'>, r: number, c: number): Pick<Finding, 'row' | 'col' | 'pedalPct' | 'speedKmh'> {
  return { row: r, col: c, pedalPct: t.rowAxis[r], speedKmh: t.colAxis[c] }
}

/** A finding from its sentence; the metric message is rendered here. */
export function finding(f: Omit<Finding, 'message'>): Finding {
  return { ...f, message: renderParts(f.parts) }
}

/**
 * A finding's sentence in a unit system (metric gives `message`).
 * @example findingMessage(f, UNITS.imperial) // "at 40 % pedal, 12.4 mph: 1,770.2 lbf·ft exceeds …"
 */
export function findingMessage(f: Pick<Finding, 'parts'>, units: UnitSet): string {
  return renderParts(f.parts, units)
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
