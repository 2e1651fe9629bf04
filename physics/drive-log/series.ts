/**
 * Streaming min/max downsampler for plots. Time is cut into equal buckets from the first sample; when
 * the log outgrows the bucket budget, neighbouring buckets merge pairwise and the width doubles, so
 * memory stays fixed and the result does not depend on how the log was chunked. Keeping each bucket's
 * minimum and maximum (instead of a mean) lets a one-sample slip spike survive.
 */
import type { DownsampledSeries, SeriesChannel } from './types'

/** Plotted channels, in the order of the values passed to `add`. */
export const SERIES_CHANNELS = ['roadSpeedKmh', 'wheelSpeedKmh', 'accelPedalPct', 'brakePedalPct', 'motorTorqueNm', 'slip'] as const
const NCH = SERIES_CHANNELS.length

/** Accumulator; `add` takes one value per channel (NaN = none). */
export interface SeriesBuilder {
  add(timeS: number, values: readonly number[]): void
  result(): DownsampledSeries
}

/** @example const s = createSeries(2000); s.add(0, [10, 10, 5, 0, 100, 0]); s.result().tS // [0] */
export function createSeries(maxPoints: number, initialBucketS = 0.02): SeriesBuilder {
  const nb = Math.max(1, Math.floor(maxPoints / 2))
  const lo = new Float64Array(nb * NCH).fill(Infinity)
  const hi = new Float64Array(nb * NCH).fill(-Infinity)
  let t0 = NaN
  let width = initialBucketS
  let used = 0
  const mergePairs = () => {
    for (let b = 0; b < nb; b++) {
      for (let c = 0; c < NCH; c++) {
        const a = 2 * b < nb ? 2 * b * NCH + c : -1
        const z = 2 * b + 1 < nb ? (2 * b + 1) * NCH + c : -1
        const l = Math.min(a >= 0 ? lo[a] : Infinity, z >= 0 ? lo[z] : Infinity)
        const h = Math.max(a >= 0 ? hi[a] : -Infinity, z >= 0 ? hi[z] : -Infinity)
        lo[b * NCH + c] = l
        hi[b * NCH + c] = h
      }
    }
    width *= 2
    used = Math.ceil(used / 2)
  }
  return {
    add(timeS, values) {
      if (Number.isNaN(t0)) t0 = timeS
      let b = Math.floor((timeS - t0) / width)
      while (b >= nb) { mergePairs(); b = Math.floor((timeS - t0) / width) }
      if (b + 1 > used) used = b + 1
      const k = b * NCH
      for (let c = 0; c < NCH; c++) {
        const v = values[c]
        if (v < lo[k + c]) lo[k + c] = v // NaN compares false: missing values never enter
        if (v > hi[k + c]) hi[k + c] = v
      }
    },
    result() {
      const channel = (c: number): SeriesChannel => {
        const min: (number | null)[] = []
        const max: (number | null)[] = []
        for (let b = 0; b < used; b++) {
          const l = lo[b * NCH + c]
          const h = hi[b * NCH + c]
          min.push(l === Infinity ? null : l)
          max.push(h === -Infinity ? null : h)
        }
        return { min, max }
      }
      const out: DownsampledSeries = {
        bucketS: width,
        tS: Array.from({ length: used }, (_, b) => (Number.isNaN(t0) ? 0 : t0) + b * width),
        roadSpeedKmh: channel(0), wheelSpeedKmh: channel(1), accelPedalPct: channel(2),
        brakePedalPct: channel(3), motorTorqueNm: channel(4), slip: channel(5),
      }
      return out
    },
  }
}
