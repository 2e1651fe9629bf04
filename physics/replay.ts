/**
 * Replay of a logged drive through map sets: at every logged sample, the torque each set would
 * have requested (the set the truck drove and a candidate), both through their own ramp limits over
 * the logged time, and the slip the candidate's request would give under its parameter version on
 * the report's surface and load case, beside the slip measured in the log. Streaming: samples are
 * pushed one by one and only bounded state is kept (a summary, a grid of the candidate's drive map
 * and downsampled traces), so a long log replays in one pass.
 *
 * Assumptions (docs/physics.md): the driver's pedal and the road speed are taken as logged — a driver
 * would have pressed differently on a different map, so this answers "what would the candidate have
 * asked for on the same pedal", not "what would the drive have been".
 */
import { rampStep, type RampLimits } from '../maps/ramps'
import { prepareCellSlip } from './cell-slip'
import { setRequest } from './drivability'
import { findInterval, type MapTable } from './table'
import { checkMap, lookup } from './table-lookup'
import type { SurfaceId } from './surfaces'
import type { LoadCase, VehicleParams } from './vehicle'

export interface ReplaySetParts {
  drive: MapTable | null
  regen: MapTable | null
  ramps: RampLimits | null
}

export interface ReplayOptions {
  driven: ReplaySetParts
  candidate: ReplaySetParts & { vehicle: VehicleParams }
  surface: SurfaceId
  loadCase: LoadCase
  /** The candidate "asks for more" only beyond this many N·m above the driven request. Default 25. */
  marginNm?: number
  /** Plotted points, at most (each a bucket's last sample and its extremes). Default 2000. */
  maxPoints?: number
  /** A time step longer than this is a gap: the ramps restart at the request, nothing is integrated. Default 1 s. */
  maxGapS?: number
}

export interface ReplaySample {
  timeS: number
  roadSpeedKmh: number
  accelPedalPct: number
  brakePedalPct?: number
  /** Slip measured in the log at this sample (NaN when it could not be judged). */
  measuredSlip: number
}

export interface ReplayCell { row: number; col: number; pedalPct: number; speedKmh: number; seconds: number; worstExcessNm: number }

export interface ReplayResult {
  samples: number
  seconds: number
  /** Time, and its share of the replayed time, in which the candidate asks for more than was driven (beyond the margin). */
  moreSeconds: number
  moreShare: number
  /** Largest excess of the candidate over the driven request, N·m, and when. */
  worstExcessNm: number
  worstAtS: number | null
  /** Cells of the candidate's drive map (by the logged pedal and speed) where it asked for more, most time first (up to 20). */
  worstCells: ReplayCell[]
  /** Peak predicted slip under the candidate (null where beyond the tyre's peak counts as spin) and peak measured slip. */
  predictedPeakSlip: number
  predictedSpinSeconds: number
  measuredPeakSlip: number
  /** The candidate's drive-map grid of excess time (rows × cols), for the difference on the map. */
  grid: { rowAxis: number[]; colAxis: number[]; seconds: number[][]; worstExcessNm: number[][] } | null
  series: { t: number[]; drivenNm: number[]; candidateNm: number[]; predictedSlip: (number | null)[]; measuredSlip: (number | null)[]; roadSpeedKmh: number[]; accelPedalPct: number[] }
}

export interface Replayer {
  push(s: ReplaySample): void
  finish(): ReplayResult
}

/** The request of one set at a sample: drive map at the pedal, less lift-off regen at pedal 0, less the brake-pedal regen. */
function requestOf(p: ReplaySetParts): (pedal: number, brake: number, kmh: number) => number {
  const base = p.drive ? setRequest(p.drive, p.regen) : null
  return (pedal, brake, kmh) => {
    let t = base ? base(pedal, kmh) : 0
    if (p.regen && brake > 0 && pedal <= 0) t -= lookup(p.regen, brake, kmh) - lookup(p.regen, 0, kmh)
    return t
  }
}

/** Starts a replay. Throws PhysicsInputError (via cell slip) for a bad vehicle, surface or load case. */
export function createReplayer(o: ReplayOptions): Replayer {
  const margin = o.marginNm ?? 25
  const maxPoints = Math.max(10, o.maxPoints ?? 2000)
  const maxGapS = o.maxGapS ?? 1
  for (const [name, m] of [['driven.drive', o.driven.drive], ['driven.regen', o.driven.regen], ['candidate.drive', o.candidate.drive], ['candidate.regen', o.candidate.regen]] as const) if (m) checkMap(m, `${name}.`)
  const driven = requestOf(o.driven)
  const cand = requestOf(o.candidate)
  const slipAt = prepareCellSlip({ vehicle: o.candidate.vehicle, loadCase: o.loadCase, surface: o.surface })
  const map = o.candidate.drive
  const grid = map ? { rowAxis: [...map.rowAxis], colAxis: [...map.colAxis], seconds: map.rowAxis.map(() => map.colAxis.map(() => 0)), worstExcessNm: map.rowAxis.map(() => map.colAxis.map(() => 0)) } : null

  let n = 0, seconds = 0, more = 0, worst = 0, worstAt: number | null = null
  let predPeak = 0, spinS = 0, measPeak = 0
  let prevT = NaN, cmdD = 0, cmdC = 0
  // Downsampling: the buffer keeps every sample until it doubles the budget, then every other one.
  let stride = 1
  const series: ReplayResult['series'] = { t: [], drivenNm: [], candidateNm: [], predictedSlip: [], measuredSlip: [], roadSpeedKmh: [], accelPedalPct: [] }
  const thin = () => {
    for (const k of Object.keys(series) as (keyof typeof series)[]) (series[k] as unknown[]) = (series[k] as unknown[]).filter((_, i) => i % 2 === 0)
    stride *= 2
  }
  const nearest = (axis: number[], x: number) => {
    const i = findInterval(axis, x)
    return i + 1 < axis.length && Math.abs(axis[i + 1] - x) < Math.abs(x - axis[i]) ? i + 1 : i
  }

  return {
    push(s) {
      const pedal = Number.isFinite(s.accelPedalPct) ? s.accelPedalPct : 0
      const brake = s.brakePedalPct !== undefined && Number.isFinite(s.brakePedalPct) ? s.brakePedalPct : 0
      const kmh = Math.max(0, Number.isFinite(s.roadSpeedKmh) ? s.roadSpeedKmh : 0)
      const reqD = driven(pedal, brake, kmh)
      const reqC = cand(pedal, brake, kmh)
      const dt = s.timeS - prevT
      const fresh = !(dt > 0 && dt <= maxGapS)
      // After a gap (or at the start) each controller is taken to hold its request; otherwise it ramps.
      cmdD = fresh || !o.driven.ramps ? reqD : rampStep(o.driven.ramps, cmdD, reqD, kmh, dt)
      cmdC = fresh || !o.candidate.ramps ? reqC : rampStep(o.candidate.ramps, cmdC, reqC, kmh, dt)
      const step = fresh ? 0 : dt
      prevT = s.timeS
      n++
      seconds += step
      const excess = Math.abs(cmdC) - Math.abs(cmdD)
      if (excess > margin) {
        more += step
        if (excess > worst + 1e-9) { worst = excess; worstAt = s.timeS } // the first instant of the worst, not float noise after it
        if (grid && map && cmdC > 0) {
          const r = nearest(grid.rowAxis, pedal), c = nearest(grid.colAxis, kmh)
          grid.seconds[r][c] += step
          grid.worstExcessNm[r][c] = Math.max(grid.worstExcessNm[r][c], excess)
        }
      }
      const pred = slipAt(cmdC, kmh)
      const predSlip = pred.slip
      if (predSlip === null) spinS += step
      else if (Math.abs(predSlip) > Math.abs(predPeak)) predPeak = predSlip
      if (Number.isFinite(s.measuredSlip) && Math.abs(s.measuredSlip) > Math.abs(measPeak)) measPeak = s.measuredSlip
      if ((n - 1) % stride === 0) {
        series.t.push(s.timeS)
        series.drivenNm.push(cmdD)
        series.candidateNm.push(cmdC)
        series.predictedSlip.push(predSlip)
        series.measuredSlip.push(Number.isFinite(s.measuredSlip) ? s.measuredSlip : null)
        series.roadSpeedKmh.push(kmh)
        series.accelPedalPct.push(pedal)
        if (series.t.length >= 2 * maxPoints) thin()
      }
    },
    finish() {
      const worstCells: ReplayCell[] = []
      if (grid)
        grid.seconds.forEach((row, r) => row.forEach((sec, c) => {
          if (sec > 0) worstCells.push({ row: r, col: c, pedalPct: grid.rowAxis[r], speedKmh: grid.colAxis[c], seconds: sec, worstExcessNm: grid.worstExcessNm[r][c] })
        }))
      worstCells.sort((a, b) => b.seconds - a.seconds || b.worstExcessNm - a.worstExcessNm)
      return {
        samples: n, seconds, moreSeconds: more, moreShare: seconds > 0 ? more / seconds : 0, worstExcessNm: worst, worstAtS: worstAt,
        worstCells: worstCells.slice(0, 20), predictedPeakSlip: predPeak, predictedSpinSeconds: spinS, measuredPeakSlip: measPeak, grid, series,
      }
    },
  }
}
