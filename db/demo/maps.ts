import { chargeLimitTorqueAt, limitsFromVehicle, motorEnvelopeAt, type MapKind, type MapTable } from '../../maps'
import type { VehicleParams } from '../../physics/vehicle'

// INVENTED demo maps: shapes a calibration engineer might plausibly start from, not data from any vehicle.

const PEDAL = [0, 5, 10, 20, 30, 40, 50, 60, 70, 80, 90, 100]
const SPEED = [0, 3, 6, 10, 15, 20, 30, 40, 50, 60, 70, 80, 90]
const BRAKE = [0, 10, 20, 35, 50, 70, 100]

// Round down to 10 N·m so a value capped at a limit never ends up above it.
const round10 = (v: number) => Math.floor(v / 10 + 1e-9) * 10

/** A drive map: creep at 0 % pedal, torque rising as (pedal)^gamma up to `share` of the motor envelope. */
export function demoDriveTable(v: VehicleParams, opts: { gamma: number; share: number; launchCapNm?: number }): MapTable {
  const limits = limitsFromVehicle(v)
  const values = PEDAL.map((p) =>
    SPEED.map((s) => {
      const env = motorEnvelopeAt(limits, s)
      const creep = s < 6 ? 150 * (1 - s / 6) : 0
      let t = Math.max(creep, env * opts.share * Math.pow(p / 100, opts.gamma))
      if (opts.launchCapNm !== undefined && s <= 10) t = Math.min(t, opts.launchCapNm + (env - opts.launchCapNm) * (s / 10) * 0.5)
      return round10(Math.min(t, env))
    }),
  )
  // Rounding and the cap can break pedal order by a few N·m: keep each speed column non-decreasing.
  for (let c = 0; c < SPEED.length; c++) for (let r = 1; r < PEDAL.length; r++) values[r][c] = Math.max(values[r][c], values[r - 1][c])
  return { kind: 'drive', rowAxis: PEDAL, colAxis: SPEED, values }
}

/** A regen map: the 0 % row is lift-off regen, more with brake pedal, held 5 % under the charge-power limit. */
export function demoRegenTable(v: VehicleParams, opts: { liftOffNm: number; maxNm: number }): MapTable {
  const limits = limitsFromVehicle(v)
  const values = BRAKE.map((b) =>
    SPEED.map((s) => {
      const fadeIn = Math.min(1, s / 10) // no regen at standstill: the friction brakes hold the truck
      const want = (opts.liftOffNm + (opts.maxNm - opts.liftOffNm) * (b / 100)) * fadeIn
      return round10(Math.min(want, chargeLimitTorqueAt(limits, s) * 0.95, motorEnvelopeAt(limits, s)))
    }),
  )
  return { kind: 'regen', rowAxis: BRAKE, colAxis: SPEED, values }
}

export interface DemoRevision {
  message: string
  notes?: string
  table: MapTable
}

export interface DemoMapHistory {
  program: string
  name: string
  kind: MapKind
  description: string
  revisions: DemoRevision[]
}

/** Revision histories for the demo maps, oldest first. */
export function demoMapHistories(tipper: VehicleParams, tractor: VehicleParams): DemoMapHistory[] {
  return [
    {
      program: 'BX-64 Tipper',
      name: 'Site drive',
      kind: 'drive',
      description: 'Demo: accelerator map for quarry and site roads.',
      revisions: [
        { message: 'Starting point: near-linear pedal, full envelope', table: demoDriveTable(tipper, { gamma: 1.1, share: 1 }) },
        { message: 'Softer tip-in below 30 % pedal after driver comments', table: demoDriveTable(tipper, { gamma: 1.5, share: 1 }) },
        {
          message: 'Cap launch torque for wet gravel when empty',
          notes: 'Empty truck spun the rear tandem on wet gravel at about 40 % pedal. Capped torque below 10 km/h.',
          table: demoDriveTable(tipper, { gamma: 1.5, share: 1, launchCapNm: 1600 }),
        },
      ],
    },
    {
      program: 'BX-64 Tipper',
      name: 'Site regen',
      kind: 'regen',
      description: 'Demo: brake-pedal regen map; the 0 % row is lift-off regen.',
      revisions: [
        { message: 'Starting point: strong lift-off regen', table: demoRegenTable(tipper, { liftOffNm: 900, maxNm: 2400 }) },
        { message: 'Less lift-off regen for loose surfaces', table: demoRegenTable(tipper, { liftOffNm: 500, maxNm: 2400 }) },
      ],
    },
    {
      program: 'BX-64 Tractor',
      name: 'Road drive',
      kind: 'drive',
      description: 'Demo: accelerator map for the tractor-semitrailer on public roads.',
      revisions: [
        { message: 'Starting point from the tipper shape', table: demoDriveTable(tractor, { gamma: 1.5, share: 1 }) },
        { message: 'Gentler launch when solo (no trailer)', table: demoDriveTable(tractor, { gamma: 1.6, share: 0.95, launchCapNm: 2000 }) },
      ],
    },
    {
      program: 'BX-64 Tractor',
      name: 'Road regen',
      kind: 'regen',
      description: 'Demo: brake-pedal regen map for the tractor; the 0 % row is lift-off regen.',
      revisions: [{ message: 'Starting point: moderate lift-off regen', table: demoRegenTable(tractor, { liftOffNm: 600, maxNm: 2800 }) }],
    },
  ]
}
