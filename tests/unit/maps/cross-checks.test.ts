import { describe, expect, it } from 'vitest'
import { crossChecks, type MapTable } from '@/maps'

const drive = (liftOff: number[]): MapTable => ({ kind: 'drive', rowAxis: [0, 100], colAxis: [0, 10, 40, 80], values: [liftOff, [2000, 1800, 1200, 600]] })
const regen = (liftOff: number[]): MapTable => ({ kind: 'regen', rowAxis: [0, 100], colAxis: [0, 10, 40, 80], values: [liftOff, [0, 1500, 1500, 1500]] })

describe('checks across the drive and regen maps of a set', () => {
  it('finds speeds where both maps ask for torque at lift-off (creep meets regen)', () => {
    const checks = crossChecks(drive([150, 80, 0, 0]), regen([0, 200, 400, 400]))
    const overlap = checks.find((c) => c.id === 'lift-off-overlap')!
    expect(overlap.speedsKmh).toEqual([10])
    expect(overlap.message).toMatch(/10 km\/h: the drive map at 0 % pedal \(up to 80 N·m\) and the regen lift-off row \(up to 200 N·m\)/)
  })

  it('is quiet when creep ends before regen begins, and notes a coasting gap above walking pace', () => {
    expect(crossChecks(drive([150, 0, 0, 0]), regen([0, 0, 400, 400])).map((c) => c.id)).toEqual(['lift-off-gap'])
    expect(crossChecks(drive([150, 0, 0, 0]), regen([0, 200, 400, 400]))).toEqual([])
  })

  it('notes speed axes that end at different speeds', () => {
    const short: MapTable = { ...regen([0, 200, 400, 400]), colAxis: [0, 10, 40, 60] }
    const c = crossChecks(drive([100, 0, 0, 0]), short).find((x) => x.id === 'speed-coverage')!
    expect(c.message).toMatch(/above 60 km\/h the regen map holds its last column/)
  })
})
