/**
 * Rules that need the vehicle: motor envelope, battery power, interpolation between speed
 * breakpoints, and steep steps. Non-finite cells are skipped.
 */
import { chargeLimitTorqueAt, dischargeLimitTorqueAt, motorEnvelopeAt, shaftSpeedRadS } from './envelope'
import { cellLabel, kmh, nm, pedalWord, rowLabel, sentence } from './finding-text'
import { cellWhere, finding, type Finding } from './findings'
import { stepThresholdNm, type MapLimits } from './limits'
import { humanNumber } from './number-format'
import type { MapTable } from './table'

/** Slack so that a value clamped to exactly the envelope is not flagged by rounding. */
const TOL = 1e-9
/** Samples per speed interval for 'envelope-between' (the envelope is smooth; 16 finds the worst well). */
const SAMPLES = 16

const kw = (w: number) => `${humanNumber(w / 1000)} kW`

/** Braking torque a cell asks for: regen values, or negative values in a drive map. */
const brakingOf = (kind: MapTable['kind'], v: number) => (kind === 'regen' ? v : -v)

/** Tightest bound on |torque| at a speed and which limit it is. */
function boundAt(limits: MapLimits, kind: MapTable['kind'], speed: number, v: number): { nm: number; what: string } {
  const env = motorEnvelopeAt(limits, speed)
  const charge = brakingOf(kind, v) > 0 ? chargeLimitTorqueAt(limits, speed) : Infinity
  return charge < env ? { nm: charge, what: 'battery charge limit' } : { nm: env, what: 'motor envelope' }
}

/**
 * Cell findings for motor-envelope, charge-power, discharge-power and steep-step.
 * @example checkLimits(table, limitsFromVehicle(vehicle))
 */
export function checkLimits(table: MapTable, limits: MapLimits): Finding[] {
  const out: Finding[] = []
  const { kind, rowAxis, colAxis, values } = table
  const at = (r: number, c: number) => cellLabel(kind, rowAxis[r], colAxis[c])
  for (let r = 0; r < rowAxis.length; r++) {
    for (let c = 0; c < colAxis.length; c++) {
      const v = values[r][c]
      if (!Number.isFinite(v)) continue
      const speed = colAxis[c]
      const env = motorEnvelopeAt(limits, speed)
      if (Math.abs(v) > env * (1 + TOL) + TOL) {
        const why = speed > limits.maxRoadSpeedKmh ? sentence` (above ${kmh(limits.maxRoadSpeedKmh)} the motor exceeds its speed limit)` : []
        out.push(finding({ severity: 'error', rule: 'motor-envelope', ...cellWhere(table, r, c), valueNm: v, limitNm: env, parts: sentence`${at(r, c)}: ${nm(v)} exceeds the motor envelope of ${nm(env)}${why}` }))
      }
      const omega = shaftSpeedRadS(limits, speed)
      const braking = brakingOf(kind, v)
      if (braking > 0 && braking * omega > limits.batteryChargePowerW * (1 + TOL)) {
        const limitNm = chargeLimitTorqueAt(limits, speed)
        out.push(finding({ severity: 'error', rule: 'charge-power', ...cellWhere(table, r, c), valueNm: v, limitNm, parts: sentence`${at(r, c)}: ${nm(braking)} of braking needs ${kw(braking * omega)} at the motor shaft, above the battery charge limit of ${kw(limits.batteryChargePowerW)} (${nm(limitNm)} at this speed)` }))
      }
      if (kind === 'drive' && v > 0 && v * omega > limits.batteryDischargePowerW * (1 + TOL)) {
        const limitNm = dischargeLimitTorqueAt(limits, speed)
        out.push(finding({ severity: 'warning', rule: 'discharge-power', ...cellWhere(table, r, c), valueNm: v, limitNm, parts: sentence`${at(r, c)}: ${nm(v)} needs ${kw(v * omega)} at the motor shaft, more than the battery can deliver (${kw(limits.batteryDischargePowerW)}, ${nm(limitNm)} at this speed)` }))
      }
    }
  }
  out.push(...checkBetween(table, limits), ...checkSteps(table, limits))
  return out
}

/**
 * Power limits fall as 1/speed, a convex curve, so a straight line between two cells that sit
 * on it lies above it in between: the controller would request more than the bound there. One
 * warning per row and speed interval, at the worst sample, when both end cells are themselves fine.
 */
function checkBetween(table: MapTable, limits: MapLimits): Finding[] {
  const out: Finding[] = []
  const { kind, rowAxis, colAxis, values } = table
  for (let r = 0; r < rowAxis.length; r++) {
    for (let c = 0; c + 1 < colAxis.length; c++) {
      const a = values[r][c]
      const b = values[r][c + 1]
      if (!Number.isFinite(a) || !Number.isFinite(b)) continue
      const s0 = colAxis[c]
      const s1 = colAxis[c + 1]
      if (Math.abs(a) > boundAt(limits, kind, s0, a).nm * (1 + TOL) || Math.abs(b) > boundAt(limits, kind, s1, b).nm * (1 + TOL)) continue
      let worst: { excess: number; speed: number; v: number; nm: number; what: string } | null = null
      for (let k = 1; k < SAMPLES; k++) {
        const t = k / SAMPLES
        const speed = s0 + (s1 - s0) * t
        const v = a + (b - a) * t
        const bound = boundAt(limits, kind, speed, v)
        const excess = Math.abs(v) - bound.nm
        if (excess > TOL * (1 + bound.nm) && (!worst || excess > worst.excess)) worst = { excess, speed, v, ...bound }
      }
      if (worst)
        out.push(finding({ severity: 'warning', rule: 'envelope-between', row: r, col: c, pedalPct: rowAxis[r], speedKmh: worst.speed, valueNm: worst.v, limitNm: worst.nm, parts: sentence`${rowLabel(kind, rowAxis[r])}, between ${kmh(s0, true)} and ${kmh(s1)}: interpolation reaches ${nm(worst.v)} at ${kmh(worst.speed)}, above the ${worst.what} of ${nm(worst.nm)} there — add a speed breakpoint` }))
    }
  }
  return out
}

/** Steps between horizontal and vertical neighbours above the threshold; reported on the second cell. */
function checkSteps(table: MapTable, limits: MapLimits): Finding[] {
  const out: Finding[] = []
  const max = stepThresholdNm(limits)
  const { kind, rowAxis, colAxis, values } = table
  const cell = (r: number, c: number, step: number) => ({ ...cellWhere(table, r, c), valueNm: step, limitNm: max })
  for (let r = 0; r < rowAxis.length; r++) {
    for (let c = 0; c < colAxis.length; c++) {
      const v = values[r][c]
      if (!Number.isFinite(v)) continue
      const left = c > 0 ? values[r][c - 1] : NaN
      const down = r > 0 ? values[r - 1][c] : NaN
      if (Number.isFinite(left) && Math.abs(v - left) > max)
        out.push(finding({ severity: 'warning', rule: 'steep-step', ...cell(r, c, Math.abs(v - left)), parts: sentence`${rowLabel(kind, rowAxis[r])}, from ${kmh(colAxis[c - 1], true)} to ${kmh(colAxis[c])}: a step of ${nm(Math.abs(v - left))} exceeds ${nm(max)}` }))
      if (Number.isFinite(down) && Math.abs(v - down) > max)
        out.push(finding({ severity: 'warning', rule: 'steep-step', ...cell(r, c, Math.abs(v - down)), parts: sentence`at ${kmh(colAxis[c])}, from ${rowAxis[r - 1]} to ${rowAxis[r]} % ${pedalWord(kind)}: a step of ${nm(Math.abs(v - down))} exceeds ${nm(max)}` }))
    }
  }
  return out
}
