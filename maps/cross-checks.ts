/**
 * Checks across the two maps of a set, which neither map's own validation can see. Pure.
 * Regen values are braking magnitudes (≥ 0); drive values are drive torque requests.
 */
import { lookup } from './lookup'
import type { MapTable } from './table'

export interface CrossCheck {
  id: 'lift-off-overlap' | 'lift-off-gap' | 'speed-coverage'
  severity: 'warning' | 'note'
  message: string
  /** Road speeds the check concerns, km/h. */
  speedsKmh: number[]
}

const round = (x: number, d = 1) => Math.round(x * 10 ** d) / 10 ** d
const speeds = (a: MapTable, b: MapTable) => [...new Set([...a.colAxis, ...b.colAxis])].sort((x, y) => x - y)

/**
 * What happens when the driver lifts off, as the two maps say it: the drive map at 0 % pedal and
 * the regen map's lift-off row (0 % brake pedal). Both asking for torque at one speed means the
 * controller adds a drive request to a regen request; neither asking at speed means the truck
 * coasts with no engine braking where the engineer may expect it.
 * @example crossChecks(drive, regen).map((c) => c.id) // ['lift-off-overlap']
 */
export function crossChecks(drive: MapTable, regen: MapTable): CrossCheck[] {
  const out: CrossCheck[] = []
  const all = speeds(drive, regen)
  const both = all.filter((v) => lookup(drive, 0, v) > 0.5 && lookup(regen, 0, v) > 0.5)
  if (both.length)
    out.push({
      id: 'lift-off-overlap',
      severity: 'warning',
      message: `At lift-off both maps ask for torque at ${both.map((v) => `${round(v)} km/h`).join(', ')}: the drive map at 0 % pedal (up to ${round(Math.max(...both.map((v) => lookup(drive, 0, v))))} N·m) and the regen lift-off row (up to ${round(Math.max(...both.map((v) => lookup(regen, 0, v))))} N·m) work against each other`,
      speedsKmh: both,
    })
  // Above walking pace a lift-off that neither drives nor brakes is worth a look (creep ends, regen has not begun).
  const none = all.filter((v) => v >= 10 && lookup(drive, 0, v) <= 0.5 && lookup(regen, 0, v) <= 0.5)
  if (none.length)
    out.push({
      id: 'lift-off-gap',
      severity: 'note',
      message: `At lift-off neither map asks for torque at ${none.map((v) => `${round(v)} km/h`).join(', ')}: the truck coasts there with no regen`,
      speedsKmh: none,
    })
  const dMax = drive.colAxis[drive.colAxis.length - 1]
  const rMax = regen.colAxis[regen.colAxis.length - 1]
  if (dMax !== rMax)
    out.push({
      id: 'speed-coverage',
      severity: 'note',
      message: `The speed axes end at different speeds (drive ${round(dMax)} km/h, regen ${round(rMax)} km/h): above ${round(Math.min(dMax, rMax))} km/h the ${dMax < rMax ? 'drive' : 'regen'} map holds its last column`,
      speedsKmh: [Math.min(dMax, rMax)],
    })
  return out
}
