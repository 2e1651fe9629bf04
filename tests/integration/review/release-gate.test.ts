import { describe, expect, it } from 'vitest'
import { eq } from 'drizzle-orm'
import * as gateRoute from '@/app/api/revisions/[revisionId]/gate/route'
import { getDb } from '@/db/client'
import { vehiclePrograms } from '@/db/schema'
import { call } from '@/tests/support/api'
import { SMALL_DRIVE } from '@/tests/support/fixtures'
import { act, fileReport, GENTLE, reviewSetup, stateOf } from '@/tests/support/review-fixtures'

async function gate(revisionId: number, cookie: string) {
  const res = await call(gateRoute.GET, { cookie, params: { revisionId: String(revisionId) } })
  return Object.fromEntries(res.body.gate.conditions.map((c: { id: string; met: boolean }) => [c.id, c.met])) as Record<string, boolean>
}

/** Approve a revision and file a clean drive report, so only the condition under test can fail. */
async function approvedWithReport(table = GENTLE, report = true) {
  const s = await reviewSetup(table)
  await act(s.revisionId, s.cookie, 'submit')
  await act(s.revisionId, s.leadCookie, 'approve')
  if (report) await fileReport(s.revisionId, s.driverCookie)
  return s
}

describe('release gate: each condition alone blocks the release', () => {
  it('passes when every condition is met', async () => {
    const s = await approvedWithReport()
    expect(await gate(s.revisionId, s.leadCookie)).toEqual({ validation: true, traction: true, 'drive-report': true })
    expect((await act(s.revisionId, s.leadCookie, 'release')).status).toBe(200)
  })

  it('a validation error blocks it (pedal order broken, traction fine)', async () => {
    const broken = { ...GENTLE, values: [[20, 0, 0], [60, 50, 40], [50, 100, 80]] } // 100 % below 50 % at 0 km/h
    const s = await approvedWithReport(broken)
    expect(await gate(s.revisionId, s.leadCookie)).toEqual({ validation: false, traction: true, 'drive-report': true })
    const res = await act(s.revisionId, s.leadCookie, 'release')
    expect(res.status).toBe(409)
    expect(await stateOf(s.mapId, 2)).toBe('approved')
  })

  it('a cell above the traction limit blocks it until the lead acknowledges it with a reason', async () => {
    // 2,800 N·m at standstill is about 66 kN at the wheels (× 3.2 × 4.1 × 0.93 ÷ 0.52 m). On packed snow
    // (μ 0.3) the drive tandem carries at most ~63 kN even laden; on wet asphalt laden it carries ~170 kN.
    const strong = { ...SMALL_DRIVE, values: [[100, 0, 0], [1400, 700, 400], [2800, 1500, 800]] }
    const s = await approvedWithReport(strong)
    const g = await call(gateRoute.GET, { cookie: s.leadCookie, params: { revisionId: String(s.revisionId) } })
    expect(g.body.gate.conditions.map((c: { met: boolean }) => c.met)).toEqual([true, false, true])
    const keys: string[] = g.body.gate.exceptions.map((e: { key: string }) => e.key)
    expect(keys).toEqual(expect.arrayContaining(['traction:packed-snow:empty', 'traction:packed-snow:laden']))
    expect(keys).not.toContain('traction:wet-asphalt:laden')
    expect((await act(s.revisionId, s.leadCookie, 'release')).status).toBe(409)
    const partial = await act(s.revisionId, s.leadCookie, 'release', { acknowledgements: [{ key: keys[0], reason: 'traction control covers it' }] })
    expect(partial.status).toBe(409)
    const all = await act(s.revisionId, s.leadCookie, 'release', { acknowledgements: keys.map((key) => ({ key, reason: 'Closed-course only; traction control active' })) })
    expect(all.status).toBe(200)
    expect(await stateOf(s.mapId, 2)).toBe('released')
  })

  it('no drive report, or an open safety concern, blocks it', async () => {
    const s = await approvedWithReport(GENTLE, false)
    expect(await gate(s.revisionId, s.leadCookie)).toEqual({ validation: true, traction: true, 'drive-report': false })
    await fileReport(s.revisionId, s.driverCookie, { flags: [{ pedalPct: 0, speedKmh: 30, what: 'axle locked', severity: 4 }] })
    expect((await gate(s.revisionId, s.leadCookie))['drive-report']).toBe(false)
    expect((await act(s.revisionId, s.leadCookie, 'release')).status).toBe(409)
  })

  it('release conditions without a low-friction surface or without both load cases block it', async () => {
    const s = await approvedWithReport()
    const db = await getDb()
    await db.update(vehiclePrograms).set({ releaseConditions: { surfaces: ['dry-asphalt'], loadCases: ['empty', 'laden'], marginPct: 10 } }).where(eq(vehiclePrograms.id, s.programId))
    expect((await gate(s.revisionId, s.leadCookie)).traction).toBe(false)
    await db.update(vehiclePrograms).set({ releaseConditions: { surfaces: ['ice'], loadCases: ['laden'], marginPct: 10 } }).where(eq(vehiclePrograms.id, s.programId))
    expect((await gate(s.revisionId, s.leadCookie)).traction).toBe(false)
    expect((await act(s.revisionId, s.leadCookie, 'release')).status).toBe(409)
  })
})
