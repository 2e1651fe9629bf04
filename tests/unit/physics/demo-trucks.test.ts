import { describe, expect, it } from 'vitest'
import { demoMapHistories } from '@/db/demo/maps'
import { DEMO_BATTERY_CORNERS, demoTipper, demoTractor } from '@/db/demo/programs'
import { axleLoadsFor, criticalAxleLoadN, drivenAxlesFor, liftOffFindings, mapOverlay, rpmToRadS, simulateLiftOff, STANDARD_GRAVITY, type LoadCase, type MapTable, type SurfaceId, type VehicleParams } from '@/physics'

const tonnes = (n: number) => n / STANDARD_GRAVITY / 1000
const histories = demoMapHistories(demoTipper, demoTractor)
const revision = (name: string, n: number): MapTable => histories.find((h) => h.name === name)!.revisions[n - 1].table
const overlay = (v: VehicleParams, map: MapTable, loadCase: LoadCase, surface: SurfaceId) => mapOverlay({ vehicle: v, loadCase, surface, map })

describe('demo trucks are plausible (limits: EU Directive 96/53/EC as amended, recalled from memory)', () => {
  it('axle loads stay within the limits in every load case', () => {
    for (const v of [demoTipper, demoTractor]) {
      for (const lc of (v.trailer ? ['empty', 'laden', 'trailer-empty', 'trailer-laden'] : ['empty', 'laden']) as LoadCase[]) {
        const { model, trailer } = axleLoadsFor(v, lc)
        expect(tonnes(model.staticSteerAxleLoadN), `${lc} steer`).toBeLessThanOrEqual(10) // non-driven single axle
        expect(tonnes(model.staticDriveAxleLoadN), `${lc} tandem`).toBeLessThanOrEqual(18) // tandem, 1.3–1.8 m spread
        if (v.axleLayout === '6x2') expect(tonnes(criticalAxleLoadN(drivenAxlesFor(v), model.staticDriveAxleLoadN, 0)), `${lc} driven axle`).toBeLessThanOrEqual(11.5)
        if (trailer) expect(model.totalMassKg, `${lc} combination`).toBeLessThanOrEqual(40_000) // five- or six-axle articulated
      }
    }
    expect(demoTipper.grossMassKg).toBeLessThanOrEqual(26_000) // three-axle rigid, twin tyres and air suspension
    // Tri-axle trailer group ≤ 24 t: 28.5 t × 5.2/7.8 = 19.0 t on the trailer axles.
    const t = demoTractor.trailer!
    expect((t.grossMassKg * t.ladenCgToKingpinM) / t.kingpinToAxleM / 1000).toBeCloseTo(19.0, 1)
    expect(t.ladenCgToKingpinM).toBeCloseTo(13.6 / 2 - 1.6, 9) // mid-deck: 13.6 m deck, kingpin 1.6 m behind its front
  })
  it('motors reach about 95 km/h at their speed limit with a constant-power range near 3.5–4:1', () => {
    for (const v of [demoTipper, demoTractor]) {
      const G = v.gearRatios[0] * v.finalDriveRatio
      const topKmh = (rpmToRadS(v.motorMaxSpeedRpm) / G) * v.wheelRadiusM * 3.6
      expect(topKmh).toBeGreaterThan(90)
      expect(topKmh).toBeLessThan(100)
      const cpr = rpmToRadS(v.motorMaxSpeedRpm) / (v.motorPeakPowerW / v.motorPeakTorqueNm)
      expect(cpr).toBeGreaterThan(3)
      expect(cpr).toBeLessThan(4.5)
      // Rotor inertia follows J = 0.04·(T/300)^(5/3) kg·m² (scaling stated in db/demo/programs.ts).
      expect(v.motorInertiaKgM2).toBeCloseTo(0.04 * (v.motorPeakTorqueNm / 300) ** (5 / 3), 2)
    }
  })
})

describe('the demo still shows interesting cells', () => {
  it('the tipper’s drive maps spin on wet asphalt when empty, not when laden', () => {
    for (const n of [1, 2, 3]) {
      expect(overlay(demoTipper, revision('Site drive', n), 'empty', 'wet-asphalt').spinCount, `r${n}`).toBeGreaterThan(0)
      expect(overlay(demoTipper, revision('Site drive', n), 'laden', 'wet-asphalt').spinCount, `r${n}`).toBe(0)
    }
    expect(overlay(demoTractor, revision('Road drive', 2), 'empty', 'wet-asphalt').spinCount).toBeGreaterThan(0)
  })
  it('lift-off regen (the 0 % row) locks the drive axle on packed snow when empty', () => {
    const liftOffLocks = (v: VehicleParams, map: MapTable, lc: LoadCase) => overlay(v, map, lc, 'packed-snow').spin[0].some(Boolean)
    expect(liftOffLocks(demoTipper, revision('Site regen', 1), 'empty')).toBe(true)
    expect(liftOffLocks(demoTipper, revision('Site regen', 2), 'empty')).toBe(false) // the revision that eased lift-off
    expect(liftOffLocks(demoTractor, revision('Road regen', 1), 'empty')).toBe(true) // bobtail 6×2
    expect(liftOffLocks(demoTractor, revision('Road regen', 1), 'trailer-laden')).toBe(false)
    // In time too: a lift-off from 60 km/h on ice locks the empty tipper's tandem (the physics page's default run);
    // laden, its 18 t tandem holds the eased 500 N·m (limit on ice ≈ 0.1 × 176 kN ⇒ about 800 N·m at the motor).
    const liftOff = (loadCase: LoadCase) => simulateLiftOff({ vehicle: demoTipper, loadCase, surface: 'ice', map: revision('Site regen', 2), initialSpeedKmh: 60, durationS: 10 }).summary.locks
    expect(liftOff('empty')).toBe(true)
    expect(liftOff('laden')).toBe(false)
  })
  it('a full and cold pack takes the tipper’s lift-off below 0.3 m/s² where the nominal pack gives more', () => {
    const f = liftOffFindings(demoTipper, revision('Site regen', 2), ['empty', 'laden'], DEMO_BATTERY_CORNERS, 0.3)
    expect(f.map((x) => `${x.corner.label}/${x.loadCase}`)).toContain('Full and cold/empty')
    expect(f.every((x) => x.points.every((p) => p.cornerDecelMps2 < 0.3 && p.nominalDecelMps2 >= 0.3))).toBe(true)
  })
})
