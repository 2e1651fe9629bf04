// The program's drive tyre against the brush model's closed forms (Pacejka, Tire and Vehicle Dynamics, ch. 3,
// parabolic pressure distribution): with λ = C_κ·σ/(3·μ·F_z), F_x/(μ·F_z) = 1 − (1 − λ)³ for λ ≤ 1 and 1 beyond;
// slope at zero slip C_κ; full sliding from σ_sl = 3·μ·F_z/C_κ. σ = κ/(1 + κ) is the brush model's theoretical slip.
import { describe, expect, it } from 'vitest'
import {
  cellSlip, DEFAULT_DRIVE_TYRE, magicFormula, magicFormulaSlope, peakMuAtLoad, peakSlip, resolveDriveTyre,
  slipForForceRatio, SURFACE_IDS, SURFACES, tyreCurve, vehicleParamsSchema, axleLoadsFor,
} from '@/physics'
import { tractor, vehicle as rigid } from '@/tests/support/fixtures'

const tyre = resolveDriveTyre(tractor)
const brush = (sigma: number, mu: number, stiffnessPerLoad: number) => {
  const l = Math.min(1, (stiffnessPerLoad * sigma) / (3 * mu))
  return mu * (1 - (1 - l) ** 3)
}

describe('drive tyre curve against the brush model (Pacejka ch. 3)', () => {
  it('keeps the slope at zero slip, C_κ/F_z, on every surface: the surface scales grip, not stiffness', () => {
    for (const id of SURFACE_IDS) expect(magicFormulaSlope(0, tyreCurve(tyre, SURFACES[id].peakMu, 30_000))).toBeCloseTo(12, 12)
    const soft = resolveDriveTyre({ ...tractor, driveTyre: { slipStiffnessPerLoad: 9 } })
    expect(magicFormulaSlope(0, tyreCurve(soft, 0.1, 30_000))).toBeCloseTo(9, 12)
  })
  it('peaks where the brush model reaches full sliding, κ_sl = 3·μ/(C_κ/F_z), within 0.1 %', () => {
    for (const id of SURFACE_IDS) {
      const mu = SURFACES[id].peakMu
      expect(peakSlip(tyreCurve(tyre, mu, 30_000)) / ((3 * mu) / 12)).toBeCloseTo(1, 3)
    }
  })
  it('follows the brush force curve on the rising branch: at λ = ½ the brush gives 7/8 of μ; everywhere within 6 % of μ', () => {
    for (const mu of [1, 0.3, 0.1]) {
      const c = tyreCurve(tyre, mu, 30_000)
      const sigmaSl = (3 * mu) / 12
      const mid = 0.5 * sigmaSl
      expect(brush(mid, mu, 12) / mu).toBeCloseTo(0.875, 12)
      expect(Math.abs(magicFormula(mid / (1 - mid), c) - 0.875 * mu)).toBeLessThan(0.07 * mu) // κ = σ/(1 − σ)
      for (let i = 1; i <= 20; i++) {
        const s = (sigmaSl * i) / 20
        expect(Math.abs(magicFormula(s, c) - brush(s, mu, 12))).toBeLessThan(0.06 * mu) // small slip: κ ≈ σ
      }
    }
  })
  it('the default stiffness lies in the heavy-truck radial range C_κ/F_z ≈ 8–20 (recalled from memory)', () => {
    expect(DEFAULT_DRIVE_TYRE.slipStiffnessPerLoad).toBeGreaterThanOrEqual(8)
    expect(DEFAULT_DRIVE_TYRE.slipStiffnessPerLoad).toBeLessThanOrEqual(20)
    // Sliding/peak at a locked wheel ≈ 0.76, the snow and ice ratio in Wong's road-adhesion table (ch. 1; recalled from memory: 0.15/0.2, 0.07/0.1).
    expect(magicFormula(1, tyreCurve(tyre, 0.3, 30_000)) / 0.3).toBeGreaterThan(0.7)
    expect(magicFormula(1, tyreCurve(tyre, 0.3, 30_000)) / 0.3).toBeLessThan(0.8)
  })
})

describe('slip at half the available grip', () => {
  it('on ice is now about 0.5 % (≈ μ/2 ÷ 12), where the passenger-car curve gave about 6.9 %', () => {
    const now = slipForForceRatio(0.05, tyreCurve(tyre, 0.1, 30_000)) as number
    expect(now).toBeGreaterThan(0.05 / 12) // the curve lies below its tangent
    expect(now).toBeLessThan(0.01)
    expect(slipForForceRatio(0.05, SURFACES.ice.passengerCarCoeffs)).toBeCloseTo(0.0686, 3)
  })
  it('in a map cell: the laden tractor on ice at half its traction limit slips under 1 %', () => {
    const limit = cellSlip({ vehicle: tractor, loadCase: 'laden', surface: 'ice', motorTorqueNm: 1, roadSpeedKmh: 10, applyEnvelope: false }).motorTorqueAtLimitNm
    const r = cellSlip({ vehicle: tractor, loadCase: 'laden', surface: 'ice', motorTorqueNm: limit / 2, roadSpeedKmh: 10, applyEnvelope: false })
    expect(r.utilisation).toBeCloseTo(0.5, 9)
    expect(r.slip as number).toBeGreaterThan(0.003)
    expect(r.slip as number).toBeLessThan(0.01)
  })
})

describe('peak μ load sensitivity', () => {
  it('μ = μ_s·(1 − k·(F_z/F_z,nom − 1)): k = 0.1 at 10 % overload gives 0.99·μ_s (hand)', () => {
    const t = resolveDriveTyre({ ...tractor, driveTyre: { peakMuLoadSensitivity: 0.1, nominalLoadPerTyreN: 30_000 } })
    expect(peakMuAtLoad(t, 0.8, 33_000)).toBeCloseTo(0.792, 12)
    expect(peakMuAtLoad(t, 0.8, 15_000)).toBeCloseTo(0.84, 12)
    const c = tyreCurve(t, 0.8, 33_000)
    expect(c.D).toBeCloseTo(0.792, 12)
    expect(c.B * c.C * c.D).toBeCloseTo(12, 12) // stiffness kept
  })
  it('enters the traction limit at the load case’s static load per tyre (hand: laden tractor, 4 tyres)', () => {
    const k = 0.1
    const v = { ...tractor, driveTyre: { peakMuLoadSensitivity: k, nominalLoadPerTyreN: 20_000 } }
    const { model } = axleLoadsFor(v, 'laden')
    const fz = model.staticDriveAxleLoadN / 4
    const mu = 0.3 * (1 - k * (fz / 20_000 - 1))
    const r = cellSlip({ vehicle: v, loadCase: 'laden', surface: 'packed-snow', motorTorqueNm: -1, roadSpeedKmh: 10 })
    expect(r.limitForceN).toBeCloseTo((mu * model.staticDriveAxleLoadN) / (1 + (mu * model.transferHeightM) / model.wheelbaseM), 6)
  })
  it('counts 8 tyres on a 6×4 and 4 on a 4×2 unless the program says', () => {
    expect(resolveDriveTyre(rigid).tyreCount).toBe(8)
    expect(resolveDriveTyre(tractor).tyreCount).toBe(4)
    expect(resolveDriveTyre({ ...tractor, driveTyre: { tyreCount: 2 } }).tyreCount).toBe(2)
  })
})

describe('stored parameters', () => {
  it('a version saved before the drive tyre existed still parses, and judges traction limits exactly as before (k = 0)', () => {
    const old = JSON.parse(JSON.stringify({ ...tractor }))
    expect(vehicleParamsSchema.safeParse(old).success).toBe(true)
    expect(old.driveTyre).toBeUndefined()
    const r = cellSlip({ vehicle: old, loadCase: 'empty', surface: 'ice', motorTorqueNm: -1, roadSpeedKmh: 30 })
    const g = 9.80665
    expect(r.limitForceN).toBeCloseTo((0.1 * ((9000 * g * 1.6) / 3.8)) / (1 + (0.1 * 1.1) / 3.8), 6) // same hand formula as before the tyre
  })
  it('refuses a bad tyre field, naming it', () => {
    const r = vehicleParamsSchema.safeParse({ ...tractor, driveTyre: { shapeE: 1.2 } })
    expect(r.success).toBe(false)
    expect(r.error?.issues[0].path).toEqual(['driveTyre', 'shapeE'])
    expect(r.error?.issues[0].message).toMatch(/Curvature factor E must be below 1/)
    expect(vehicleParamsSchema.safeParse({ ...tractor, driveTyre: { slipStiffnessPerLoad: 0.5 } }).success).toBe(false)
    expect(vehicleParamsSchema.safeParse({ ...tractor, driveTyre: { tyreCount: 4.5 } }).success).toBe(false)
  })
})
