/**
 * Test fixtures in one place: invented vehicles with round numbers (envelopes can be worked out by
 * hand from P = T·ω), small tables inside or outside those envelopes, and, for integration tests,
 * a vehicle program with a map created through the real API. No real product or company.
 */
import type { PublicUser } from '@/db/queries/users'
import type { MapKind, MapTable } from '@/maps'
import type { VehicleParams } from '@/physics'

// ---- Vehicles -------------------------------------------------------------------------------

/**
 * A single-speed 6×4 with round numbers. Wheel radius 0.5 m, gear 9 × final drive 2 = 18: ω = v/3.6/0.5·18 = 10 rad/s per km/h.
 * 2,000 N·m and 300 kW: base speed 150 rad/s = 15 km/h. 9,000 rpm = 942.48 rad/s = 94.25 km/h.
 */
export const vehicle: VehicleParams = {
  axleLayout: '6x4',
  emptyMassKg: 12_000,
  grossMassKg: 26_000,
  wheelbaseM: 4.2,
  emptyCgToFrontAxleM: 1.8,
  emptyCgHeightM: 1.1,
  ladenCgToFrontAxleM: 2.4,
  ladenCgHeightM: 1.6,
  wheelRadiusM: 0.5,
  gearRatios: [9],
  finalDriveRatio: 2,
  drivelineEfficiency: 0.95,
  motorPeakTorqueNm: 2000,
  motorPeakPowerW: 300_000,
  motorMaxSpeedRpm: 9000,
  batteryDischargePowerW: 350_000,
  batteryChargePowerW: 200_000,
  frontalAreaM2: 9,
  dragCoefficient: 0.6,
  rollingResistanceCoeff: 0.006,
  motorInertiaKgM2: 0.3,
  driveWheelsInertiaKgM2: 60,
}

/** A 4×2 e-tractor with a semitrailer (invented). */
export const tractor: VehicleParams = {
  axleLayout: '4x2',
  emptyMassKg: 9000,
  grossMassKg: 19000,
  wheelbaseM: 3.8,
  emptyCgToFrontAxleM: 1.6,
  emptyCgHeightM: 1.1,
  ladenCgToFrontAxleM: 2.3,
  ladenCgHeightM: 1.6,
  wheelRadiusM: 0.5,
  gearRatios: [2],
  finalDriveRatio: 6,
  drivelineEfficiency: 0.95,
  motorPeakTorqueNm: 3000,
  motorPeakPowerW: 450_000,
  motorMaxSpeedRpm: 6000,
  batteryDischargePowerW: 500_000,
  batteryChargePowerW: 350_000,
  frontalAreaM2: 9.5,
  dragCoefficient: 0.6,
  rollingResistanceCoeff: 0.006,
  motorInertiaKgM2: 0.5,
  driveWheelsInertiaKgM2: 60,
  trailer: {
    fifthWheelToFrontAxleM: 3.5,
    fifthWheelHeightM: 1.2,
    kingpinToAxleM: 8,
    emptyMassKg: 7000,
    grossMassKg: 30000,
    emptyCgToKingpinM: 5.5,
    emptyCgHeightM: 1.3,
    ladenCgToKingpinM: 4.8,
    ladenCgHeightM: 2.0,
  },
}

export const rigid6x4: VehicleParams = { ...tractor, axleLayout: '6x4', wheelbaseM: 5.2, emptyCgToFrontAxleM: 2.4, ladenCgToFrontAxleM: 3.4, trailer: null }

// ---- Tables ---------------------------------------------------------------------------------

/** Hand envelope for `vehicle`: min(2000, 300000 / (10·v)), 0 above 94.25 km/h. */
export function handEnvelope(speedKmh: number): number {
  const omega = (speedKmh / 3.6 / 0.5) * 18
  if (speedKmh > (9000 * 2 * Math.PI) / 60 / 10) return 0
  return omega === 0 ? 2000 : Math.min(2000, 300_000 / omega)
}

/** Hand charge-limited braking torque: 200 kW / ω. */
export function handChargeLimit(speedKmh: number): number {
  const omega = (speedKmh / 3.6 / 0.5) * 18
  return omega === 0 ? Infinity : 200_000 / omega
}

export const SPEEDS = [0, 10, 15, 20, 30, 60, 90]
export const PEDALS = [0, 25, 50, 75, 100]

/**
 * values[r][c] = pedal share × factor × bound(speed): within every rule when factor ≤ 0.7
 * (vertical steps ≤ 0.25·0.7·2000 = 350 N·m, horizontal ≤ 0.7·533 N·m; chords under the curve).
 */
export function insideTable(kind: MapKind, factor = 0.7): MapTable {
  const bound = (s: number) => (kind === 'regen' ? Math.min(handEnvelope(s), handChargeLimit(s)) : handEnvelope(s))
  return {
    kind,
    rowAxis: [...PEDALS],
    colAxis: [...SPEEDS],
    values: PEDALS.map((p) => SPEEDS.map((s) => (p / 100) * factor * bound(s))),
  }
}

/** A small hand-written drive table for editing tests. */
export function small(): MapTable {
  return {
    kind: 'drive',
    rowAxis: [0, 50, 100],
    colAxis: [0, 10, 40],
    values: [
      [0, 0, 0],
      [400, 300, 100],
      [800, 700, 400],
    ],
  }
}

/** Freeze recursively so any mutation by the code under test throws (ES modules are strict). */
export function deepFreeze<T>(x: T): T {
  if (typeof x === 'object' && x !== null) {
    for (const v of Object.values(x)) deepFreeze(v)
    Object.freeze(x)
  }
  return x
}

export const SMALL_DRIVE: MapTable = {
  kind: 'drive',
  rowAxis: [0, 50, 100],
  colAxis: [0, 20, 60],
  values: [
    [100, 0, 0],
    [800, 700, 400],
    [1600, 1500, 800],
  ],
}

export function withCell(t: MapTable, r: number, c: number, v: number): MapTable {
  return { ...t, values: t.values.map((row, i) => row.map((x, j) => (i === r && j === c ? v : x))) }
}

/** A flat drive map: torque ∝ pedal, `peakNm` at 100 %. */
export function linearDriveMap(peakNm: number): MapTable {
  const rowAxis = [0, 25, 50, 75, 100]
  const colAxis = [0, 10, 20, 40, 60, 90]
  return { kind: 'drive', rowAxis, colAxis, values: rowAxis.map((p) => colAxis.map(() => (peakNm * p) / 100)) }
}

/** A regen map whose 0 % row brakes with `liftOffNm` above 10 km/h, fading to 0 at standstill. */
export function regenMap(liftOffNm: number): MapTable {
  const rowAxis = [0, 50, 100]
  const colAxis = [0, 5, 10, 40, 90]
  const fade = [0, 0.5, 1, 1, 1]
  return { kind: 'regen', rowAxis, colAxis, values: rowAxis.map((p) => colAxis.map((_, j) => liftOffNm * fade[j] * (1 + p / 100))) }
}

// ---- Integration -----------------------------------------------------------------------------

/** A vehicle program and a map with its first revision, created through the real API by a new engineer. */
export async function programAndMap(table: MapTable = SMALL_DRIVE): Promise<{
  engineer: PublicUser
  cookie: string
  programId: number
  mapId: number
}> {
  // Loaded here rather than at the top: unit tests import this file for its tables and must not load the API.
  const [{ call, makeUser, sessionCookie }, programsRoute, mapsRoute, { demoTipper }] = await Promise.all([
    import('./api'),
    import('@/app/api/programs/route'),
    import('@/app/api/maps/route'),
    import('@/db/demo/programs'),
  ])
  const engineer = await makeUser('calibration_engineer')
  const cookie = await sessionCookie(engineer)
  const p = await call(programsRoute.POST, { method: 'POST', cookie, body: { name: `Program ${Math.random()}`, description: '', params: demoTipper } })
  const m = await call(mapsRoute.POST, {
    method: 'POST',
    cookie,
    body: { programId: p.body.program.id, name: 'Launch', kind: table.kind, table, message: 'First cut' },
  })
  if (m.status !== 201) throw new Error(`fixture map not created: ${JSON.stringify(m.body)}`)
  return { engineer, cookie, programId: p.body.program.id, mapId: m.body.mapId }
}
