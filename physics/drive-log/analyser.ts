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
 * (κ = (ΩR − V)/max(|V|, 0.5 m/s)) for each logged drive wheel; the sample's slip is the wheel value of
 * largest magnitude, so one wheel spinning on an open differential is not averaged away.
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
  let eventOpen = false
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
      const vRoad = road / 3.6 // m/s, as kmhToMps
      const den = Math.max(Math.abs(vRoad), SLIP_SPEED_FLOOR_MPS)
      for (let w = 0; w < ws.length; w++) {
        if (!fin(ws[w])) continue
        // physics slipRatio(kmhToMps(wheel), kmhToMps(road)) written out: this loop runs per wheel per row,
        // and its argument checks are already done here (both finite). A unit test pins the two equal.
        const k = (ws[w] / 3.6 - vRoad) / den
        if (!(Math.abs(k) <= Math.abs(kappa))) { kappa = k; wheelKmh = ws[w] }
      }
    }
    const complete = kappa === kappa
    const power = fin(s.batteryVoltageV) && fin(s.batteryCurrentA) ? s.batteryVoltageV * s.batteryCurrentA : NaN
    if (power === power) hasPower = true
    if (n === 0) t0 = t
    else {
      const dt = t - prevT
      if (dt === 0) dup++
      if (dt > maxGapS) { gapCount++; gapS += dt; if (eventOpen) { detector.interrupt(); eventOpen = false } }
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
      const isMoving = Math.max(Math.abs(road), Math.abs(wheelKmh)) >= th.minSpeedKmh
      const state = isMoving ? (kappa > th.spinSlip ? 'spin' : kappa < -th.lockSlip ? 'lock' : null) : null
      if (state !== null || eventOpen) { // most samples are in band with no event open: skip the call
        point.timeS = t; point.slip = kappa; point.roadSpeedKmh = road; point.accelPedalPct = pedal
        point.brakePedalPct = brake === brake ? brake : null
        detector.sample(state, point, line)
        eventOpen = state !== null
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
    } else { incomplete++; if (eventOpen) { detector.interrupt(); eventOpen = false } }
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
      events: detector.events.slice(),
      eventsDropped: detector.dropped,
      shortExcursions: detector.short,
      occupancy: grid ? grid.result() : null,
      series: series.result(),
    }
  }

  return { push, finish }
}
