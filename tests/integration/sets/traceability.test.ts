// Each "why" of the map-set work, shown impossible through the route handlers: what is released
// is exactly what was driven and judged, and nothing changes it afterwards.
import { describe, expect, it } from 'vitest'
import { createHash } from 'node:crypto'
import { eq, sql } from 'drizzle-orm'
import { strFromU8, unzipSync } from 'fflate'
import * as actionsRoute from '@/app/api/revisions/[revisionId]/actions/route'
import * as reportRoute from '@/app/api/reports/[id]/route'
import * as reportSetRoute from '@/app/api/reports/[id]/set/route'
import * as revisionRoute from '@/app/api/maps/[id]/revisions/[number]/route'
import * as programRoute from '@/app/api/programs/[id]/route'
import * as setsRoute from '@/app/api/sets/route'
import { getDb } from '@/db/client'
import { auditLog, paramVersions, users, vehiclePrograms } from '@/db/schema'
import { call, makeUser, sessionCookie } from '@/tests/support/api'
import { GENTLE } from '@/tests/support/review-fixtures'
import { SMALL_DRIVE } from '@/tests/support/fixtures'
import { approve, downloadPackage, GENTLE_REGEN, fileCoveringReports, fileSetReport, gateMet, getSetView, makeSet, releaseSet, saveRevision, setReportBody, setSetup, withdrawSet } from '@/tests/support/set-fixtures'

const sha256 = (b: Uint8Array) => createHash('sha256').update(b).digest('hex')

/** The database's own message for a refused statement (Drizzle wraps it as the cause). */
async function refusal(p: Promise<unknown>): Promise<string> {
  try {
    await p
  } catch (e) {
    const err = e as { message?: string; cause?: { message?: string } }
    return `${err.message ?? ''} ${err.cause?.message ?? ''}`
  }
  return 'not refused'
}

// 2,800 N·m at standstill is about 66 kN at the wheels (× 3.2 × 4.1 × 0.93 ÷ 0.52 m); on packed snow
// (μ 0.3) the drive tandem carries at most ~63 kN even laden, so the gate finds exceptions there.
const STRONG = { ...SMALL_DRIVE, values: [[100, 0, 0], [1400, 700, 400], [2800, 1500, 800]] }

describe('a drive map and a regen map are released together, as driven', () => {
  it('a revision is never released alone; a set without a drive report on exactly it is refused', async () => {
    const s = await setSetup()
    await approve(s, s.driveRevisionId)
    await approve(s, s.regenRevisionId)
    const single = await call(actionsRoute.POST, { method: 'POST', cookie: s.leadCookie, params: { revisionId: String(s.driveRevisionId) }, body: { action: 'release' } })
    expect(single.status).toBe(400)
    expect(single.body.error.message).toMatch(/map set/)

    // Set A was driven; set B holds the same drive revision with another regen revision and was not.
    const driven = await makeSet(s)
    await fileCoveringReports(driven, s.driverCookie)
    const regen2 = await saveRevision(s, s.regenMapId, 1, { ...GENTLE_REGEN, values: [[0, 30, 30], [0, 60, 60], [0, 100, 100]] })
    await approve(s, regen2)
    const notDriven = await makeSet(s, { regenRevisionId: regen2 })
    const refused = await releaseSet(notDriven, s.leadCookie)
    expect(refused.status).toBe(409)
    expect(refused.body.error.message).toMatch(/No drive report has been filed on this set/)
    expect((await releaseSet(driven, s.leadCookie)).status).toBe(200)
  })

  it('the same parts make the same set; a set names one program and the right kinds', async () => {
    const s = await setSetup()
    const a = await makeSet(s)
    const again = await call(setsRoute.POST, { method: 'POST', cookie: s.cookie, body: { driveRevisionId: s.driveRevisionId, regenRevisionId: s.regenRevisionId } })
    expect(again.status).toBe(200)
    expect(again.body).toMatchObject({ existing: true, set: { id: a } })
    const swapped = await call(setsRoute.POST, { method: 'POST', cookie: s.cookie, body: { driveRevisionId: s.regenRevisionId, regenRevisionId: s.driveRevisionId } })
    expect(swapped.status).toBe(400)
    expect(swapped.body.error.message).toMatch(/driveRevisionId: revision \d+ belongs to “Lift-off”, a regen map/)
    const other = await setSetup()
    const mixed = await call(setsRoute.POST, { method: 'POST', cookie: s.cookie, body: { driveRevisionId: s.driveRevisionId, regenRevisionId: other.regenRevisionId } })
    expect(mixed.status).toBe(400)
    expect(mixed.body.error.message).toMatch(/a set is one program's/)
    const db = await getDb()
    expect(await refusal(db.execute(sql`update map_sets set regen_revision_id = ${other.regenRevisionId} where id = ${a}`))).toMatch(/immutable/)
  })
})

describe('a report stays on the set it was filed against', () => {
  it("a driver's edit cannot move a report with a safety concern to another set; the concern blocks every set holding that revision", async () => {
    const s = await setSetup()
    await approve(s, s.driveRevisionId)
    await approve(s, s.regenRevisionId)
    const first = await makeSet(s)
    const reportId = await fileSetReport(first, s.driverCookie, { flags: [{ map: 'drive', pedalPct: 50, speedKmh: 5, what: 'tandem spun and the truck slid sideways', severity: 4 }] })
    const regen2 = await saveRevision(s, s.regenMapId, 1, { kind: 'regen', rowAxis: [0, 50, 100], colAxis: [0, 20, 60], values: [[0, 25, 25], [0, 60, 60], [0, 100, 100]] })
    await approve(s, regen2)
    const second = await makeSet(s, { regenRevisionId: regen2 })

    const moved = await call(reportRoute.PUT, { method: 'PUT', cookie: s.driverCookie, params: { id: String(reportId) }, body: setReportBody(second, { flags: [] }) })
    expect(moved.status).toBeGreaterThanOrEqual(400)
    expect((await call(reportRoute.GET, { cookie: s.leadCookie, params: { id: String(reportId) } })).body.report.setId).toBe(first)

    // The concern was found on the drive revision: the first set and the second (same drive revision) are both blocked.
    await fileCoveringReports(second, s.driverCookie)
    for (const id of [first, second]) {
      expect(gateMet(await getSetView(id, s.leadCookie)).safety).toBe(false)
      expect((await releaseSet(id, s.leadCookie)).status).toBe(409)
    }
  })
})

describe('acknowledged exceptions are kept with who, when and why', () => {
  it('shows them on the set, in the audit row and in the package', async () => {
    const s = await setSetup({ drive: STRONG })
    await approve(s, s.driveRevisionId)
    await approve(s, s.regenRevisionId)
    const id = await makeSet(s)
    await fileCoveringReports(id, s.driverCookie)
    const view = await getSetView(id, s.leadCookie)
    const keys: string[] = view.body.gate.exceptions.map((e: { key: string }) => e.key)
    expect(keys).toEqual(expect.arrayContaining(['traction:drive:packed-snow:empty', 'traction:drive:packed-snow:laden']))
    expect((await releaseSet(id, s.leadCookie, [{ key: keys[0], reason: 'partial' }])).status).toBe(409)
    const reason = 'Snow running is closed-course only this season; traction control active'
    const released = await releaseSet(id, s.leadCookie, keys.map((key) => ({ key, reason })))
    expect(released.status).toBe(200)

    const after = await getSetView(id, s.leadCookie)
    expect(after.body.set.status).toBe('released')
    expect(after.body.set.releases[0].acknowledgements).toEqual(
      expect.arrayContaining([expect.objectContaining({ key: keys[0], reason, byId: s.lead.id, byName: s.lead.name, mapKind: 'drive', revisionId: s.driveRevisionId })]),
    )
    const db = await getDb()
    const [audit] = await db.select().from(auditLog).where(sql`${auditLog.action} = 'set.release' and ${auditLog.entityId} = ${id}`)
    expect(JSON.stringify(audit.details)).toContain(reason)
    const files = unzipSync((await downloadPackage(id, s.driverCookie)).bytes)
    const manifest = JSON.parse(strFromU8(files['manifest.json']))
    expect(manifest.acknowledgements).toEqual(expect.arrayContaining([expect.objectContaining({ key: keys[0], reason, by: s.lead.name })]))
  })
})

describe('vehicle parameters are versioned; a set is judged with its own version', () => {
  it('a change needs a reason, makes version 2 with every changed field audited, and leaves older sets on version 1', async () => {
    // 700 N·m at standstill, about 16.5 kN at the wheels: within the tandem's grip on packed snow, beyond it on ice (μ about 0.1).
    const s = await setSetup({ drive: { ...SMALL_DRIVE, values: [[100, 0, 0], [400, 350, 200], [700, 600, 300]] } })
    const db = await getDb()
    const [program] = await db.select().from(vehiclePrograms).where(eq(vehiclePrograms.id, s.programId))
    await approve(s, s.driveRevisionId)
    await approve(s, s.regenRevisionId)
    const onV1 = await makeSet(s)
    await fileCoveringReports(onV1, s.driverCookie)

    // Weighed again: a lighter empty truck with a higher centre of gravity.
    const params = { ...program.params, emptyMassKg: 4000, emptyCgHeightM: program.params.emptyCgHeightM + 0.3 }
    const body = { name: program.name, description: program.description, params }
    const noReason = await call(programRoute.PUT, { method: 'PUT', cookie: s.cookie, params: { id: String(s.programId) }, body })
    expect(noReason.status).toBe(400)
    expect(noReason.body.error.message).toMatch(/reason/)
    expect((await db.select().from(paramVersions).where(eq(paramVersions.programId, s.programId))).length).toBe(1)

    const ok = await call(programRoute.PUT, { method: 'PUT', cookie: s.cookie, params: { id: String(s.programId) }, body: { ...body, reason: 'Weighed after the battery swap' } })
    expect(ok.status).toBe(200)
    expect(ok.body.newParamVersion).toBe(2)
    const [audit] = await db.select().from(auditLog).where(sql`${auditLog.action} = 'program.new-param-version' and ${auditLog.entityId} = ${s.programId}`)
    expect(audit.details).toMatchObject({ paramVersion: 2, reason: 'Weighed after the battery swap' })
    expect(audit.details.changes).toEqual(
      expect.arrayContaining([{ path: 'params.emptyMassKg', from: program.params.emptyMassKg, to: 4000 }, expect.objectContaining({ path: 'params.emptyCgHeightM' })]),
    )

    // The gate of the set made before judges with version 1 even now that the program has moved on.
    const withIce = await call(programRoute.PUT, {
      method: 'PUT',
      cookie: s.cookie,
      params: { id: String(s.programId) },
      body: { ...body, releaseConditions: { surfaces: ['wet-asphalt', 'packed-snow', 'ice'], loadCases: ['empty', 'laden'], marginPct: 10 }, reason: 'Winter trials add ice' },
    })
    expect(withIce.body.newParamVersion).toBe(3)
    // The map pages and their API say which version they judge with: the program's latest.
    const rev = await call(revisionRoute.GET, { cookie: s.cookie, params: { id: String(s.mapId), number: '1' } })
    expect(rev.body.paramVersion).toBe(3)
    expect(gateMet(await getSetView(onV1, s.leadCookie)).traction).toBe(true)
    const onV3 = await makeSet(s, { paramVersion: 3 })
    expect(gateMet(await getSetView(onV3, s.leadCookie)).traction).toBe(false)

    const v1 = await getSetView(onV1, s.leadCookie)
    expect(v1.body.set.paramVersion.number).toBe(1)
    expect(v1.body.set.paramVersion.params.emptyMassKg).toBe(program.params.emptyMassKg)
    const onV2 = await makeSet(s, { paramVersion: 2 })
    expect(onV2).not.toBe(onV1)
    expect((await getSetView(onV2, s.leadCookie)).body.set.paramVersion.number).toBe(2)
    // A version can be named; the set it makes is a third combination only if it differs.
    expect(await makeSet(s, { paramVersion: 1 })).toBe(onV1)

    expect(await refusal(db.execute(sql`update param_versions set params = '{}'::jsonb where program_id = ${s.programId}`))).toMatch(/immutable/)
    expect(await refusal(db.execute(sql`delete from param_versions where program_id = ${s.programId}`))).toMatch(/immutable/)
  })
})

describe('the release package is frozen at release', () => {
  it('serves the same bytes after renames, lists a SHA-256 per file, and refuses a withdrawn release', async () => {
    const s = await setSetup()
    await approve(s, s.driveRevisionId)
    await approve(s, s.regenRevisionId)
    const id = await makeSet(s)
    await fileCoveringReports(id, s.driverCookie)
    expect((await downloadPackage(id, s.cookie)).status).toBe(409) // not released yet
    expect((await releaseSet(id, s.leadCookie)).status).toBe(200)
    const first = await downloadPackage(id, s.cookie)
    expect(first.status).toBe(200)
    expect(first.headers.get('x-package-sha256')).toBe(sha256(first.bytes))

    const db = await getDb()
    const [program] = await db.select().from(vehiclePrograms).where(eq(vehiclePrograms.id, s.programId))
    await db.update(vehiclePrograms).set({ name: `${program.name} renamed` }).where(eq(vehiclePrograms.id, s.programId))
    await db.update(users).set({ name: 'Someone Else' }).where(eq(users.id, s.lead.id))
    const second = await downloadPackage(id, s.driverCookie)
    expect(Buffer.from(second.bytes).equals(Buffer.from(first.bytes))).toBe(true)

    const files = unzipSync(second.bytes)
    const manifest = JSON.parse(strFromU8(files['manifest.json']))
    expect(manifest).toMatchObject({ package: 'release', program: { name: program.name }, releasedBy: s.lead.name, set: { id } })
    expect(manifest.revisions.map((r: { kind: string }) => r.kind)).toEqual(['drive', 'regen'])
    expect(manifest.evidenceReports).toHaveLength(4) // one report per release condition (2 surfaces × 2 load cases)
    const listed = Object.fromEntries(manifest.files.map((f: { name: string; sha256: string }) => [f.name, f.sha256]))
    expect(Object.keys(listed).sort()).toEqual(Object.keys(files).filter((n) => n !== 'manifest.json').sort())
    for (const [name, hash] of Object.entries(listed)) expect(sha256(files[name]), name).toBe(hash)
    expect(strFromU8(files['CAUTION.txt'])).toMatch(/closed course/)

    expect(await refusal(db.execute(sql`update set_releases set package_sha256 = 'x' where set_id = ${id}`))).toMatch(/frozen/)
    expect((await withdrawSet(id, s.leadCookie, 'Drivers report a jerky lift-off')).status).toBe(200)
    const withdrawn = await downloadPackage(id, s.cookie)
    expect(withdrawn.status).toBe(410)
    expect(JSON.parse(Buffer.from(withdrawn.bytes).toString()).error.message).toMatch(/withdrawn .*Drivers report a jerky lift-off.*must not be used/)
    expect((await getSetView(id, s.cookie)).body.set.status).toBe('withdrawn')
  })

  it('a test package carries the test notice in every file and is the same at every download', async () => {
    const s = await setSetup()
    const id = await makeSet(s)
    const a = await downloadPackage(id, s.driverCookie, 'test')
    const b = await downloadPackage(id, s.cookie, 'test')
    expect(a.status).toBe(200)
    expect(Buffer.from(a.bytes).equals(Buffer.from(b.bytes))).toBe(true)
    const files = unzipSync(a.bytes)
    for (const [name, bytes] of Object.entries(files)) expect(strFromU8(bytes), name).toMatch(/TEST PACKAGE - NOT FOR RELEASE/)
  })
})

describe('GENTLE fixture sanity', () => {
  it('the gentle pair passes every gate condition once approved and driven', async () => {
    const s = await setSetup({ drive: GENTLE })
    await approve(s, s.driveRevisionId)
    await approve(s, s.regenRevisionId)
    const id = await makeSet(s)
    await fileCoveringReports(id, s.driverCookie)
    expect(gateMet(await getSetView(id, s.leadCookie))).toEqual({ parts: true, approved: true, validation: true, exportable: true, ramps: true, traction: true, jackknife: true, 'drive-report': true, coverage: true, safety: true })
  })
})

describe('found trying the sets as an attacker and a new user', () => {
  it('a withdrawal never brings back a release whose set was withdrawn since', async () => {
    const s = await setSetup()
    await approve(s, s.driveRevisionId)
    await approve(s, s.regenRevisionId)
    const a = await makeSet(s)
    await fileCoveringReports(a, s.driverCookie)
    const regen2 = await saveRevision(s, s.regenMapId, 1, { ...GENTLE_REGEN, values: [[0, 25, 25], [0, 60, 60], [0, 100, 100]] })
    await approve(s, regen2)
    const b = await makeSet(s, { regenRevisionId: regen2 })
    await fileCoveringReports(b, s.driverCookie)
    expect((await releaseSet(a, s.leadCookie)).status).toBe(200)
    expect((await releaseSet(b, s.leadCookie)).status).toBe(200) // retires A
    expect((await releaseSet(a, s.leadCookie)).status).toBe(200) // A again, retires B
    expect((await withdrawSet(a, s.leadCookie, 'A is wrong after all')).body).toMatchObject({ restoredSetId: b })
    // Withdrawing B must not bring back A's first (retired, never itself withdrawn) release row.
    expect((await withdrawSet(b, s.leadCookie, 'B is wrong too')).body).toMatchObject({ restoredSetId: null })
    expect((await getSetView(a, s.cookie)).body.set.status).toBe('withdrawn')
  })

  it('two leads releasing the same set at once: one wins, the other is told, one package is kept', async () => {
    const s = await setSetup()
    await approve(s, s.driveRevisionId)
    await approve(s, s.regenRevisionId)
    const id = await makeSet(s)
    await fileCoveringReports(id, s.driverCookie)
    const other = await sessionCookie(await makeUser('lead_engineer'))
    const [x, y] = await Promise.all([releaseSet(id, s.leadCookie), releaseSet(id, other)])
    expect([x.status, y.status].sort()).toEqual([200, 409])
    expect((await getSetView(id, s.cookie)).body.set.releases).toHaveLength(1)
  })

  it('a release keeps its evidence: the driver can no longer edit it, a lead cannot move it', async () => {
    const s = await setSetup()
    await approve(s, s.driveRevisionId)
    await approve(s, s.regenRevisionId)
    const id = await makeSet(s)
    const [reportId] = await fileCoveringReports(id, s.driverCookie)
    expect((await releaseSet(id, s.leadCookie)).status).toBe(200)
    const edit = await call(reportRoute.PUT, { method: 'PUT', cookie: s.driverCookie, params: { id: String(reportId) }, body: setReportBody(id, { comments: 'changed after the release' }) })
    expect(edit.status).toBe(409)
    const regen2 = await saveRevision(s, s.regenMapId, 1, { ...GENTLE_REGEN, values: [[0, 25, 25], [0, 60, 60], [0, 100, 100]] })
    const target = await makeSet(s, { regenRevisionId: regen2 })
    const moved = await call(reportSetRoute.POST, { method: 'POST', cookie: s.leadCookie, params: { id: String(reportId) }, body: { setId: target, reason: 'wrong set' } })
    expect(moved.status).toBe(409)
    expect(moved.body.error.message).toMatch(/released with its reports as evidence/)
    // The released set's gate reads as met: the release's acknowledgements count.
    expect(gateMet(await getSetView(id, s.leadCookie)).traction).toBe(true)
  })

  it('refuses an exception acknowledged twice, naming the repeat; the program says its latest version number', async () => {
    const s = await setSetup({ drive: STRONG })
    await approve(s, s.driveRevisionId)
    await approve(s, s.regenRevisionId)
    const id = await makeSet(s)
    await fileCoveringReports(id, s.driverCookie)
    const keys: string[] = (await getSetView(id, s.leadCookie)).body.gate.exceptions.map((e: { key: string }) => e.key)
    const twice = await releaseSet(id, s.leadCookie, [...keys.map((key) => ({ key, reason: 'r' })), { key: keys[0], reason: 'other' }])
    expect(twice.status).toBe(400)
    expect(twice.body.error.message).toMatch(new RegExp(`acknowledgements\\.${keys.length}\\.key: .*acknowledged twice`))

    const db = await getDb()
    const [program] = await db.select().from(vehiclePrograms).where(eq(vehiclePrograms.id, s.programId))
    const put = await call(programRoute.PUT, { method: 'PUT', cookie: s.cookie, params: { id: String(s.programId) }, body: { name: program.name, description: '', params: { ...program.params, emptyMassKg: program.params.emptyMassKg + 100 }, reason: 'weighed' } })
    expect(put.body.program.paramVersion).toBe(2)
    expect((await call(programRoute.GET, { cookie: s.cookie, params: { id: String(s.programId) } })).body.program.paramVersion).toBe(2)
  })
})
