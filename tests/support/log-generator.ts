/**
 * Seeded generator of realistic drive logs for a heavy battery-electric truck, written in the columns of
 * docs/drive-logs.md. A simple kinematic model (not the physics simulator): stand, launch, cruise, lift-off,
 * brake to a stop, repeat. Some launches spin a drive wheel (wheel speed running ahead of road speed), and
 * some hard stops lock the wheels briefly. The first launch always spins and the first stop always locks,
 * so even a short log has one of each. Same options → byte-identical output.
 */
import { mulberry32 } from '@/physics/random'

/** Options; times s, rate Hz. */
export interface LogGenOptions {
  seed?: number
  rateHz?: number
  durationS: number
  lineEnding?: '\n' | '\r\n'
  /** Replaces the header cells (same order as {@link LOG_GEN_COLUMNS}), e.g. to test a mapping. */
  header?: readonly string[]
}

/** A spin or lock episode the generator put in, with its injected peak slip. */
export interface GenEpisode { kind: 'spin' | 'lock'; startS: number; endS: number; peakSlip: number }

/** Columns written, in order. */
export const LOG_GEN_COLUMNS = [
  'time_s', 'road_speed_kmh', 'wheel_speed_left_kmh', 'wheel_speed_right_kmh', 'accel_pedal_pct', 'brake_pedal_pct',
  'motor_torque_nm', 'motor_speed_rpm', 'battery_current_a', 'battery_voltage_v',
] as const

const R = 0.5 // wheel radius, m
const G = 20 // overall ratio
const FLOOR = 0.5 // slip floor, m/s (the physics slipRatio standstill rule)

type Phase = 'stand' | 'launch' | 'cruise' | 'liftoff' | 'brake'

/** Yields the header line, then one line per sample (without line endings), and fills `episodes`. */
function* lines(o: LogGenOptions, episodes: GenEpisode[]): Generator<string> {
  const rnd = mulberry32(o.seed ?? 1)
  const between = (a: number, b: number) => a + (b - a) * rnd()
  const noise = (s: number) => (rnd() + rnd() + rnd() - 1.5) * s
  const dt = 1 / (o.rateHz ?? 50)
  const n = Math.floor(o.durationS / dt) + 1
  yield (o.header ?? LOG_GEN_COLUMNS).join(',')
  let phase: Phase = 'stand'
  let phaseEnd = 3
  let v = 0
  let target = 0
  let pedal = 0
  let brake = 30
  let launches = 0
  let stops = 0
  let ep: (GenEpisode & { durS: number }) | null = null
  for (let i = 0; i < n; i++) {
    const t = i * dt
    // Phase transitions.
    if (phase === 'stand' && t >= phaseEnd) {
      phase = 'launch'; target = between(35, 85) / 3.6; launches++
      if (launches === 1 || rnd() < 0.35) ep = { kind: 'spin', startS: Infinity, endS: 0, peakSlip: between(0.3, 0.6), durS: between(0.5, 1.2) }
    } else if (phase === 'launch' && v >= target) { phase = 'cruise'; phaseEnd = t + between(15, 90) }
    else if (phase === 'cruise' && t >= phaseEnd) {
      phase = rnd() < 0.5 ? 'liftoff' : 'brake'; target = phase === 'liftoff' ? v * between(0.5, 0.8) : 0
      if (phase === 'brake') {
        stops++; brake = between(20, 70)
        if ((stops === 1 || rnd() < 0.25) && v > 6) { brake = 80; ep = { kind: 'lock', startS: t + 0.5, endS: 0, peakSlip: -between(0.6, 0.9), durS: between(0.3, 0.6) } }
      }
    } else if (phase === 'liftoff' && v <= target) { phase = 'cruise'; phaseEnd = t + between(10, 60) }
    else if (phase === 'brake' && v <= 0) { phase = 'stand'; v = 0; phaseEnd = t + between(4, 20) }
    // Driver and vehicle.
    let a = 0
    if (phase === 'stand') { pedal = 0; brake = 30 }
    else if (phase === 'launch') { pedal = Math.min(pedal + dt * 80, 85); brake = 0; a = 1.1 * (pedal / 100) * (1 - 0.6 * v / 25) }
    else if (phase === 'cruise') { pedal = 28 + 6 * Math.sin(t / 7) + noise(1); brake = 0; a = 0.3 * (target - v) }
    else if (phase === 'liftoff') { pedal = 0; brake = 0; a = -0.45 }
    else { pedal = 0; a = -(0.4 + brake / 40) }
    v = Math.max(0, v + a * dt)
    if (ep && ep.startS === Infinity && v > 1.5) ep.startS = t // spin once rolling, so the truth is clear
    // Slip: normal tyre creep plus any injected episode (κ relative to max(V, floor) as the physics defines it).
    // Motor torque from pedal (drive) or a fixed regen request, capped by 400 kW drive / 300 kW regen at the shaft.
    const omegaRoad = Math.max((v / R) * G, 1)
    const request = phase === 'launch' || phase === 'cruise' ? (pedal / 100) * 1200 : phase === 'stand' ? 0 : phase === 'liftoff' ? -300 : -700
    const torque = request >= 0 ? Math.min(request, 400e3 / omegaRoad) : Math.max(request, -300e3 / omegaRoad)
    let kappa = v > 0 ? 0.015 * torque / 1200 : 0
    let kappaRight = kappa
    if (ep && t >= ep.startS && t <= ep.startS + ep.durS) {
      const shape = Math.sin((Math.PI * (t - ep.startS)) / ep.durS)
      kappa += ep.peakSlip * shape
      kappaRight += ep.kind === 'lock' ? ep.peakSlip * shape : 0.3 * ep.peakSlip * shape // open differential: one wheel runs away
    }
    if (ep && t > ep.startS + ep.durS) { episodes.push({ kind: ep.kind, startS: ep.startS, endS: ep.startS + ep.durS, peakSlip: ep.peakSlip }); ep = null }
    const den = Math.max(v, FLOOR)
    const wl = v > 0 || kappa > 0 ? Math.max(0, v + kappa * den) : 0
    const wr = v > 0 || kappaRight > 0 ? Math.max(0, v + kappaRight * den) : 0
    const omegaMotor = ((wl + wr) / 2 / R) * G
    const pElec = 3000 + (torque >= 0 ? (torque * omegaMotor) / 0.9 : torque * omegaMotor * 0.9)
    const current = pElec / 680
    const voltage = 680 - 0.05 * current + noise(0.3)
    const kmh = (x: number) => (x * 3.6 + (x > 0 ? noise(0.05) : 0)).toFixed(2)
    yield [
      t.toFixed(3), kmh(v), kmh(wl), kmh(wr), Math.max(0, pedal).toFixed(1), brake.toFixed(1),
      torque.toFixed(1), ((omegaMotor * 60) / (2 * Math.PI)).toFixed(0), current.toFixed(1), voltage.toFixed(1),
    ].join(',')
  }
  if (ep && ep.startS < (n - 1) * dt) episodes.push({ kind: ep.kind, startS: ep.startS, endS: Math.min(ep.startS + ep.durS, (n - 1) * dt), peakSlip: ep.peakSlip })
}

/** The whole log as one string, with the injected episodes. @example generateLog({ durationS: 60 }).csv.split('\n')[0] */
export function generateLog(o: LogGenOptions): { csv: string; episodes: GenEpisode[] } {
  const episodes: GenEpisode[] = []
  const eol = o.lineEnding ?? '\n'
  const csv = Array.from(lines(o, episodes)).join(eol) + eol
  return { csv, episodes }
}

/**
 * The same bytes as {@link generateLog}, produced lazily as UTF-8 chunks of about `chunkBytes`, so a 2 h log
 * at 50 Hz (≈ 30 MB) never sits in memory.
 */
export async function* generateLogChunks(o: LogGenOptions & { chunkBytes?: number }): AsyncGenerator<Uint8Array> {
  const enc = new TextEncoder()
  const eol = o.lineEnding ?? '\n'
  const size = o.chunkBytes ?? 65_536
  let buf: string[] = []
  let len = 0
  for (const l of lines(o, [])) {
    buf.push(l, eol)
    len += l.length + eol.length
    if (len >= size) { yield enc.encode(buf.join('')); buf = []; len = 0 }
  }
  if (len) yield enc.encode(buf.join(''))
}
