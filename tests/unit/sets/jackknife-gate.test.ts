// The set gate's jackknife condition: on a tractor, lift-off regen cells that leave the drive axle less
// lateral capacity (friction ellipse) than the design lateral acceleration are findings the lead must acknowledge.
import { describe, expect, it } from 'vitest'
import { setGate, type SetGatePart } from '@/app/_lib/sets/gate'
import { lateralMargin, type MapTable } from '@/physics'
import { tractor } from '@/tests/support/fixtures'

const conditions = { surfaces: ['wet-asphalt' as const, 'packed-snow' as const], loadCases: ['empty' as const, 'laden' as const, 'trailer-empty' as const], marginPct: 0, designLateralAccelMps2: 1.5 }
const t = lateralMargin({ vehicle: tractor, loadCase: 'trailer-empty', surface: 'packed-snow' }, 'regen', 1.5).torqueAtDesignNm as number
const drive: MapTable = { kind: 'drive', rowAxis: [0, 100], colAxis: [0, 20], values: [[0, 0], [50, 50]] }
const regen = (liftOff: number): MapTable => ({ kind: 'regen', rowAxis: [0, 100], colAxis: [10, 20], values: [[liftOff, liftOff], [liftOff, liftOff]] })
const parts = (r: MapTable): SetGatePart[] => [
  { kind: 'drive', revisionId: 1, number: 1, mapName: 'D', state: 'approved', table: drive },
  { kind: 'regen', revisionId: 2, number: 1, mapName: 'R', state: 'approved', table: r },
]
const gate = (r: MapTable, v = tractor, acks: { key: string; reason: string }[] = [], c = conditions) =>
  setGate({ parts: parts(r), vehicle: v, conditions: c, reports: [{ surface: 'packed-snow', loadCase: 'trailer-empty' }], concerns: [], acknowledgements: acks })

describe('set gate: jackknife finding on lift-off regen', () => {
  it('lift-off regen below the torque that keeps 1.5 m/s² lateral on packed snow passes', () => {
    const g = gate(regen(0.8 * t))
    expect(g.conditions.find((c) => c.id === 'jackknife')?.met).toBe(true)
  })
  it('lift-off regen above it is a finding with the cells, acknowledged like a traction exception', () => {
    const g = gate(regen(1.1 * t))
    const c = g.conditions.find((x) => x.id === 'jackknife')!
    expect(c.met).toBe(false)
    expect(c.summary).toMatch(/jackknife/)
    const jk = g.exceptions.filter((e) => e.finding === 'jackknife')
    expect(jk.map((e) => e.key)).toEqual(['jackknife:regen:packed-snow:trailer-empty']) // wet asphalt holds it; solo cases are no tractor jackknife
    expect(jk[0].cells).toHaveLength(2)
    expect(jk[0].cells[0].allowedNm).toBeCloseTo(t, 6)
    const acked = gate(regen(1.1 * t), tractor, jk.map((e) => ({ key: e.key, reason: 'Lift-off regen is cut by the stability controller in curves' })))
    expect(acked.conditions.find((x) => x.id === 'jackknife')?.met).toBe(true)
  })
  it('a truck without a semitrailer has no jackknife finding', () => {
    const g = gate(regen(1.1 * t), { ...tractor, trailer: null }, [], { ...conditions, loadCases: ['empty', 'laden'] })
    expect(g.exceptions.filter((e) => e.finding === 'jackknife')).toEqual([])
    expect(g.conditions.find((x) => x.id === 'jackknife')?.met).toBe(true)
  })
})
