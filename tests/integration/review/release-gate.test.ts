import { describe, expect, it } from 'vitest'
import { eq, sql } from 'drizzle-orm'
import { getDb } from '@/db/client'
import { paramVersions } from '@/db/schema'
import { SMALL_DRIVE } from '@/tests/support/fixtures'
import { GENTLE, stateOf } from '@/tests/support/review-fixtures'
import { approve, fileCoveringReports, gateMet, getSetView, makeSet, releaseSet, setSetup } from '@/tests/support/set-fixtures'

const ALL_MET = { parts: true, approved: true, validation: true, exportable: true, ramps: true, traction: true, jackknife: true, 'drive-report': true, coverage: true, safety: true }

/** A set whose two revisions are approved and which has a clean drive report, so only the condition under test can fail. */
async function readySet(opts: { drive?: typeof GENTLE; report?: boolean; approveRegen?: boolean } = {}) {
  const s = await setSetup({ drive: opts.drive ?? GENTLE })
  await approve(s, s.driveRevisionId)
  if (opts.approveRegen !== false) await approve(s, s.regenRevisionId)
  const setId = await makeSet(s)
  if (opts.report !== false) await fileCoveringReports(setId, s.driverCookie)
  return { ...s, setId }
}

const gate = async (s: { setId: number; leadCookie: string }) => gateMet(await getSetView(s.setId, s.leadCookie))

describe('set release gate: each condition alone blocks the release', () => {
  it('passes when every condition is met', async () => {
    const s = await readySet()
    expect(await gate(s)).toEqual(ALL_MET)
    expect((await releaseSet(s.setId, s.leadCookie)).status).toBe(200)
    expect(await stateOf(s.mapId, 1)).toBe('released')
  })

  it('a revision not approved blocks it (the set may be driven as a draft, not released)', async () => {
    const s = await readySet({ approveRegen: false })
    expect(await gate(s)).toEqual({ ...ALL_MET, approved: false })
    const res = await releaseSet(s.setId, s.leadCookie)
    expect(res.status).toBe(409)
    expect(res.body.error.message).toMatch(/not approved/)
  })

  it('a validation error blocks it (pedal order broken, traction fine)', async () => {
    const broken = { ...GENTLE, values: [[20, 0, 0], [60, 50, 40], [50, 100, 80]] } // 100 % below 50 % at 0 km/h
    const s = await setSetup({ drive: broken })
    await approve(s, s.regenRevisionId)
    const setId = await makeSet(s)
    expect((await gate({ setId, leadCookie: s.leadCookie })).validation).toBe(false)
    expect((await releaseSet(setId, s.leadCookie)).status).toBe(409)
  })

  it('a cell above the traction limit blocks it until each exception is acknowledged with a reason', async () => {
    // 2,800 N·m at standstill is about 66 kN at the wheels (× 3.2 × 4.1 × 0.93 ÷ 0.52 m). On packed snow
    // (μ 0.3) the drive tandem carries at most ~63 kN even laden; on wet asphalt laden it carries ~170 kN.
    const strong = { ...SMALL_DRIVE, values: [[100, 0, 0], [1400, 700, 400], [2800, 1500, 800]] }
    const s = await readySet({ drive: strong })
    const view = await getSetView(s.setId, s.leadCookie)
    expect(gateMet(view)).toEqual({ ...ALL_MET, traction: false })
    const keys: string[] = view.body.gate.exceptions.map((e: { key: string }) => e.key)
    expect(keys).toEqual(expect.arrayContaining(['traction:drive:packed-snow:empty', 'traction:drive:packed-snow:laden']))
    expect(keys).not.toContain('traction:drive:wet-asphalt:laden')
    expect((await releaseSet(s.setId, s.leadCookie)).status).toBe(409)
    expect((await releaseSet(s.setId, s.leadCookie, [{ key: keys[0], reason: 'traction control covers it' }])).status).toBe(409)
    const unknown = await releaseSet(s.setId, s.leadCookie, [...keys.map((key) => ({ key, reason: 'r' })), { key: 'traction:regen:ice:empty', reason: 'r' }])
    expect(unknown.status).toBe(400)
    expect(unknown.body.error.message).toMatch(/traction:regen:ice:empty match no exception/)
    expect((await releaseSet(s.setId, s.leadCookie, keys.map((key) => ({ key, reason: 'Closed-course only; traction control active' })))).status).toBe(200)
  })

  it('no drive report on the set, or an open safety concern, blocks it', async () => {
    const s = await readySet({ report: false })
    expect(await gate(s)).toEqual({ ...ALL_MET, 'drive-report': false, coverage: false }) // no report covers any condition either
    await fileCoveringReports(s.setId, s.driverCookie, { flags: [{ map: 'regen', pedalPct: 0, speedKmh: 30, what: 'axle locked on lift-off', severity: 4 }] })
    expect(await gate(s)).toEqual({ ...ALL_MET, safety: false })
    expect((await releaseSet(s.setId, s.leadCookie)).status).toBe(409)
  })

  it('release conditions without a low-friction surface or without both load cases block it', async () => {
    const s = await readySet()
    const db = await getDb()
    // Versions are immutable by trigger; this test bends one on purpose to reach the gate's own check.
    await db.execute(sql`alter table param_versions disable trigger param_versions_immutable`)
    await db.update(paramVersions).set({ releaseConditions: { surfaces: ['dry-asphalt'], loadCases: ['empty', 'laden'], marginPct: 10 } }).where(eq(paramVersions.programId, s.programId))
    expect((await gate(s)).traction).toBe(false)
    await db.update(paramVersions).set({ releaseConditions: { surfaces: ['ice'], loadCases: ['laden'], marginPct: 10 } }).where(eq(paramVersions.programId, s.programId))
    await db.execute(sql`alter table param_versions enable trigger param_versions_immutable`)
    expect((await gate(s)).traction).toBe(false)
    expect((await releaseSet(s.setId, s.leadCookie)).status).toBe(409)
  })
})
