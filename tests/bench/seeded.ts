/** Seeded data shared by the benchmarks: a 32 × 32 / 24 × 24 drive map (random source: physics/random.ts). */
import { limitsFromVehicle, motorEnvelopeAt, type MapTable } from '@/maps'
import type { VehicleParams } from '@/physics'
import { mulberry32 } from '@/physics/random'

/** Evenly spaced ascending axis from `lo` to `hi`, rounded to 0.1. */
function axis(n: number, lo: number, hi: number): number[] {
  return Array.from({ length: n }, (_, i) => Math.round((lo + ((hi - lo) * i) / (n - 1)) * 10) / 10)
}

/**
 * A plausible drive map of `size` × `size` cells for `vehicle`: torque rising with pedal up to the
 * motor envelope, with a little seeded jitter (kept under the envelope and non-decreasing in pedal).
 */
export function seededDriveMap(vehicle: VehicleParams, size: number, seed: number): MapTable {
  const rnd = mulberry32(seed)
  const limits = limitsFromVehicle(vehicle)
  const rowAxis = axis(size, 0, 100)
  const colAxis = axis(size, 0, 90)
  const values = rowAxis.map((p) => colAxis.map((s) => Math.floor((p / 100) ** 1.2 * motorEnvelopeAt(limits, s) * (0.9 + 0.1 * rnd()))))
  for (let c = 0; c < size; c++) for (let r = 1; r < size; r++) values[r][c] = Math.max(values[r][c], values[r - 1][c])
  return { kind: 'drive', rowAxis, colAxis, values }
}
