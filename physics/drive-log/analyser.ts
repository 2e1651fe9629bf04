/**
 * Incremental drive-log analyser: push samples one at a time, then `finish()`. Memory is fixed in the
 * number of rows (scalars, a bounded reservoir, a bounded plot series) apart from the events list and
 * the occupancy grid. Every interval [t(i−1), t(i)] is integrated with the trapezoid rule (distance,
 * energy) or held at the earlier sample (occupancy, zero-order hold, as a sampling logger records).
 */
import { PhysicsInputError, requireFinite, requirePositive } from '../errors'
import { SLIP_SPEED_FLOOR_MPS } from '../constants'
import { positiveEnergyJ, J_PER_KWH } from './energy'
import { LogFormatError } from './errors'
import { createEventDetector } from './events'
import { createOccupancy } from './occupancy'
import { createReservoir } from './reservoir'
import { createSeries } from './series'
import { createWheelCombiner, DEFAULT_DRIVE_TRACK_WIDTH_M, type WheelCombiner } from './wheel-speed'
import { resolveThresholds } from './thresholds'
import type { AnalysisResult, EventPoint, LogAnalyserOptions, LogSample } from './types'

/** Handle returned by {@link createLogAnalyser}. */
export interface LogAnalyser {
  /** Adds one sample; returns its measured slip ratio κ, or NaN when the sample is incomplete. */
  push(sample: LogSample): number
  /** Closes open events and returns the result; the analyser accepts no more samples. */
  finish(): AnalysisResult
}

const positivePart = positiveEnergyJ // local binding for the per-row path
const fin = (x: number | undefined): x is number => x !== undefined && x === x && x !== Infinity && x !== -Infinity

function checkAxis(name: string, axis: readonly number[]): void {
  if (!Array.isArray(axis) || axis.length < 1) throw new PhysicsInputError(name, 'needs at least one breakpoint')
  axis.forEach((x, i) => {
    requireFinite(`${name}[${i}]`, x)
    if (i > 0 && !(x > axis[i - 1])) throw new PhysicsInputError(`${name}[${i}]`, 'breakpoints must be strictly ascending')
  })
}

/**
 * Creates an analyser. Slip per sample follows SAE J670 / ISO 8855 through the physics `slipRatio`
 * (κ = (ΩR − V)/max(|V|, 0.5 m/s)) for each judged drive-wheel speed: side wheels corrected for the turn by
 * yaw rate, or a left/right pair averaged (`wheel-speed.ts`), then divided by the radius calibration's ratio.
 * The sample's slip is the judged value of largest magnitude. Events need |κ| and |wheel − road| beyond their
 * thresholds above the minimum speed, with hysteresis on the way out (`thresholds.ts`).
 * Throws {@link LogFormatError} when time is not finite or goes backwards; PhysicsInputError for bad options.
 * @example const a = createLogAnalyser({ surface: 'wet-asphalt' }); a.push(sample); a.finish().events
 */
export function createLogAnalyser(opts: LogAnalyserOptions = {}): LogAnalyser {
  const th = resolveThresholds(opts)
  const kind = opts.kind ?? 'drive'
  const maxGapS = opts.maxGapS === undefined ? 1 : requirePositive('maxGapS', opts.maxGapS)
  const releasedPct = opts.pedalReleasedPct ?? 1
  if (opts.map) { checkAxis('map.rowAxis', opts.map.rowAxis); checkAxis('map.colAxis', opts.map.colAxis) }
  const grid = opts.map ? createOccupancy(kind, opts.map.rowAxis, opts.map.colAxis) : null
  const reservoir = createReservoir(opts.reservoirSize ?? 16_384)
  const series = createSeries(opts.maxSeriesPoints ?? 2000)
  const detector = createEventDetector(th.minDurationS, opts.maxEvents ?? 10_000)
  const timeColumn = opts.timeColumn ?? null

  let n = 0, incomplete = 0, dup = 0, gapCount = 0, gapS = 0, t0 = 0, prevT = 0
  let prevRoad = NaN, prevPower = NaN, prevOccPedal = NaN, prevOccSpeed = NaN
  let distM = 0, drawnJ = 0, regenJ = 0, hasPower = false, maxRoad = -Infinity
  let moving = 0, slipMin = Infinity, slipMax = -Infinity, sumAbs = 0, maxAbs = 0
  let finished = false
  let openKind: 'spin' | 'lock' | null = null
  let yawCorrected = 0, leftRightMean = 0, uncorrected = 0
  let turn: 'yaw' | 'mean' | 'none' = 'none'
  const trackWidthM = opts.trackWidthM === undefined ? DEFAULT_DRIVE_TRACK_WIDTH_M : requirePositive('trackWidthM', opts.trackWidthM)
  let combiner: WheelCombiner | null = null
  let judged = new Float64Array(0)
  const cal = opts.radiusCalibration ?? null
  // ρ = R_nom/R_eff from the calibration pass: the wheel speeds the tyre really has are v_w/ρ.
  const wheelScale = cal && cal.status === 'applied' && cal.ratio !== null && cal.ratio > 0 ? 1 / cal.ratio : 1
  const spinExit = th.spinSlip * th.exitFraction, lockExit = th.lockSlip * th.exitFraction

  /** Spin or lock with hysteresis: entry needs |κ| and |Δv| beyond the entry thresholds, staying in only the exit ones. */
  function eventState(k: number, dvKmh: number): 'spin' | 'lock' | null {
    if (openKind === 'spin' && k > spinExit && dvKmh > th.exitSpeedDiffKmh) return 'spin'
    if (openKind === 'lock' && k < -lockExit && -dvKmh > th.exitSpeedDiffKmh) return 'lock'
    if (k > th.spinSlip && dvKmh >= th.minSpeedDiffKmh) return 'spin'
    if (k < -th.lockSlip && -dvKmh >= th.minSpeedDiffKmh) return 'lock'
    return null
  }
  const point: EventPoint = { timeS: 0, slip: 0, roadSpeedKmh: 0, accelPedalPct: 0, brakePedalPct: null }
  const seriesRow = [NaN, NaN, NaN, NaN, NaN, NaN]

  function push(s: LogSample): number {
    if (finished) throw new Error('createLogAnalyser: push after finish')
    const line = s.line ?? n + 2
    const t = s.timeS
    if (!fin(t)) throw new LogFormatError('row', line, timeColumn, 'time is missing or not a finite number')
    if (n > 0 && t < prevT) throw new LogFormatError('time-order', line, timeColumn, `time ${t} s is earlier than the previous row (${prevT} s); time must not decrease`)
    const road = s.roadSpeedKmh
    const pedal = s.accelPedalPct
    let kappa = NaN
    let wheelKmh = NaN
    if (fin(road) && fin(pedal)) {
      const ws = s.wheelSpeedsKmh
      if (combiner === null || combiner.size !== ws.length) { combiner = createWheelCombiner(opts.wheelChannels ?? ws.map(() => undefined), trackWidthM); judged = new Float64Array(combiner.size) }
      turn = combiner.combine(ws, s.yawRateRadS, judged, wheelScale)
      const vRoad = road / 3.6 // m/s, as kmhToMps
      const den = Math.max(Math.abs(vRoad), SLIP_SPEED_FLOOR_MPS)
      for (let w = 0; w < judged.length; w++) {
        const v = judged[w]
        if (!fin(v)) continue
        // physics slipRatio(kmhToMps(wheel), kmhToMps(road)) written out: this loop runs per wheel per row,
        // and its argument checks are already done here (both finite). A unit test pins the two equal.
        const k = (v / 3.6 - vRoad) / den
        if (!(Math.abs(k) <= Math.abs(kappa))) { kappa = k; wheelKmh = v }
      }
    }
    const complete = kappa === kappa
    const power = fin(s.batteryVoltageV) && fin(s.batteryCurrentA) ? s.batteryVoltageV * s.batteryCurrentA : NaN
    if (power === power) hasPower = true
    if (n === 0) t0 = t
    else {
      const dt = t - prevT
      if (dt === 0) dup++
      if (dt > maxGapS) { gapCount++; gapS += dt; if (openKind !== null) { detector.interrupt(); openKind = null } }
      else {
        if (fin(road) && prevRoad === prevRoad) distM += (0.5 * (prevRoad + road) / 3.6) * dt
        if (power === power && prevPower === prevPower) {
          drawnJ += positivePart(prevPower, power, dt)
          regenJ += positivePart(-prevPower, -power, dt)
        }
        if (grid) { if (prevOccPedal === prevOccPedal) grid.add(prevOccPedal, prevOccSpeed, dt); else grid.unassigned(dt) }
      }
    }
    const brake = fin(s.brakePedalPct) ? s.brakePedalPct : NaN
    if (complete) {
      if (turn === 'yaw') yawCorrected++; else if (turn === 'mean') leftRightMean++; else uncorrected++
      const isMoving = Math.max(Math.abs(road), Math.abs(wheelKmh)) >= th.minSpeedKmh
      const state = isMoving ? eventState(kappa, wheelKmh - road) : null
      if (state !== null || openKind !== null) { // most samples are in band with no event open: skip the call
        point.timeS = t; point.slip = kappa; point.roadSpeedKmh = road; point.accelPedalPct = pedal
        point.brakePedalPct = brake === brake ? brake : null
        detector.sample(state, point, line)
        openKind = state
      }
      if (isMoving) {
        moving++
        const a = Math.abs(kappa)
        sumAbs += a
        if (a > maxAbs) maxAbs = a
        if (kappa < slipMin) slipMin = kappa
        if (kappa > slipMax) slipMax = kappa
        reservoir.add(a)
      }
    } else { incomplete++; if (openKind !== null) { detector.interrupt(); openKind = null } }
    if (road > maxRoad) maxRoad = road
    // Occupancy state held until the next sample: drive by accelerator, regen by brake with the accelerator released.
    const occOk = complete && (kind === 'drive' || (brake === brake && pedal <= releasedPct))
    prevOccPedal = occOk ? (kind === 'drive' ? pedal : brake) : NaN
    prevOccSpeed = road
    prevRoad = fin(road) ? road : NaN
    prevPower = power
    prevT = t
    seriesRow[0] = road; seriesRow[1] = wheelKmh; seriesRow[2] = pedal; seriesRow[3] = brake
    seriesRow[4] = fin(s.motorTorqueNm) ? s.motorTorqueNm : NaN; seriesRow[5] = kappa
    series.add(t, seriesRow)
    n++
    return kappa
  }

  function finish(): AnalysisResult {
    finished = true
    detector.interrupt()
    const [p50, p95, p99] = reservoir.quantiles([0.5, 0.95, 0.99])
    const durationS = n > 0 ? prevT - t0 : 0
    return {
      samples: n,
      incompleteSamples: incomplete,
      startS: n > 0 ? t0 : 0,
      endS: n > 0 ? prevT : 0,
      durationS,
      gaps: { count: gapCount, totalS: gapS },
      coveredS: durationS - gapS,
      duplicateTimestamps: dup,
      distanceKm: distM / 1000,
      maxRoadSpeedKmh: maxRoad === -Infinity ? 0 : maxRoad,
      energy: hasPower ? { drawnKWh: drawnJ / J_PER_KWH, regeneratedKWh: regenJ / J_PER_KWH, netKWh: (drawnJ - regenJ) / J_PER_KWH } : null,
      slip: {
        movingSamples: moving,
        min: moving ? slipMin : null,
        max: moving ? slipMax : null,
        meanAbs: moving ? sumAbs / moving : null,
        maxAbs: moving ? maxAbs : null,
        p50Abs: p50, p95Abs: p95, p99Abs: p99,
        quantiles: reservoir.exact ? 'exact' : 'reservoir',
      },
      thresholds: th,
      turns: { yawCorrected, leftRightMean, uncorrected, trackWidthM },
      calibration: cal,
      events: detector.events.slice(),
      eventsDropped: detector.dropped,
      shortExcursions: detector.short,
      occupancy: grid ? grid.result() : null,
      series: series.result(),
    }
  }

  return { push, finish }
}
