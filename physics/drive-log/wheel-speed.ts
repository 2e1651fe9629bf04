/**
 * From the logged drive-wheel speeds to the speeds slip is judged on, so that a turn does not read as slip.
 *
 * Kinematics of a rigid axle yawing at ψ̇ (positive left, ISO 8855): a point at lateral offset y from the axle
 * centre (y positive left) moves forward at v_c − ψ̇·y. With track width b the inner wheel of a turn runs ψ̇·b/2
 * slower and the outer ψ̇·b/2 faster than the axle centre (Gillespie, *Fundamentals of Vehicle Dynamics*, ch. 6,
 * low-speed turning; Wong, *Theory of Ground Vehicles*, ch. 5). At 20 km/h on a 15 m radius (ψ̇ = 0.37 rad/s) with
 * b = 1.8 m that is ±6 % of v_c — more than a wet-road spin threshold.
 *  • Yaw rate logged: each side wheel is corrected, left + ψ̇·b/2 and right − ψ̇·b/2, and judged on its own
 *    (one wheel spinning on an open differential stays visible at full size).
 *  • No yaw rate, both wheels of an axle logged: their mean, which is the axle centre's speed and, with an open
 *    differential, the carrier's (propeller-shaft) speed the motor drives.
 *  • One side only, or a combined channel: used as logged (a combined channel is normally the axle mean already).
 */
import type { WheelChannel } from './columns'

/**
 * Default track width of a truck drive axle, m: between the centres of the dual pairs, ≈ 1.8 m on a 2.55 m wide
 * vehicle (common practice; recalled from memory). A 5 % error in b changes the yaw correction by 5 %, i.e. 0.3 %
 * of slip in the tight turn above.
 */
export const DEFAULT_DRIVE_TRACK_WIDTH_M = 1.8

/** Turns the logged wheel speeds of one sample into judged speeds, km/h. */
export interface WheelCombiner {
  /**
   * Writes the judged wheel speeds into `out` (NaN where nothing can be judged) and returns how the turn was
   * handled for this sample: 'yaw' (side wheels corrected), 'mean' (left/right averaged) or 'none'. `scale`
   * (default 1) multiplies the logged speeds first: the radius calibration's 1/ρ gives the true tread speeds,
   * and the turn's ±ψ̇·b/2 belongs to those.
   */
  combine(speedsKmh: readonly number[], yawRadS: number | undefined, out: Float64Array, scale?: number): 'yaw' | 'mean' | 'none'
  /** Length `out` needs: one entry per logged wheel. */
  readonly size: number
}

const fin = (x: number | undefined): x is number => x !== undefined && x === x && x !== Infinity && x !== -Infinity

/**
 * @param channels the channel of each entry of `LogSample.wheelSpeedsKmh`; unnamed entries are independent wheels
 * @param trackWidthM track width b, m (> 0)
 * @example createWheelCombiner(['wheelLeft', 'wheelRight'], 1.8).combine([35, 37], undefined, out) // 'mean', out = [36, NaN]
 */
export function createWheelCombiner(channels: readonly (WheelChannel | undefined)[], trackWidthM: number): WheelCombiner {
  const size = channels.length
  const side = channels.map((c) => (c === 'wheelLeft' || c === 'wheelLeft2' ? 1 : c === 'wheelRight' || c === 'wheelRight2' ? -1 : 0))
  // Partner index of each side wheel on the same axle, or −1.
  const partner = channels.map((c) => {
    const other = c === 'wheelLeft' ? 'wheelRight' : c === 'wheelRight' ? 'wheelLeft' : c === 'wheelLeft2' ? 'wheelRight2' : c === 'wheelRight2' ? 'wheelLeft2' : null
    return other === null ? -1 : channels.indexOf(other)
  })
  const halfTrackKmh = (trackWidthM / 2) * 3.6 // ψ̇[rad/s]·(b/2)[m] is m/s; × 3.6 for km/h
  return {
    size,
    combine(speeds, yaw, out, scale = 1) {
      if (fin(yaw)) {
        let any = false
        for (let w = 0; w < size; w++) {
          out[w] = speeds[w] * scale + side[w] * yaw * halfTrackKmh // the inner wheel (side · ψ̇ < 0) is raised back to v_c
          if (side[w] !== 0) any = true
        }
        return any ? 'yaw' : 'none'
      }
      let mean = false
      for (let w = 0; w < size; w++) {
        const p = partner[w]
        if (p < 0 || !fin(speeds[p])) out[w] = speeds[w] * scale
        else if (side[w] > 0 && fin(speeds[w])) { out[w] = 0.5 * (speeds[w] + speeds[p]) * scale; mean = true }
        else out[w] = NaN // the right wheel of a pair: its mean is already in the left wheel's slot
      }
      return mean ? 'mean' : 'none'
    },
  }
}
