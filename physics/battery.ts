/**
 * Battery power limits over state of charge (SoC) and temperature, and what they leave of lift-off
 * regen at a declared "corner" (e.g. full and cold). Derivation: docs/physics.md §7a.
 *
 * The pack's charge and discharge power limits P(SoC, T) are looked up bilinearly in the program's
 * table, clamped at its edges; without a table the program's two constants hold at every corner.
 * Lift-off regen at shaft speed ω = V·G/R is then
 *   T_shaft = min(T_map(0 %, V), T_motor(ω), P_charge/ω),   a = T_shaft·G / (η·R·m_eff)
 * (wheel torque T_shaft·G/η in regen, docs/physics.md §7), m_eff = m + (J_wheels + J_motor·G²)/R² so
 * the rotating parts slow down with the truck. The regen part of the deceleration alone: rolling
 * resistance and drag, which add to it, are left out so the figure is what the map gives.
 */
import { axleLoadsFor } from './load-case'
import { overallRatio } from './driveline'
import { deliverableAtShaft } from './envelope'
import { PhysicsInputError, requireFinite } from './errors'
import { interpolate, type MapTable } from './table'
import { checkMap } from './table-lookup'
import { kmhToMps } from './units'
import type { LoadCase } from './load-cases'
import type { VehicleParams } from './vehicle'

/** A battery state to check: state of charge, %, and cell temperature, °C. */
export interface BatteryCorner {
  label: string
  socPct: number
  temperatureC: number
}

/**
 * Charge and discharge power limits (W) at a corner: the table bilinearly (clamped at the edges), or
 * the program's constants when it has no table.
 * @example batteryPowerAt(truck, 95, -10).chargePowerW
 */
export function batteryPowerAt(v: VehicleParams, socPct: number, temperatureC: number): { chargePowerW: number; dischargePowerW: number } {
  requireFinite('socPct', socPct)
  requireFinite('temperatureC', temperatureC)
  const t = v.batteryPowerTable
  if (!t) return { chargePowerW: v.batteryChargePowerW, dischargePowerW: v.batteryDischargePowerW }
  const grid = (values: number[][]) => ({ rowAxis: t.socPct, colAxis: t.temperatureC, values })
  checkMap(grid(t.chargePowerW), 'vehicle.batteryPowerTable.charge.')
  checkMap(grid(t.dischargePowerW), 'vehicle.batteryPowerTable.discharge.')
  return { chargePowerW: interpolate(grid(t.chargePowerW), socPct, temperatureC), dischargePowerW: interpolate(grid(t.dischargePowerW), socPct, temperatureC) }
}

/**
 * The program with its battery constants replaced by the corner's limits, so every envelope, cell and
 * simulation function evaluates at that corner. The table itself is kept.
 * @example cellSlip({ vehicle: vehicleAtCorner(truck, { label: 'cold', socPct: 95, temperatureC: -10 }), … })
 */
export function vehicleAtCorner(v: VehicleParams, corner: BatteryCorner): VehicleParams {
  const p = batteryPowerAt(v, corner.socPct, corner.temperatureC)
  // A zero table entry means "no charging": keep the schema's > 0 rule with a negligible 1 W.
  return { ...v, batteryChargePowerW: Math.max(p.chargePowerW, 1), batteryDischargePowerW: Math.max(p.dischargePowerW, 1) }
}

/** Lift-off regen at one speed and battery state. Torques at the motor shaft (N·m, magnitudes), deceleration m/s². */
export interface LiftOffPoint {
  speedKmh: number
  /** The regen map's 0 % row at this speed. */
  mapTorqueNm: number
  /** What the motor and battery deliver of it. */
  torqueNm: number
  limitedBy: 'map' | 'motor' | 'battery'
  decelMps2: number
}

/**
 * Lift-off deceleration at each speed breakpoint of the regen map (its 0 % row), for a load case and
 * (optionally) a battery corner; without a corner the program's constants apply.
 * @example liftOffDecelBySpeed(truck, regenMap, 'laden', { label: 'cold', socPct: 95, temperatureC: -10 })[5].decelMps2
 */
export function liftOffDecelBySpeed(v: VehicleParams, map: MapTable, loadCase: LoadCase, corner?: BatteryCorner, gearIndex = 0): LiftOffPoint[] {
  if (map.kind !== 'regen') throw new PhysicsInputError('map.kind', 'lift-off needs a regen map')
  checkMap(map)
  const at = corner ? vehicleAtCorner(v, corner) : v
  const G = overallRatio(v, gearIndex)
  const R = v.wheelRadiusM
  const mass = axleLoadsFor(v, loadCase).model.totalMassKg + (v.driveWheelsInertiaKgM2 + v.motorInertiaKgM2 * G * G) / (R * R)
  return map.colAxis.map((speedKmh) => {
    const mapTorqueNm = Math.max(0, interpolate(map, 0, speedKmh))
    const omega = (kmhToMps(speedKmh) / R) * G
    const motor = deliverableAtShaft({ ...at, batteryChargePowerW: Infinity }, omega, 'regen')
    const battery = omega > 0 ? at.batteryChargePowerW / omega : Infinity
    const torqueNm = Math.min(mapTorqueNm, motor, battery)
    const limitedBy = torqueNm >= mapTorqueNm ? 'map' : battery <= motor ? 'battery' : 'motor'
    return { speedKmh, mapTorqueNm, torqueNm, limitedBy, decelMps2: (torqueNm * G) / (v.drivelineEfficiency * R * mass) }
  })
}

/** A corner at which the battery takes away lift-off deceleration the driver gets at nominal ratings. */
export interface LiftOffFinding {
  corner: BatteryCorner
  loadCase: LoadCase
  /** Speeds (km/h) where the nominal deceleration meets the minimum and the corner's does not, with both figures. */
  points: { speedKmh: number; nominalDecelMps2: number; cornerDecelMps2: number }[]
}

/**
 * Findings for declared corners: at each speed breakpoint of the regen map, for each load case, where
 * the deceleration at the program's nominal battery ratings reaches `minDecelMps2` but the corner's
 * falls below it (lift-off regen the driver expects is gone without warning). Speeds where the map
 * itself asks for less (fade-in near standstill) are the map's choice, not a finding.
 * @example liftOffFindings(truck, regenMap, ['laden'], [{ label: 'Full and cold', socPct: 95, temperatureC: -10 }], 0.5)
 */
export function liftOffFindings(v: VehicleParams, map: MapTable, loadCases: LoadCase[], corners: BatteryCorner[], minDecelMps2: number): LiftOffFinding[] {
  requireFinite('minDecelMps2', minDecelMps2)
  const out: LiftOffFinding[] = []
  for (const loadCase of loadCases) {
    const nominal = liftOffDecelBySpeed(v, map, loadCase)
    for (const corner of corners) {
      const points = liftOffDecelBySpeed(v, map, loadCase, corner)
        .map((p, i) => ({ speedKmh: p.speedKmh, nominalDecelMps2: nominal[i].decelMps2, cornerDecelMps2: p.decelMps2 }))
        .filter((p) => p.nominalDecelMps2 >= minDecelMps2 && p.cornerDecelMps2 < minDecelMps2)
      if (points.length) out.push({ corner, loadCase, points })
    }
  }
  return out
}
