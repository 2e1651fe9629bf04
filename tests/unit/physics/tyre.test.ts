import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { magicFormula, magicFormulaSlope, peakForceRatio, peakSlip, slipForForceRatio, SURFACES, SURFACE_IDS, PhysicsInputError, type SolveStats } from '@/physics'

const dry = { B: 10, C: 1.9, D: 1, E: 0.97 }
/** Independent re-statement of Pacejka's formula (Tire and Vehicle Dynamics, ch. 4), written in the test. */
const ref = (k: number, B: number, C: number, D: number, E: number) => D * Math.sin(C * Math.atan(B * k - E * (B * k - Math.atan(B * k))))

describe('magicFormula', () => {
  it('matches values computed outside the code (Python math, same published formula)', () => {
    // Computed with Python 3 `math` from D·sin(C·atan(Bκ − E(Bκ − atan Bκ))), dry set B=10 C=1.9 D=1 E=0.97.
    expect(magicFormula(0.05, dry)).toBeCloseTo(0.7356193375707268, 13)
    expect(magicFormula(0.1, dry)).toBeCloseTo(0.9558421030841412, 13)
    expect(magicFormula(0.2, dry)).toBeCloseTo(0.9991777356416915, 13)
    expect(magicFormula(0.5, dry)).toBeCloseTo(0.959374724159496, 13)
    expect(magicFormula(1, dry)).toBeCloseTo(0.9145219580128047, 13)
    // Wet B=12 C=2.3 D=0.82 E=1 at κ=0.05, snow B=5 C=2 D=0.3 E=1 at κ=0.2 (Python 3).
    expect(magicFormula(0.05, SURFACES['wet-asphalt'].passengerCarCoeffs)).toBeCloseTo(0.7449264625605146, 13)
    expect(magicFormula(0.2, SURFACES['packed-snow'].passengerCarCoeffs)).toBeCloseTo(0.29145487699448563, 13)
  })
  it('agrees with the in-test formula and is odd in slip (property)', () => {
    fc.assert(fc.property(fc.double({ min: -2, max: 2, noNaN: true }), fc.constantFrom(...SURFACE_IDS), (k, id) => {
      const c = SURFACES[id].passengerCarCoeffs
      expect(magicFormula(k, c)).toBeCloseTo(ref(k, c.B, c.C, c.D, c.E), 12)
      expect(magicFormula(-k, c)).toBeCloseTo(-magicFormula(k, c), 14)
    }))
  })
  it('slope at zero is B·C·D and matches a central difference', () => {
    expect(magicFormulaSlope(0, dry)).toBeCloseTo(19, 12) // BCD = 10·1.9·1 (Pacejka: cornering/slip stiffness factor)
    for (const k of [0.01, 0.07, 0.3]) {
      const d = 1e-6
      expect(magicFormulaSlope(k, dry)).toBeCloseTo((ref(k + d, 10, 1.9, 1, 0.97) - ref(k - d, 10, 1.9, 1, 0.97)) / (2 * d), 6)
    }
  })
})

describe('peakSlip / peakForceRatio', () => {
  it('peak of the dry curve equals D (C > 1) and lies near 0.18 slip', () => {
    let best = 0
    for (let k = 0; k <= 1; k += 1e-5) best = Math.max(best, ref(k, 10, 1.9, 1, 0.97))
    expect(best).toBeCloseTo(1, 8)
    expect(magicFormula(peakSlip(dry), dry)).toBeCloseTo(1, 14)
    expect(peakForceRatio(dry)).toBe(1)
  })
  it('makes the numerical derivative vanish for every surface', () => {
    for (const id of SURFACE_IDS) {
      const c = SURFACES[id].passengerCarCoeffs
      const kp = peakSlip(c)
      const d = 1e-6
      const deriv = (ref(kp + d, c.B, c.C, c.D, c.E) - ref(kp - d, c.B, c.C, c.D, c.E)) / (2 * d)
      expect(Math.abs(deriv)).toBeLessThan(1e-6)
      expect(ref(kp, c.B, c.C, c.D, c.E)).toBeCloseTo(c.D, 12)
    }
  })
  it('reports a monotone curve (C ≤ 1) as having no finite peak', () => {
    const mono = { B: 8, C: 0.9, D: 1, E: 0.5 }
    expect(peakSlip(mono)).toBe(Infinity)
    expect(peakForceRatio(mono)).toBeCloseTo(Math.sin(0.9 * Math.PI / 2), 14) // asymptote D·sin(Cπ/2)
    expect(peakSlip({ B: 8, C: 1.5, D: 1, E: 1 })).toBe(Infinity) // E = 1: u ≤ π/2, C·atan(π/2) < π/2
  })
})

describe('slipForForceRatio', () => {
  it('round-trips slip → ratio → slip to 1e-9 on the rising branch (property)', () => {
    fc.assert(fc.property(fc.constantFrom(...SURFACE_IDS), fc.double({ min: -0.95, max: 0.95, noNaN: true }), (id, f) => {
      const c = SURFACES[id].passengerCarCoeffs
      const k = f * peakSlip(c)
      const back = slipForForceRatio(magicFormula(k, c), c)
      expect(back).not.toBeNull()
      expect(Math.abs((back as number) - k)).toBeLessThan(1e-9)
    }), { numRuns: 500 })
  })
  it('returns null beyond the peak, the peak slip at the peak, and negative slip for negative ratios', () => {
    expect(slipForForceRatio(1.0001, dry)).toBeNull()
    expect(slipForForceRatio(-1.0001, dry)).toBeNull()
    expect(slipForForceRatio(1, dry)).toBeCloseTo(peakSlip(dry), 12)
    expect(slipForForceRatio(0, dry)).toBe(0)
    const k = slipForForceRatio(-0.5, dry) as number
    expect(k).toBeLessThan(0)
    expect(ref(k, 10, 1.9, 1, 0.97)).toBeCloseTo(-0.5, 12)
    expect(slipForForceRatio(0.11, SURFACES.ice.passengerCarCoeffs)).toBeNull() // ice peak μ 0.1
  })
  it('inverts monotone curves below their asymptote', () => {
    const mono = { B: 8, C: 0.9, D: 1, E: 0.5 }
    const k = slipForForceRatio(0.9, mono) as number
    expect(ref(k, 8, 0.9, 1, 0.5)).toBeCloseTo(0.9, 12)
    expect(slipForForceRatio(0.99, mono)).toBeNull() // asymptote sin(0.45π) ≈ 0.9877
  })
  it('needs on average at most 8 Magic-Formula-equivalent evaluations per solve', () => {
    const stats: SolveStats = { solves: 0, mfEvaluations: 0 }
    for (const id of SURFACE_IDS) for (let i = 1; i <= 200; i++) slipForForceRatio((SURFACES[id].passengerCarCoeffs.D * i) / 201, SURFACES[id].passengerCarCoeffs, stats)
    expect(stats.solves).toBe(1000)
    expect(stats.mfEvaluations / stats.solves).toBeLessThanOrEqual(8)
  })
  it('rejects bad coefficients and non-finite ratios with PhysicsInputError', () => {
    expect(() => slipForForceRatio(0.5, { ...dry, E: 1.2 })).toThrow(PhysicsInputError)
    expect(() => slipForForceRatio(0.5, { ...dry, B: -1 })).toThrow(/coeffs\.B/)
    expect(() => slipForForceRatio(Number.NaN, dry)).toThrow(/ratio/)
    expect(() => magicFormula(Number.POSITIVE_INFINITY, dry)).toThrow(PhysicsInputError)
  })
})
