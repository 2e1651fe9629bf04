import { describe, expect, it } from 'vitest'
import { axleLoadsFor, cellSlip, magicFormula, PhysicsInputError, simulateLaunch, slipRatio, SURFACES, tractionLimit, validateVehicle, type SurfaceId } from '@/physics'
import { linearDriveMap, tractor } from '@/tests/support/fixtures'

const catchErr = (f: () => unknown): PhysicsInputError => {
  try { f() } catch (e) { if (e instanceof PhysicsInputError) return e; throw e }
  throw new Error('expected a PhysicsInputError')
}

describe('PhysicsInputError', () => {
  it('negative mass names the field', () => {
    expect(catchErr(() => tractionLimit({ massKg: -100, wheelbaseM: 4, cgToFrontAxleM: 2, cgHeightM: 1 }, 0.8)).field).toBe('massKg')
    const e = catchErr(() => axleLoadsFor({ ...tractor, emptyMassKg: -1 }, 'empty'))
    expect(e.field).toBe('vehicle.emptyMassKg')
    expect(e.message).toMatch(/Empty mass/)
    expect(e.name).toBe('PhysicsInputError')
    expect(e).toBeInstanceOf(Error)
  })
  it('CG behind the rear (drive) axle', () => {
    expect(catchErr(() => tractionLimit({ massKg: 1000, wheelbaseM: 4, cgToFrontAxleM: 4.5, cgHeightM: 1 }, 0.8)).field).toBe('cgToFrontAxleM')
    expect(catchErr(() => validateVehicle({ ...tractor, ladenCgToFrontAxleM: 4.2 })).field).toBe('vehicle.ladenCgToFrontAxleM')
  })
  it('NaN and non-finite inputs', () => {
    expect(catchErr(() => magicFormula(Number.NaN, { B: 10, C: 1.9, D: 1, E: 0.97 })).field).toBe('slip')
    expect(catchErr(() => slipRatio(1, Number.NaN)).field).toBe('vehicleSpeed')
    expect(catchErr(() => cellSlip({ vehicle: tractor, loadCase: 'laden', surface: 'ice', motorTorqueNm: Number.NaN, roadSpeedKmh: 5 })).field).toBe('motorTorqueNm')
    expect(catchErr(() => validateVehicle({ ...tractor, wheelbaseM: Number.NaN })).field).toBe('vehicle.wheelbaseM')
    expect(catchErr(() => validateVehicle({ ...tractor, wheelRadiusM: Number.POSITIVE_INFINITY })).field).toBe('vehicle.wheelRadiusM')
    expect(catchErr(() => simulateLaunch({ vehicle: tractor, loadCase: 'laden', surface: 'ice', map: linearDriveMap(100), pedal: { kind: 'step', pedalPct: Number.NaN }, durationS: 1 })).field).toBe('pedal.pedalPct')
  })
  it('unknown surface or missing trailer', () => {
    const fromJson: SurfaceId = JSON.parse('"sand"') // untyped data, as it would arrive from a request body
    expect(catchErr(() => cellSlip({ vehicle: tractor, loadCase: 'laden', surface: fromJson, motorTorqueNm: 1, roadSpeedKmh: 5 })).field).toBe('surface')
    const bad = { ...SURFACES.ice, peakMu: -0.1 }
    expect(catchErr(() => cellSlip({ vehicle: tractor, loadCase: 'laden', surface: bad, motorTorqueNm: 1, roadSpeedKmh: 5 })).field).toBe('surface.peakMu')
    const badTyre = { ...tractor, driveTyre: { shapeC: 0.8 } }
    expect(catchErr(() => cellSlip({ vehicle: badTyre, loadCase: 'laden', surface: 'ice', motorTorqueNm: 1, roadSpeedKmh: 5 })).field).toBe('vehicle.driveTyre.shapeC')
    expect(catchErr(() => axleLoadsFor({ ...tractor, trailer: null }, 'trailer-laden')).field).toBe('loadCase')
  })
})
