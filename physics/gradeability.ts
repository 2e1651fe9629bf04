/**
 * Startability and gradeability of a drive map: can the laden truck start on a grade, and hold a
 * speed on another, with the torque the map gives at full pedal — and can the tyres carry it?
 *
 * Steady force at the drive wheels on a grade θ (uphill > 0) at speed V (Gillespie, *Fundamentals of
 * Vehicle Dynamics*, ch. 2, grade and rolling resistance; recalled from memory):
 *   F = m·g·(sin θ + C_rr·cos θ) + ½·ρ·C_d·A·V²,   θ = atan(grade % / 100).
 * No acceleration term: this is the least force that holds the truck (a start needs more to move off,
 * and breakaway resistance of a standing tyre exceeds its rolling resistance — neither is modelled).
 * Motor torque needed: T = F·R / (G·η) (driveline.ts). Available: the drive map at full pedal at the
 * speed, capped by the motor and battery envelope at the motor speed (envelope.ts). Allowed by the
 * tyres: the motor torque that brings the critical driven axle to its peak on the dry surface on that
 * grade, with load transfer (cell-slip.ts, traction.ts). The band [needed, allowed] is where the
 * full-pedal cell must lie; when it is empty no single map can both hold the grade and stay in grip.
 */
import { SEA_LEVEL_AIR_DENSITY, STANDARD_GRAVITY } from './constants'
import { prepareCellSlip } from './cell-slip'
import { deliverableAtShaft } from './envelope'
import { motorTorqueFromWheel, overallRatio } from './driveline'
import { PhysicsInputError, requireFinite } from './errors'
import { axleLoadsFor } from './load-case'
import { loadCasesFor, type LoadCase } from './load-cases'
import type { SurfaceId } from './surfaces'
import type { MapTable } from './table'
import { checkMap, lookup } from './table-lookup'
import { kmhToMps } from './units'
import type { VehicleParams } from './vehicle'

/** One requirement: start (speed 0) or hold a speed on a grade. */
export interface GradeDemand {
  kind: 'start' | 'hold'
  /** Grade, % (rise per 100 of horizontal run), uphill. */
  gradePct: number
  /** Speed, km/h (0 for a start). */
  speedKmh: number
}

/** Why a requirement fails: the map asks too little, the motor/battery cannot, or the tyres cannot. */
export type GradeVerdict = 'met' | 'map-short' | 'envelope-short' | 'traction-short'

export interface GradeCheck extends GradeDemand {
  loadCase: LoadCase
  massKg: number
  /** Wheel force needed, N, and its parts. */
  wheelForceN: number
  gradeForceN: number
  rollingForceN: number
  aeroForceN: number
  /** Motor-shaft torques, N·m: needed, what the map gives at full pedal, the motor/battery cap, what the tyres allow. */
  neededNm: number
  mapNm: number
  envelopeNm: number
  tractionNm: number
  /** The map's full-pedal torque after the envelope: min(mapNm, envelopeNm). */
  availableNm: number
  verdict: GradeVerdict
  /** A sentence for the engineer: pass, or what falls short and why. */
  explanation: string
}

export interface GradeCheckOptions {
  vehicle: VehicleParams
  /** Drive map (motor-shaft torque over pedal % × road speed km/h). */
  drive: MapTable
  /** Load case (default: the laden one — 'trailer-laden' with a semitrailer, 'laden' otherwise). */
  loadCase?: LoadCase
  /** Surface the tyres' limit is taken on (default dry asphalt). */
  surface?: SurfaceId
  /** Gear (default 0, the lowest). */
  gearIndex?: number
}

/** Largest grade accepted, %: 100 % is 45°; steeper is no road. */
export const MAX_GRADE_PCT = 100

/** Grade % → angle, rad: θ = atan(p/100). @example gradeRadFromPct(100) // π/4 */
export function gradeRadFromPct(gradePct: number): number {
  requireFinite('gradePct', gradePct)
  if (gradePct < 0 || gradePct > MAX_GRADE_PCT) throw new PhysicsInputError('gradePct', `must be 0–${MAX_GRADE_PCT} % (got ${gradePct})`)
  return Math.atan(gradePct / 100)
}

/**
 * Steady wheel force (N) to hold mass m on a grade at a speed: m·g·(sin θ + C_rr·cos θ) + ½ρC_dA·V².
 * @example gradeWheelForceN(truck, 40_000, 10, 0) // ≈ 40 000·9.80665·(0.0995 + 0.006·0.995)
 */
export function gradeWheelForceN(v: Pick<VehicleParams, 'rollingResistanceCoeff' | 'dragCoefficient' | 'frontalAreaM2'>, massKg: number, gradePct: number, speedKmh: number): { total: number; grade: number; rolling: number; aero: number } {
  const th = gradeRadFromPct(gradePct)
  requireFinite('speedKmh', speedKmh)
  if (speedKmh < 0 || speedKmh > 150) throw new PhysicsInputError('speedKmh', `must be 0–150 km/h (got ${speedKmh})`)
  const w = massKg * STANDARD_GRAVITY
  const V = kmhToMps(speedKmh)
  const grade = w * Math.sin(th)
  const rolling = v.rollingResistanceCoeff * w * Math.cos(th)
  const aero = 0.5 * SEA_LEVEL_AIR_DENSITY * v.dragCoefficient * v.frontalAreaM2 * V * V
  return { total: grade + rolling + aero, grade, rolling, aero }
}

const r0 = (x: number) => Math.round(x).toLocaleString('en-GB')

function explain(d: GradeDemand, c: Omit<GradeCheck, 'verdict' | 'explanation'>, verdict: GradeVerdict): string {
  const what = d.kind === 'start' ? `Starting on ${d.gradePct} %` : `Holding ${d.speedKmh} km/h on ${d.gradePct} %`
  const need = `${what} needs ${r0(c.neededNm)} N·m at the motor`
  if (verdict === 'traction-short')
    return `${need}, but the tyres on the dry surface allow only ${r0(c.tractionNm)} N·m there: no single map can satisfy both — any full-pedal torque that climbs the grade spins the driven wheels. The remedy lies outside the map (more load on the driven axle, other tyres or gearing, or a lower grade requirement).`
  if (verdict === 'envelope-short')
    return `${need}, but the motor and battery deliver at most ${r0(c.envelopeNm)} N·m at that speed: no map can give it.`
  if (verdict === 'map-short')
    return `${need}; the map gives ${r0(c.availableNm)} N·m at full pedal. Raise the full-pedal cells to between ${r0(c.neededNm)} and ${r0(Math.min(c.tractionNm, c.envelopeNm))} N·m.`
  return `${need}; the map gives ${r0(c.availableNm)} N·m at full pedal, and the tyres allow ${r0(c.tractionNm)} N·m.`
}

/**
 * Checks one start or hold requirement against the drive map's full-pedal torque, the envelope and the tyres.
 * @example checkGrade({ vehicle: truck, drive }, { kind: 'start', gradePct: 18, speedKmh: 0 }).verdict // 'met'
 */
export function checkGrade(o: GradeCheckOptions, d: GradeDemand): GradeCheck {
  if (o.drive.kind !== 'drive') throw new PhysicsInputError('drive.kind', 'the startability check needs a drive map')
  checkMap(o.drive)
  if (d.kind === 'start' && d.speedKmh !== 0) throw new PhysicsInputError('speedKmh', 'a start is at 0 km/h')
  const v = o.vehicle
  const gear = o.gearIndex ?? 0
  const loadCase = o.loadCase ?? (v.trailer ? 'trailer-laden' : 'laden')
  const { model } = axleLoadsFor(v, loadCase)
  const m = model.totalMassKg
  const f = gradeWheelForceN(v, m, d.gradePct, d.speedKmh)
  const neededNm = motorTorqueFromWheel(v, f.total * v.wheelRadiusM, gear)
  const fullPedal = o.drive.rowAxis[o.drive.rowAxis.length - 1]
  const mapNm = Math.max(0, lookup(o.drive, fullPedal, d.speedKmh))
  const omega = (kmhToMps(d.speedKmh) / v.wheelRadiusM) * overallRatio(v, gear)
  const envelopeNm = deliverableAtShaft(v, omega, 'drive')
  const at = prepareCellSlip({ vehicle: v, loadCase, surface: o.surface ?? 'dry-asphalt', gradeRad: gradeRadFromPct(d.gradePct), gearIndex: gear, applyEnvelope: false })
  const tractionNm = Math.abs(at(1, d.speedKmh).motorTorqueAtLimitNm)
  const availableNm = Math.min(mapNm, envelopeNm)
  const base = { ...d, loadCase, massKg: m, wheelForceN: f.total, gradeForceN: f.grade, rollingForceN: f.rolling, aeroForceN: f.aero, neededNm, mapNm, envelopeNm, tractionNm, availableNm }
  // Tyres first: when they cannot carry the force, nothing in the map or the motor can help.
  const verdict: GradeVerdict = neededNm > tractionNm ? 'traction-short' : neededNm > envelopeNm ? 'envelope-short' : neededNm > availableNm ? 'map-short' : 'met'
  return { ...base, verdict, explanation: explain(d, base, verdict) }
}

/** The program's grade requirements (release conditions); any part may be absent. */
export interface GradeRequirements { startGradePct?: number; holdGradePct?: number; holdSpeedKmh?: number }

/**
 * The declared start and hold requirements as demands (none when the version declares none).
 * A hold grade without a speed, or the reverse, is refused naming the missing field.
 * @example gradeDemands({ startGradePct: 18 }) // [{ kind: 'start', gradePct: 18, speedKmh: 0 }]
 */
export function gradeDemands(r: GradeRequirements): GradeDemand[] {
  const out: GradeDemand[] = []
  if (r.startGradePct !== undefined) out.push({ kind: 'start', gradePct: r.startGradePct, speedKmh: 0 })
  if ((r.holdGradePct === undefined) !== (r.holdSpeedKmh === undefined))
    throw new PhysicsInputError(r.holdGradePct === undefined ? 'holdGradePct' : 'holdSpeedKmh', 'a hold needs both a grade and a speed')
  if (r.holdGradePct !== undefined && r.holdSpeedKmh !== undefined) out.push({ kind: 'hold', gradePct: r.holdGradePct, speedKmh: r.holdSpeedKmh })
  return out
}

/** One speed column of the drive map's full-pedal row against the declared grade and the release conditions' traction. */
export interface BandCell {
  speedKmh: number
  /** Motor torque to keep climbing the declared grade at this speed, laden, N·m. */
  neededNm: number
  /** The smallest traction limit over the release surfaces × load cases at this speed (flat road), N·m, and where. */
  allowedNm: number
  worstSurface: SurfaceId
  worstLoadCase: LoadCase
  /** The map's full-pedal torque here, N·m. */
  mapNm: number
  /** needed > allowed: no single map satisfies both here. */
  empty: boolean
  status: 'in-band' | 'below-needed' | 'above-allowed' | 'no-band'
}

/**
 * The band the full-pedal row must lie in, per speed breakpoint: at least the torque to climb the declared grade
 * (the start grade, else the hold grade) laden, at most the traction limit of the worst release surface and load case.
 * Null when the version declares no grade. Where the band is empty no single map can satisfy both.
 * @example fullPedalBand(truck, drive, { startGradePct: 12 }, { surfaces: ['packed-snow'], loadCases: ['empty'] })
 */
export function fullPedalBand(vehicle: VehicleParams, drive: MapTable, req: GradeRequirements, c: { surfaces: readonly SurfaceId[]; loadCases: readonly LoadCase[] }): BandCell[] | null {
  const gradePct = req.startGradePct ?? req.holdGradePct
  if (gradePct === undefined || drive.kind !== 'drive') return null
  checkMap(drive)
  const laden: LoadCase = vehicle.trailer ? 'trailer-laden' : 'laden'
  const m = axleLoadsFor(vehicle, laden).model.totalMassKg
  const offered = new Set<LoadCase>(loadCasesFor(vehicle))
  const limits = c.surfaces.flatMap((surface) => c.loadCases.filter((l) => offered.has(l)).map((loadCase) => ({ surface, loadCase, at: prepareCellSlip({ vehicle, loadCase, surface, applyEnvelope: false }) })))
  const fullPedal = drive.rowAxis[drive.rowAxis.length - 1]
  return drive.colAxis.map((speedKmh) => {
    const neededNm = motorTorqueFromWheel(vehicle, gradeWheelForceN(vehicle, m, gradePct, Math.min(speedKmh, 150)).total * vehicle.wheelRadiusM)
    let allowedNm = Infinity
    let worst = limits[0]
    for (const l of limits) {
      const a = Math.abs(l.at(1, speedKmh).motorTorqueAtLimitNm)
      if (a < allowedNm) { allowedNm = a; worst = l }
    }
    const mapNm = lookup(drive, fullPedal, speedKmh)
    const empty = neededNm > allowedNm
    const status = empty ? 'no-band' : mapNm < neededNm ? 'below-needed' : mapNm > allowedNm ? 'above-allowed' : 'in-band'
    return { speedKmh, neededNm, allowedNm, worstSurface: worst?.surface ?? 'dry-asphalt', worstLoadCase: worst?.loadCase ?? laden, mapNm, empty, status }
  })
}
