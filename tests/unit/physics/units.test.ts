import { describe, expect, it } from 'vitest'
import * as U from '@/physics/units'

// NIST SP 811 (2008) Appendix B: 1 ft = 0.3048 m, 1 lbf = 4.4482216152605 N, 1 mi = 1609.344 m,
// 1 lb = 0.45359237 kg (exact), 1 hp = 550 ft·lbf/s ≈ 745.699 872 W (B.9 lists 7.456 999 E+02).
describe('unit conversions (NIST SP 811 exact factors)', () => {
  it('lbf·ft ↔ N·m', () => {
    expect(U.NM_PER_LBF_FT).toBeCloseTo(0.3048 * 4.4482216152605, 15)
    expect(U.lbfFtToNm(1000)).toBeCloseTo(1355.8179483314004, 10)
    expect(U.nmToLbfFt(U.lbfFtToNm(737))).toBeCloseTo(737, 12)
  })
  it('mph ↔ km/h', () => {
    expect(U.mphToKmh(1)).toBe(1609.344 / 1000)
    expect(U.mphToKmh(60)).toBeCloseTo(96.56064, 12)
    expect(U.kmhToMph(96.56064)).toBeCloseTo(60, 12)
  })
  it('lb ↔ kg', () => {
    expect(U.lbToKg(1)).toBe(0.45359237)
    expect(U.kgToLb(U.lbToKg(80000))).toBeCloseTo(80000, 9)
  })
  it('hp ↔ W (mechanical horsepower)', () => {
    expect(U.W_PER_HP).toBeCloseTo(550 * 0.3048 * 4.4482216152605, 10)
    expect(U.hpToW(1)).toBeCloseTo(745.69987158227022, 12)
    expect(U.wToHp(U.hpToW(470))).toBeCloseTo(470, 12)
  })
  it('km/h, m/s, rpm', () => {
    expect(U.kmhToMps(36)).toBe(10)
    expect(U.mpsToKmh(10)).toBe(36)
    expect(U.rpmToRadS(60)).toBeCloseTo(2 * Math.PI, 14)
    expect(U.radSToRpm(2 * Math.PI)).toBeCloseTo(60, 12)
  })
})
