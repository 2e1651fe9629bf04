/**
 * Unit conversions with exact factors. Source: NIST SP 811 (2008), Appendix B.
 * 1 ft = 0.3048 m, 1 lbf = 4.4482216152605 N, 1 mi = 1609.344 m, 1 lb = 0.45359237 kg (all exact),
 * 1 hp (mechanical, 550 ft·lbf/s) = 745.69987158227022 W.
 */

/** N·m per lbf·ft (0.3048 × 4.4482216152605). Source: NIST SP 811 B.9. @example 100 * NM_PER_LBF_FT // 135.58… */
export const NM_PER_LBF_FT = 1.3558179483314004
/** km/h per mph (1 mi = 1609.344 m exactly). Source: NIST SP 811 B.9. @example 50 * KMH_PER_MPH // 80.4672 */
export const KMH_PER_MPH = 1.609344
/** kg per lb (avoirdupois pound, exact). Source: NIST SP 811 B.9. @example 2000 * KG_PER_LB // 907.18474 */
export const KG_PER_LB = 0.45359237
/** W per mechanical horsepower (550 ft·lbf/s). Source: NIST SP 811 B.9. @example 400 * W_PER_HP // 298 279.9… */
export const W_PER_HP = 745.69987158227022

/** lbf·ft → N·m. @example lbfFtToNm(1) // 1.3558179483314004 */
export const lbfFtToNm = (lbfFt: number): number => lbfFt * NM_PER_LBF_FT
/** N·m → lbf·ft. @example nmToLbfFt(1.3558179483314004) // 1 */
export const nmToLbfFt = (nm: number): number => nm / NM_PER_LBF_FT
/** mph → km/h. @example mphToKmh(60) // 96.56064 */
export const mphToKmh = (mph: number): number => mph * KMH_PER_MPH
/** km/h → mph. @example kmhToMph(96.56064) // 60 */
export const kmhToMph = (kmh: number): number => kmh / KMH_PER_MPH
/** lb → kg. @example lbToKg(1) // 0.45359237 */
export const lbToKg = (lb: number): number => lb * KG_PER_LB
/** kg → lb. @example kgToLb(0.45359237) // 1 */
export const kgToLb = (kg: number): number => kg / KG_PER_LB
/** mechanical hp → W. @example hpToW(1) // 745.69987158227022 */
export const hpToW = (hp: number): number => hp * W_PER_HP
/** W → mechanical hp. @example wToHp(745.69987158227022) // 1 */
export const wToHp = (w: number): number => w / W_PER_HP
/** km/h → m/s (exact: 1 km/h = 1/3.6 m/s). @example kmhToMps(36) // 10 */
export const kmhToMps = (kmh: number): number => kmh / 3.6
/** m/s → km/h. @example mpsToKmh(10) // 36 */
export const mpsToKmh = (mps: number): number => mps * 3.6
/** rpm → rad/s (2π/60). @example rpmToRadS(60) // 2π */
export const rpmToRadS = (rpm: number): number => (rpm * 2 * Math.PI) / 60
/** rad/s → rpm. @example radSToRpm(2 * Math.PI) // 60 */
export const radSToRpm = (radS: number): number => (radS * 60) / (2 * Math.PI)
