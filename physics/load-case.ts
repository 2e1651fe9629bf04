/**
 * Maps a vehicle program and a load case to masses, CG positions and the axle-load model.
 * - `empty`: kerb mass at the empty CG. `laden`: gross mass at the laden CG.
 * - `trailer-empty` / `trailer-laden`: the tractor at its kerb mass and empty CG (a tractor carries
 *   its payload in the trailer; the fifth-wheel load is computed, not assumed) plus the
 *   semitrailer at its empty / gross mass and CG.
 * A tandem is one group at its load centre (the wheelbase is measured to it); physics/tandem.ts shares it between axles.
 */
import { STANDARD_GRAVITY } from './constants'
import { PhysicsInputError } from './errors'
import type { AxleLoadModel } from './axle-model'
import { checkBody, type RigidBody } from './traction'
import { combinationModel, type SemitrailerBody } from './trailer'
import { validateVehicle } from './validate'
import { hasTrailer, type LoadCase } from './load-cases'
import type { VehicleParams } from './vehicle'

/** What a load case puts on the axles. */
export interface LoadCaseBodies {
  loadCase: LoadCase
  /** Truck or tractor rigid body. */
  tractor: RigidBody
  /** Semitrailer, or null for a solo truck / bobtail tractor. */
  trailer: SemitrailerBody | null
  /** Linear axle-load model of the whole combination. */
  model: AxleLoadModel
}

/**
 * Rigid-truck axle-load model: Wr0 = m·g·a/L, He = h, Wf0 = m·g·(L − a)/L.
 * @example rigidModel({ massKg: 10000, wheelbaseM: 5, cgToFrontAxleM: 3, cgHeightM: 1.5 }).staticDriveAxleLoadN // 58 839.9
 */
export function rigidModel(b: RigidBody): AxleLoadModel {
  checkBody(b)
  const w = b.massKg * STANDARD_GRAVITY
  return {
    totalMassKg: b.massKg,
    wheelbaseM: b.wheelbaseM,
    staticDriveAxleLoadN: (w * b.cgToFrontAxleM) / b.wheelbaseM,
    transferHeightM: b.cgHeightM,
    staticSteerAxleLoadN: (w * (b.wheelbaseM - b.cgToFrontAxleM)) / b.wheelbaseM,
    steerUnloadPerN: b.cgHeightM / b.wheelbaseM,
  }
}

/**
 * Bodies and axle-load model for a program and load case. Validates the vehicle;
 * throws PhysicsInputError for a trailer case on a program without a trailer.
 * @example axleLoadsFor(truck, 'laden').model.staticDriveAxleLoadN
 */
export function axleLoadsFor(vehicle: VehicleParams, loadCase: LoadCase): LoadCaseBodies {
  validateVehicle(vehicle)
  const laden = loadCase === 'laden'
  const tractor: RigidBody = {
    massKg: laden ? vehicle.grossMassKg : vehicle.emptyMassKg,
    wheelbaseM: vehicle.wheelbaseM,
    cgToFrontAxleM: laden ? vehicle.ladenCgToFrontAxleM : vehicle.emptyCgToFrontAxleM,
    cgHeightM: laden ? vehicle.ladenCgHeightM : vehicle.emptyCgHeightM,
  }
  if (loadCase === 'empty' || loadCase === 'laden') return { loadCase, tractor, trailer: null, model: rigidModel(tractor) }
  if (!hasTrailer(loadCase)) throw new PhysicsInputError('loadCase', `unknown load case "${String(loadCase)}"`)
  const t = vehicle.trailer
  if (!t) throw new PhysicsInputError('loadCase', `"${loadCase}" needs a trailer, but the program has none`)
  const tl = loadCase === 'trailer-laden'
  const trailer: SemitrailerBody = {
    massKg: tl ? t.grossMassKg : t.emptyMassKg,
    cgToKingpinM: tl ? t.ladenCgToKingpinM : t.emptyCgToKingpinM,
    cgHeightM: tl ? t.ladenCgHeightM : t.emptyCgHeightM,
    kingpinToAxleM: t.kingpinToAxleM,
    fifthWheelToFrontAxleM: t.fifthWheelToFrontAxleM,
    fifthWheelHeightM: t.fifthWheelHeightM,
  }
  return { loadCase, tractor, trailer, model: combinationModel(tractor, trailer) }
}
