import { describe, expect, it } from 'vitest'
import { limitsFromVehicle, starterTable, validate } from '../../../maps'
import { vehicle } from '@/tests/support/fixtures'

// The fixture vehicle gives 10 rad/s of motor shaft per km/h; 2,000 N·m and 300 kW mean the power
// limit starts at 15 km/h (P = T·ω: 300,000 W / 2,000 N·m = 150 rad/s), worked by hand.
const limits = limitsFromVehicle(vehicle)

describe('starterTable', () => {
  it('gives a drive map linear in pedal up to the motor envelope, with no validation error', () => {
    const t = starterTable('drive', limits)
    const top = t.values[t.rowAxis.length - 1]
    expect(top[t.colAxis.indexOf(0)]).toBe(2000)
    expect(top[t.colAxis.indexOf(30)]).toBe(1000) // 300,000 W ÷ (30 km/h × 10 rad/s per km/h)
    expect(t.values[t.rowAxis.indexOf(50)][t.colAxis.indexOf(30)]).toBe(500)
    expect(validate(t, limits).filter((f) => f.severity === 'error')).toEqual([])
  })

  it('starts a regen map at zero braking everywhere', () => {
    const t = starterTable('regen', limits)
    expect(t.kind).toBe('regen')
    expect(t.values.flat().every((v) => v === 0)).toBe(true)
  })
})
