/**
 * One seeded pseudo-random source for the analyser and the tests: mulberry32, a 32-bit
 * generator that is small, fast and gives the same sequence on every machine (so a log always
 * gives the same percentiles, and generated test data is reproducible). Not for anything secret.
 */

/**
 * A generator returning numbers in [0, 1), fully determined by `seed` (taken as uint32).
 * @example const rnd = mulberry32(1); rnd() // 0.6270739405881613, the same on every run
 */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0
  return () => {
    a = (a + 0x6d2b79f5) >>> 0
    let t = a
    t = Math.imul(t ^ (t >>> 15), t | 1)
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61)
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296
  }
}
