import { describe, expect, it } from 'vitest'
import { cellSlip, loadCasesFor, peakSlip, prepareCellSlip, slipGrid, SURFACES, SURFACE_IDS, tractionLimitTorqueBySpeed, type MapTable } from '@/physics'
import { linearDriveMap, regenMap, tractor } from '@/tests/support/fixtures'

const g = 9.80665
const ref = (k: number, c: { B: number; C: number; D: number; E: number }) => c.D * Math.sin(c.C * Math.atan(c.B * k - c.E * (c.B * k - Math.atan(c.B * k))))
/** The default truck drive tyre (physics/drive-tyre.ts: C_κ/F_z = 12, C = 1.5, E = 0.3, no load sensitivity) on a surface of peak μ: B = 12/(C·μ). */
const truckCurve = (mu: number) => ({ B: 12 / (1.5 * mu), C: 1.5, D: mu, E: 0.3 })
/** Independent inversion by plain bisection on the in-test formula. */
function bisectSlip(ratio: number, c: { B: number; C: number; D: number; E: number }, hi: number): number {
  let lo = 0
  for (let i = 0; i < 200; i++) { const m = (lo + hi) / 2; if (ref(m, c) < ratio) lo = m; else hi = m }
  return (lo + hi) / 2
}

describe('cellSlip', () => {
  it('laden truck, 1000 N·m at 10 km/h on dry asphalt: hand chain torque → force → load → slip', () => {
    const r = cellSlip({ vehicle: tractor, loadCase: 'laden', surface: 'dry-asphalt', motorTorqueNm: 1000, roadSpeedKmh: 10 })
    const F = (1000 * 12 * 0.95) / 0.5 // 22 800 N
    const Wr = (19000 * g * 2.3) / 3.8 + (F * 1.6) / 3.8 // static + transfer = 122 376.475 N
    expect(r.wheelForceN).toBeCloseTo(F, 9)
    expect(r.driveAxleLoadN).toBeCloseTo(Wr, 6)
    expect(r.slip as number).toBeCloseTo(bisectSlip(F / Wr, truckCurve(1), 0.25), 9)
    expect(r.spin).toBe(false)
    expect(r.envelopeLimited).toBe(false)
    // limit = min(μ·W0/(1 − μ·h/L), steer-lift m·g·(L − a)/h) with μ = 1:
    // min(194 795.7, 19 000 × 9.80665 × 1.5/1.6 = 174 681.0) → the steer axle would lift first (hand calculation)
    const limit = Math.min(((19000 * g * 2.3) / 3.8) / (1 - 1.6 / 3.8), (19000 * g * 1.5) / 1.6)
    expect(limit).toBeCloseTo(174680.95, 1)
    expect(r.limitForceN).toBeCloseTo(limit, 6)
    expect(r.limitedBy).toBe('steer-axle-lift')
    expect(r.utilisation).toBeCloseTo(F / limit, 12)
  })
  it('flags spin on ice and lock in regen on ice', () => {
    const spin = cellSlip({ vehicle: tractor, loadCase: 'empty', surface: 'ice', motorTorqueNm: 2000, roadSpeedKmh: 5 })
    expect(spin.spin).toBe(true)
    expect(spin.slip).toBeNull()
    expect(spin.utilisation).toBeGreaterThan(1)
    const lock = cellSlip({ vehicle: tractor, loadCase: 'empty', surface: 'ice', motorTorqueNm: -800, roadSpeedKmh: 30 })
    expect(lock.lock).toBe(true)
    expect(lock.spin).toBe(false)
    expect(lock.wheelForceN).toBeCloseTo((-800 * 12) / 0.95 / 0.5, 9)
    // regen limit = μ·W0/(1 + μ·h/L) = 0.1 × 37 162.04 / (1 + 0.1 × 1.1/3.8) (hand formula)
    expect(lock.limitForceN).toBeCloseTo((0.1 * ((9000 * g * 1.6) / 3.8)) / (1 + (0.1 * 1.1) / 3.8), 6)
  })
  it('the torque at the limit puts the cell exactly at the tyre peak', () => {
    for (const id of SURFACE_IDS) for (const lc of loadCasesFor(tractor)) for (const sign of [1, -1]) {
      const at = prepareCellSlip({ vehicle: tractor, loadCase: lc, surface: id, applyEnvelope: false })
      const tLim = at(sign, 10).motorTorqueAtLimitNm
      expect(Math.sign(tLim)).toBe(sign)
      const r = at(tLim * (1 - 1e-9), 10)
      expect(r.utilisation).toBeCloseTo(1, 7)
      if (r.limitedBy === 'steer-axle-lift') continue // μ = 1 laden: the steer axle lifts before the tyre peaks
      expect(Math.abs(r.slip as number)).toBeCloseTo(peakSlip(truckCurve(SURFACES[id].peakMu)), 3)
      expect(Math.abs(r.slip as number)).toBeCloseTo((3 * SURFACES[id].peakMu) / 12, 3) // brush model: κ_sl = 3·μ/(C_κ/F_z) (Pacejka ch. 3)
      expect(at(tLim * 1.001, 10).slip).toBeNull()
    }
  })
  it('clips to the motor envelope by default', () => {
    const r = cellSlip({ vehicle: tractor, loadCase: 'laden', surface: 'dry-asphalt', motorTorqueNm: 3000, roadSpeedKmh: 45 })
    expect(r.envelopeLimited).toBe(true)
    expect(r.deliveredTorqueNm).toBeCloseTo(1500, 9) // 450 kW at 300 rad/s
  })
})

describe('slipGrid and tractionLimitTorqueBySpeed', () => {
  it('evaluates every cell; regen values are braking magnitudes', () => {
    const m = regenMap(600)
    const grid = slipGrid({ vehicle: tractor, loadCase: 'laden', surface: 'wet-asphalt', gradeRad: 0, ...m })
    expect(grid.length).toBe(m.rowAxis.length)
    expect(grid[0].length).toBe(m.colAxis.length)
    expect(grid[0][3].requestedTorqueNm).toBe(-600)
    expect(grid[0][3].wheelForceN).toBeLessThan(0)
    expect(grid[0][0].slip).toBe(0)
  })
  it('is fast: 32×32 cells × 5 surfaces × 4 load cases well under 2 s', () => {
    const axis = Array.from({ length: 32 }, (_, i) => i * 3.2)
    const map: MapTable = { kind: 'drive', rowAxis: axis, colAxis: axis, values: axis.map((p) => axis.map(() => 30 * p)) }
    const t0 = performance.now()
    let cells = 0
    for (const id of SURFACE_IDS) for (const lc of loadCasesFor(tractor)) cells += slipGrid({ vehicle: tractor, loadCase: lc, surface: id, ...map }).flat().length
    expect(cells).toBe(32 * 32 * 20)
    expect(performance.now() - t0).toBeLessThan(2000)
  })
  it('gives traction and envelope limits per speed breakpoint', () => {
    const pts = tractionLimitTorqueBySpeed({ vehicle: tractor, loadCase: 'laden', surface: 'packed-snow', colAxis: [0, 45, 90], kind: 'drive' })
    // traction: μ·W0/(1 − μ·h/L) × R/(G·η), μ = 0.3
    const tNm = ((0.3 * ((19000 * g * 2.3) / 3.8)) / (1 - (0.3 * 1.6) / 3.8)) * 0.5 / (12 * 0.95)
    expect(pts[0].tractionLimitNm).toBeCloseTo(tNm, 6)
    expect(pts[1].envelopeLimitNm).toBeCloseTo(1500, 9)
    expect(pts[2].limitNm).toBe(Math.min(pts[2].tractionLimitNm, pts[2].envelopeLimitNm))
    const d = linearDriveMap(1000)
    expect(() => slipGrid({ vehicle: tractor, loadCase: 'laden', surface: 'ice', ...d, colAxis: [0, 1] })).toThrow()
  })
})
