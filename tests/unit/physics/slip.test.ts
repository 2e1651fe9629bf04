import { describe, expect, it } from 'vitest'
import { slipRatio, SLIP_SPEED_FLOOR_MPS, PhysicsInputError } from '@/physics'

describe('slipRatio (SAE J670:2008 / ISO 8855:2011: κ = (ΩR − V)/|V|)', () => {
  it('worked examples of the definition', () => {
    expect(slipRatio(11, 10)).toBeCloseTo(0.1, 15) // (11 − 10)/10, driving
    expect(slipRatio(9, 10)).toBeCloseTo(-0.1, 15) // braking
    expect(slipRatio(0, 10)).toBe(-1) // locked wheel: ΩR = 0 → −1
    expect(slipRatio(10, 10)).toBe(0) // free rolling
    expect(slipRatio(-11, -10)).toBeCloseTo(-0.1, 15) // reversing: |V| in the denominator
  })
  it('standstill rule: denominator floored at 0.5 m/s (common-practice regularisation, this module’s choice)', () => {
    expect(SLIP_SPEED_FLOOR_MPS).toBe(0.5)
    expect(slipRatio(0.05, 0)).toBeCloseTo(0.1, 15) // 0.05 / 0.5
    expect(slipRatio(0.6, 0.2)).toBeCloseTo(0.8, 15) // (0.6 − 0.2)/0.5
    expect(slipRatio(0.6, 0.2, 0.1)).toBeCloseTo(2, 15) // (0.6 − 0.2)/max(0.2, 0.1)
    expect(Number.isFinite(slipRatio(1, 0))).toBe(true)
  })
  it('throws PhysicsInputError for NaN / non-finite speeds', () => {
    expect(() => slipRatio(Number.NaN, 1)).toThrow(PhysicsInputError)
    expect(() => slipRatio(1, Number.POSITIVE_INFINITY)).toThrow(/vehicleSpeed/)
    expect(() => slipRatio(1, 1, 0)).toThrow(/vFloor/)
  })
})
