/**
 * Drivability manoeuvres on a set: tip-in (a pedal step from a held speed), tip-out (pedal release
 * into lift-off regen) and launch, each through the set's torque ramp limits, on the shared
 * time-stepping core (sim-core.ts). Figures: peak and RMS longitudinal jerk, time to 90 % of the
 * requested torque change, peak slip and time beyond the tyre's peak, speed reached.
 *
 * The torque request is the drive map at the pedal and road speed; with the pedal at 0 the regen
 * map's lift-off row (0 % brake pedal) is subtracted, so releasing the pedal asks for lift-off regen.
 * The manoeuvre starts after a settling time with the command held at the request of the starting
 * pedal, so the figures describe the manoeuvre, not the start of the simulation.
 */
import { rampStep, type RampLimits } from '../maps/ramps'
import { PhysicsInputError, requireFinite } from './errors'
import { runSimulation, type SimOptions, type SimSample } from './sim-core'
import type { MapTable } from './table'
import { checkMap, lookup } from './table-lookup'
import { kmhToMps } from './units'

export const MANOEUVRES = ['tip-in', 'tip-out', 'launch'] as const
export type ManoeuvreKind = (typeof MANOEUVRES)[number]

export type Manoeuvre =
  | { kind: 'tip-in'; speedKmh: number; fromPedalPct: number; toPedalPct: number }
  | { kind: 'tip-out'; speedKmh: number; fromPedalPct: number }
  | { kind: 'launch'; pedalPct: number }

export interface DrivabilityOptions extends Omit<SimOptions, 'torqueLimiter' | 'initialCommandNm' | 'durationS'> {
  drive: MapTable
  /** Lift-off regen comes from its 0 % row; null: releasing the pedal asks for the drive map's 0 % row only. */
  regen: MapTable | null
  /** The set's ramp limits; null: the request reaches the motor at once (no ramp). */
  ramps: RampLimits | null
  manoeuvre: Manoeuvre
  /** Time after the pedal moves over which the figures are taken, s (default 4). */
  windowS?: number
}

export interface DrivabilitySummary {
  /** Largest |jerk| after the pedal moves, m/s³ (jerk differenced at the sample interval). */
  peakJerkMps3: number
  /** RMS jerk over the window after the pedal moves, m/s³. */
  rmsJerkMps3: number
  /** From the pedal moving until the motor torque has covered 90 % of the change to the new request, s; null if not within the window. */
  timeTo90PctS: number | null
  /** The request after the pedal moved (at the speed then), and the torque before, N·m at the motor shaft. */
  requestNm: number
  startTorqueNm: number
  /** Largest drive slip and most negative (braking) slip, and time beyond the tyre's peak either way, s. */
  peakSlip: number
  minSlip: number
  tyrePeakSlip: number
  timeBeyondPeakS: number
  speedReachedKmh: number
}

export interface DrivabilityResult { samples: SimSample[]; summary: DrivabilitySummary; pedalAtS: number }

/** Settling time before the pedal moves, s: the wheel's slip finds its level under the held torque. */
export const SETTLE_S = 1

/** The set's torque request: drive map at the pedal, less the lift-off regen when the pedal is released. */
export function setRequest(drive: MapTable, regen: MapTable | null): (pedalPct: number, speedKmh: number) => number {
  return (p, kmh) => lookup(drive, p, kmh) - (p <= 0 && regen ? lookup(regen, 0, kmh) : 0)
}

function pedals(m: Manoeuvre): { from: number; to: number; speedKmh: number } {
  if (m.kind === 'tip-in') return { from: m.fromPedalPct, to: m.toPedalPct, speedKmh: m.speedKmh }
  if (m.kind === 'tip-out') return { from: m.fromPedalPct, to: 0, speedKmh: m.speedKmh }
  return { from: 0, to: m.pedalPct, speedKmh: 0 }
}

/**
 * Runs one manoeuvre. Throws PhysicsInputError for maps of the wrong kind or pedals outside 0–100 %.
 * @example simulateManoeuvre({ vehicle, loadCase: 'laden', surface: 'wet-asphalt', drive, regen, ramps,
 *   manoeuvre: { kind: 'tip-in', speedKmh: 30, fromPedalPct: 10, toPedalPct: 80 } }).summary.peakJerkMps3
 */
export function simulateManoeuvre(o: DrivabilityOptions): DrivabilityResult {
  if (o.drive.kind !== 'drive') throw new PhysicsInputError('drive.kind', 'the drive part must be a drive map')
  if (o.regen && o.regen.kind !== 'regen') throw new PhysicsInputError('regen.kind', 'the regen part must be a regen map')
  checkMap(o.drive)
  if (o.regen) checkMap(o.regen)
  const { from, to, speedKmh } = pedals(o.manoeuvre)
  for (const [field, v] of [['fromPedalPct', from], ['toPedalPct', to]] as const)
    if (!(requireFinite(`manoeuvre.${field}`, v) >= 0 && v <= 100)) throw new PhysicsInputError(`manoeuvre.${field}`, 'must be 0–100 %')
  if (!(requireFinite('manoeuvre.speedKmh', speedKmh) >= 0 && speedKmh <= 150)) throw new PhysicsInputError('manoeuvre.speedKmh', 'must be 0–150 km/h')
  if (o.manoeuvre.kind !== 'launch' && speedKmh <= 0) throw new PhysicsInputError('manoeuvre.speedKmh', `a ${o.manoeuvre.kind} starts from a speed above 0 km/h`)
  const windowS = o.windowS ?? 4
  const request = setRequest(o.drive, o.regen)
  const start = request(from, speedKmh)
  const ramps = o.ramps
  const run = runSimulation(
    {
      ...o,
      durationS: SETTLE_S + windowS,
      initialCommandNm: start,
      torqueLimiter: ramps ? (c, req, kmh, dt) => rampStep(ramps, c, req, kmh, dt) : (_c, req) => req,
    },
    (t) => (t < SETTLE_S ? from : to),
    request,
    kmhToMps(speedKmh),
    [],
  )
  const after = run.samples.filter((s) => s.t > SETTLE_S + 1e-9)
  // The request at the speed the controller sees (road or driven-wheel, docs/physics.md §9a).
  const seen = after[0] ? (o.vehicle.mapSpeedSource === 'driven-wheel' ? after[0].wheelSpeedKmh : after[0].speedKmh) : speedKmh
  const target = request(to, seen)
  const change = target - start
  const reached = after.find((s) => (change >= 0 ? s.motorTorqueNm >= start + 0.9 * change : s.motorTorqueNm <= start + 0.9 * change))
  const jerks = after.map((s) => s.jerkMps3)
  const last = run.samples[run.samples.length - 1]
  return {
    samples: run.samples,
    pedalAtS: SETTLE_S,
    summary: {
      peakJerkMps3: jerks.reduce((m, j) => Math.max(m, Math.abs(j)), 0),
      rmsJerkMps3: jerks.length ? Math.sqrt(jerks.reduce((a, j) => a + j * j, 0) / jerks.length) : 0,
      timeTo90PctS: change === 0 ? 0 : reached ? reached.t - SETTLE_S : null,
      requestNm: target,
      startTorqueNm: start,
      peakSlip: after.reduce((m, s) => Math.max(m, s.slip), 0),
      minSlip: after.reduce((m, s) => Math.min(m, s.slip), 0),
      tyrePeakSlip: run.tyrePeakSlip,
      timeBeyondPeakS: run.timeBeyondPeakDriveS + run.timeBeyondPeakBrakeS,
      speedReachedKmh: last.speedKmh,
    },
  }
}
