// Torque ramp limits as a versioned part of a set: versions never change, a set names the one it
// runs with, the gate checks them against the maps, and the package carries them.
import { describe, expect, it } from 'vitest'
import { createHash } from 'node:crypto'
import { eq, sql } from 'drizzle-orm'
import { strFromU8, unzipSync } from 'fflate'
import * as rampsRoute from '@/app/api/programs/[id]/ramp-versions/route'
import { getDb } from '@/db/client'
import { auditLog, rampVersions } from '@/db/schema'
import { starterRamps, type RampLimits } from '@/maps/ramps'
import { call } from '@/tests/support/api'
import { approve, downloadPackage, fileCoveringReports, fileSetReport, gateMet, getSetView, makeSet, releaseSet, setSetup, type SetCtx } from '@/tests/support/set-fixtures'

const sha256 = (b: Uint8Array) => createHash('sha256').update(b).digest('hex')
const RAMPS: RampLimits = { speedKmh: [0, 20, 60], tipInNmPerS: [4000, 5000, 6000], tipOutNmPerS: [8000, 8000, 8000], lashBandNm: 10, lashRateNmPerS: 400 }

const postRamps = (s: SetCtx, cookie: string, body: unknown) => call(rampsRoute.POST, { method: 'POST', cookie, params: { id: String(s.programId) }, body })

describe('ramp versions', () => {
  it('are numbered per program, need a reason, refuse bad limits field by field, and are engineers’ to make', async () => {
    const s = await setSetup()
    const first = await postRamps(s, s.cookie, { limits: RAMPS, reason: 'First ramps' })
    expect(first.status).toBe(201)
    expect(first.body.version).toMatchObject({ number: 1, limits: RAMPS, reason: 'First ramps' })
    const second = await postRamps(s, s.leadCookie, { limits: { ...RAMPS, lashRateNmPerS: 300 }, reason: 'Softer lash' })
    expect(second.body.version.number).toBe(2)

    const noReason = await postRamps(s, s.cookie, { limits: RAMPS, reason: ' ' })
    expect(noReason.status).toBe(400)
    expect(noReason.body.error.message).toMatch(/reason: Say why the ramp limits change/)
    const bad = await postRamps(s, s.cookie, { limits: { ...RAMPS, tipInNmPerS: [4000, -1, 6000] }, reason: 'x' })
    expect(bad.status).toBe(400)
    expect(bad.body.error.message).toMatch(/limits\.tipInNmPerS\.1: Each tip-in rate \(N·m\/s\) must be greater than 0/)
    expect((await postRamps(s, s.driverCookie, { limits: RAMPS, reason: 'x' })).status).toBe(403)

    const list = await call(rampsRoute.GET, { cookie: s.driverCookie, params: { id: String(s.programId) } })
    expect(list.body.versions.map((v: { number: number }) => v.number)).toEqual([2, 1])
    const db = await getDb()
    const audits = await db.select().from(auditLog).where(eq(auditLog.action, 'program.new-ramp-version'))
    expect(audits.filter((a) => a.entityId === s.programId)).toHaveLength(2)
  })

  it('cannot be changed or deleted in the database', async () => {
    const s = await setSetup()
    const made = await postRamps(s, s.cookie, { limits: RAMPS, reason: 'First ramps' })
    const db = await getDb()
    const id = made.body.version.id as number
    await expect(db.update(rampVersions).set({ reason: 'rewritten' }).where(eq(rampVersions.id, id))).rejects.toThrow()
    await expect(db.execute(sql`delete from ramp_versions where id = ${id}`)).rejects.toThrow()
    const [row] = await db.select().from(rampVersions).where(eq(rampVersions.id, id))
    expect(row.reason).toBe('First ramps')
  })
})

describe('a set holds its ramps', () => {
  it('takes the latest ramp version by default; other ramps make another set; none is allowed', async () => {
    const s = await setSetup()
    const noRamps = await makeSet(s)
    expect((await getSetView(noRamps, s.cookie)).body.set.rampVersion).toBeNull()
    await postRamps(s, s.cookie, { limits: RAMPS, reason: 'First ramps' })
    const withRamps = await makeSet(s)
    expect(withRamps).not.toBe(noRamps)
    expect((await getSetView(withRamps, s.cookie)).body.set.rampVersion).toMatchObject({ number: 1, limits: RAMPS })
    // The same three parts and the same ramps are the same set; explicitly none is the first set again.
    expect(await makeSet(s, { rampVersion: 1 })).toBe(withRamps)
    expect(await makeSet(s, { rampVersion: null })).toBe(noRamps)
    await postRamps(s, s.cookie, { limits: { ...RAMPS, lashRateNmPerS: 300 }, reason: 'Softer lash' })
    expect(await makeSet(s)).not.toBe(withRamps)
    const missing = await call((await import('@/app/api/sets/route')).POST, { method: 'POST', cookie: s.cookie, body: { driveRevisionId: s.driveRevisionId, regenRevisionId: s.regenRevisionId, rampVersion: 9 } })
    expect(missing.status).toBe(400)
    expect(missing.body.error.message).toMatch(/rampVersion: .* has no ramp version 9/)
  })

  it('the gate refuses ramps whose lash band is as wide as the maps ask for; released ramps travel in the package', async () => {
    const s = await setSetup()
    await approve(s, s.driveRevisionId)
    await approve(s, s.regenRevisionId)
    // The gentle regen map asks for at most 100 N·m: a ±100 N·m lash band would slow every request.
    await postRamps(s, s.cookie, { limits: { ...RAMPS, lashBandNm: 100 }, reason: 'Too wide' })
    const wide = await makeSet(s)
    await fileSetReport(wide, s.driverCookie)
    const view = await getSetView(wide, s.leadCookie)
    expect(gateMet(view).ramps).toBe(false)
    expect(view.body.gate.conditions.find((c: { id: string }) => c.id === 'ramps').details[0]).toMatch(/lash band \(±100 N·m\) must be narrower/)
    expect((await releaseSet(wide, s.leadCookie)).status).toBe(409)

    await postRamps(s, s.cookie, { limits: RAMPS, reason: 'Narrow band' })
    const good = await makeSet(s)
    await fileCoveringReports(good, s.driverCookie)
    expect(gateMet(await getSetView(good, s.leadCookie)).ramps).toBe(true)
    const released = await releaseSet(good, s.leadCookie)
    expect(released.status, JSON.stringify(released.body)).toBe(200)
    const pkg = await downloadPackage(good, s.leadCookie)
    const files = unzipSync(pkg.bytes)
    const manifest = JSON.parse(strFromU8(files['manifest.json']))
    expect(manifest.rampVersion).toMatchObject({ number: 2, reason: 'Narrow band', files: ['ramps-v2.h', 'ramps-v2.csv', 'ramps-v2.json'] })
    for (const name of manifest.rampVersion.files) expect(manifest.files.find((f: { name: string }) => f.name === name).sha256).toBe(sha256(files[name]))
    expect(JSON.parse(strFromU8(files['ramps-v2.json']))).toMatchObject({ format: 'mapwright-ramp-limits', rampVersion: 2, ...RAMPS })
    expect(strFromU8(files['ramps-v2.csv']).split('\n')[1]).toBe('0,4000,8000')
    expect(strFromU8(files['ramps-v2.h'])).toMatch(/_tip_in\[[A-Z0-9_]+_POINTS\] = \{ 4000, 5000, 6000 \};/)
  })
})

it('starter ramps validate for a demo-sized motor', () => {
  expect(starterRamps(2800).tipInNmPerS[0]).toBe(5600)
})
