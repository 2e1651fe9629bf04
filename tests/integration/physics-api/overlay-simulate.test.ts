import { beforeAll, describe, expect, it } from 'vitest'
import * as overlayRoute from '@/app/api/maps/[id]/revisions/[number]/overlay/route'
import * as simulateRoute from '@/app/api/maps/[id]/revisions/[number]/simulate/route'
import * as tractionRoute from '@/app/api/programs/[id]/traction/route'
import { call, makeUser, sessionCookie } from '@/tests/support/api'
import { tipperWithMaps } from './fixtures'

let ctx: Awaited<ReturnType<typeof tipperWithMaps>>
let cookie: string

beforeAll(async () => {
  ctx = await tipperWithMaps()
  cookie = await sessionCookie(await makeUser('test_driver'))
})

describe('GET /api/maps/:id/revisions/:number/overlay', () => {
  const path = '/api/maps/x/revisions/1/overlay'
  it('answers 401 without a session', async () => {
    expect((await call(overlayRoute.GET, { path: `${path}?loadCase=empty&surface=ice`, params: { id: ctx.driveId, number: '1' } })).status).toBe(401)
  })

  it('gives any signed-in user the traction limit per speed and the slip, spin and grip grids', async () => {
    const res = await call(overlayRoute.GET, { cookie, path: `${path}?loadCase=empty&surface=ice`, params: { id: ctx.driveId, number: '1' } })
    expect(res.status).toBe(200)
    expect(res.body.tractionLimitBySpeed).toHaveLength(13)
    expect(res.body.slip).toHaveLength(12)
    expect(res.body.spin[11]).toHaveLength(13)
    expect(res.body.spinCount).toBeGreaterThan(0)
    expect(res.body.gradePct).toBe(0)
    // Friction ellipse: lateral grip left per cell, against the default design value (the fixture's conditions state none).
    expect(res.body.lateralCapacityMps2[11]).toHaveLength(13)
    expect(res.body.designLateralAccelMps2).toBe(1.5)
    expect(res.body.freeRollingLateralMps2).toBeCloseTo(0.1 * 9.80665, 9) // ice, level: μ·g
    expect(res.body.liftOffJackknifeCells).toBeNull() // a drive map
    const laden = await call(overlayRoute.GET, { cookie, path: `${path}?loadCase=laden&surface=ice&gradePct=5`, params: { id: ctx.driveId, number: 'latest' } })
    expect(laden.body.spinCount).toBeLessThan(res.body.spinCount)
  })

  it('answers 400 for an unknown surface, a trailer case on a solo truck, or a silly grade', async () => {
    const bad = (q: string) => call(overlayRoute.GET, { cookie, path: `${path}?${q}`, params: { id: ctx.driveId, number: '1' } })
    const surface = await bad('loadCase=empty&surface=lava')
    expect(surface.status).toBe(400)
    expect(surface.body.error.message).toMatch(/^surface: surface must be one of/)
    expect((await bad('loadCase=trailer-laden&surface=ice')).body.error.message).toMatch(/no semitrailer/)
    expect((await bad('loadCase=empty&surface=ice&gradePct=80')).status).toBe(400)
    expect((await bad('surface=ice')).status).toBe(400)
  })

  it('answers 404 for a missing revision', async () => {
    expect((await call(overlayRoute.GET, { cookie, path: `${path}?loadCase=empty&surface=ice`, params: { id: ctx.driveId, number: '9' } })).status).toBe(404)
  })
})

describe('GET /api/maps/:id/revisions/:number/simulate', () => {
  const path = '/api/maps/x/revisions/1/simulate'
  it('answers 401 without a session', async () => {
    expect((await call(simulateRoute.GET, { path: `${path}?mode=launch&surface=dry-asphalt&loadCase=laden`, params: { id: ctx.driveId, number: '1' } })).status).toBe(401)
  })

  it('runs a launch on a drive map with a pedal ramp and returns series and summary', async () => {
    const res = await call(simulateRoute.GET, { cookie, path: `${path}?mode=launch&surface=dry-asphalt&loadCase=laden&pedalPct=80&rampS=1&durationS=20`, params: { id: ctx.driveId, number: '1' } })
    expect(res.status).toBe(200)
    expect(res.body.mode).toBe('launch')
    expect(res.body.summary.timeTo30KmhS).toBeGreaterThan(0)
    expect(res.body.series.t.length).toBe(res.body.series.speedKmh.length)
    expect(res.body.series.t.at(-1)).toBeCloseTo(20, 1)
    expect(res.body.series.pedalPct[25]).toBeCloseTo(40, 0) // half way up the 1 s ramp
  })

  it('runs a lift-off on a regen map and reports lock-up on ice', async () => {
    const res = await call(simulateRoute.GET, { cookie, path: `${path}?mode=liftoff&surface=ice&loadCase=empty&initialSpeedKmh=50`, params: { id: ctx.regenId, number: '1' } })
    expect(res.status).toBe(200)
    expect(res.body.summary.locks).toBe(true)
    expect(res.body.series.speedKmh[0]).toBeCloseTo(50, 3)
  })

  it('refuses the wrong map kind, a bad mode and an out-of-range pedal with 400', async () => {
    const q = (id: string, s: string) => call(simulateRoute.GET, { cookie, path: `${path}?${s}`, params: { id, number: '1' } })
    expect((await q(ctx.regenId, 'mode=launch&surface=ice&loadCase=empty')).body.error.message).toMatch(/launch runs on a drive map/)
    expect((await q(ctx.driveId, 'mode=liftoff&surface=ice&loadCase=empty')).body.error.message).toMatch(/lift-off runs on a regen map/)
    expect((await q(ctx.driveId, 'mode=sprint&surface=ice&loadCase=empty')).status).toBe(400)
    const pedal = await q(ctx.driveId, 'mode=launch&surface=ice&loadCase=empty&pedalPct=140')
    expect(pedal.status).toBe(400)
    expect(pedal.body.error.message).toBe('pedalPct: pedalPct must be at most 100 %')
  })
})

describe('GET /api/programs/:id/traction', () => {
  it('answers 401 without a session and 404 for a missing program', async () => {
    expect((await call(tractionRoute.GET, { params: { id: String(ctx.program.id) } })).status).toBe(401)
    expect((await call(tractionRoute.GET, { cookie, params: { id: '424242' } })).status).toBe(404)
    expect((await call(tractionRoute.GET, { cookie, params: { id: 'abc' } })).status).toBe(404)
  })

  it('lists every surface × load case, with more grip laden and on dry asphalt than on ice', async () => {
    const res = await call(tractionRoute.GET, { cookie, params: { id: String(ctx.program.id) } })
    expect(res.status).toBe(200)
    expect(res.body.rows).toHaveLength(10)
    const row = (s: string, l: string) => res.body.rows.find((r: { surface: string; loadCase: string }) => r.surface === s && r.loadCase === l)
    expect(row('dry-asphalt', 'laden').driveLimitKN).toBeGreaterThan(row('dry-asphalt', 'empty').driveLimitKN)
    expect(row('ice', 'empty').driveLimitKN).toBeLessThan(row('dry-asphalt', 'empty').driveLimitKN)
    expect(row('ice', 'empty').regenLimitKN).toBeLessThan(row('ice', 'empty').driveLimitKN)
  })
})
