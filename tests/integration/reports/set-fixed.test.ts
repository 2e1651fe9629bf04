// A report names the set the truck ran, fixed when it is filed: a driver's edit cannot move it to
// another set (which would move a safety concern off the set that caused it), only a lead's audited
// correction can. Flags name the map of the set they are on.
import { describe, expect, it } from 'vitest'
import * as reportsRoute from '@/app/api/reports/route'
import * as reportRoute from '@/app/api/reports/[id]/route'
import * as reportSetRoute from '@/app/api/reports/[id]/set/route'
import * as programRoute from '@/app/api/programs/[id]/route'
import { listAudit } from '@/db/queries/audit'
import { getProgram } from '@/db/queries/programs'
import { listReports } from '@/db/queries/reports'
import { openSafetyConcerns } from '@/db/queries/sets'
import { call, makeUser, sessionCookie } from '@/tests/support/api'
import { tractor } from '@/tests/support/fixtures'
import { driveOnlySet, filedReport, nextDriveSet, programWithSet, reportBody } from '@/tests/support/report-fixtures'

const SAFETY = [{ map: 'drive', pedalPct: 50, speedKmh: 0, what: 'tandem spun into the kerb on launch', severity: 4 }]
const SET_FIXED = "A report's set cannot change by an edit; ask a lead to correct it or file a new report"

describe('the set of a report', () => {
  it('a driver’s edit that names another set is refused, and the report still names its first set', async () => {
    const r = await filedReport({ flags: SAFETY })
    const other = await nextDriveSet(r)
    const moved = await call(reportRoute.PUT, { method: 'PUT', cookie: r.driverCookie, params: { id: String(r.reportId) }, body: reportBody(other.setId, { flags: SAFETY }) })
    expect(moved.status).toBe(409)
    expect(moved.body.error.message).toBe(SET_FIXED)
    const now = await call(reportRoute.GET, { cookie: r.driverCookie, params: { id: String(r.reportId) } })
    expect(now.body.report).toMatchObject({ setId: r.setId, setNumber: 1, driveRevisionId: r.driveRevisionId, safety: 'open' })
    // The concern stays on the revision that caused it, so that revision's gate still sees it.
    expect((await openSafetyConcerns([r.driveRevisionId])).map((c) => c.reportId)).toEqual([r.reportId])
    expect(await openSafetyConcerns([other.driveRevisionId])).toEqual([])
    // An edit on the same set goes through.
    const same = await call(reportRoute.PUT, { method: 'PUT', cookie: r.driverCookie, params: { id: String(r.reportId) }, body: reportBody(r.setId, { flags: SAFETY, comments: 'corrected' }) })
    expect(same.status).toBe(200)
    expect(same.body.report).toMatchObject({ setId: r.setId, comments: 'corrected' })
  })

  it('a lead corrects the set with a reason, within the program; the correction is audited', async () => {
    const r = await filedReport({ flags: SAFETY })
    const other = await nextDriveSet(r)
    const lead = await makeUser('lead_engineer')
    const leadCookie = await sessionCookie(lead)
    const correct = (cookie: string, body: unknown) => call(reportSetRoute.POST, { method: 'POST', cookie, params: { id: String(r.reportId) }, body })
    const reason = 'Unit T-07 was flashed with set 2; checked at the depot'
    expect((await correct(r.driverCookie, { setId: other.setId, reason })).status).toBe(403)
    const noReason = await correct(leadCookie, { setId: other.setId, reason: ' ' })
    expect(noReason.status).toBe(400)
    expect(noReason.body.error.message).toMatch(/^reason: /)
    const elsewhere = await programWithSet()
    const foreign = await correct(leadCookie, { setId: elsewhere.setId, reason })
    expect(foreign.status).toBe(400)
    expect(foreign.body.error.message).toMatch(/^setId: set \d+ belongs to another vehicle program/)

    const ok = await correct(leadCookie, { setId: other.setId, reason })
    expect(ok.status).toBe(200)
    expect(ok.body.report).toMatchObject({ setId: other.setId, setNumber: 2, driveRevisionId: other.driveRevisionId })
    const audit = await listAudit({ entityType: 'drive_report', entityId: r.reportId, action: 'report.set-corrected' })
    expect(audit).toHaveLength(1)
    expect(audit[0]).toMatchObject({ actorId: lead.id, details: { fromSetId: r.setId, toSetId: other.setId, reason } })
    expect((await listReports({ setId: other.setId })).map((x) => x.id)).toEqual([r.reportId])
    expect(await listReports({ setId: r.setId })).toEqual([])
    // Correcting to the set it already names changes nothing.
    expect((await correct(leadCookie, { setId: other.setId, reason })).status).toBe(409)
  })

  it('a flag on a map the set does not hold is refused with a message naming it', async () => {
    const ctx = await programWithSet()
    const legacy = await driveOnlySet(ctx)
    const driver = await sessionCookie(await makeUser('test_driver'))
    const onRegen = [{ map: 'regen', pedalPct: 0, speedKmh: 40, what: 'lift-off regen too strong', severity: 3 }]
    const res = await call(reportsRoute.POST, { method: 'POST', cookie: driver, body: reportBody(legacy.setId, { flags: onRegen }) })
    expect(res.status).toBe(400)
    expect(res.body.error.message).toBe(`flags.0.map: set ${legacy.setNumber} holds no regen map; flag the point on its drive map`)
    const noMap = await call(reportsRoute.POST, { method: 'POST', cookie: driver, body: reportBody(ctx.setId, { flags: [{ pedalPct: 0, speedKmh: 40, what: 'x', severity: 2 }] }) })
    expect(noMap.status).toBe(400)
    expect(noMap.body.error.message).toMatch(/^flags\.0\.map: /)
    // The full set holds both maps; the drive-only set takes drive flags.
    expect((await call(reportsRoute.POST, { method: 'POST', cookie: driver, body: reportBody(ctx.setId, { flags: onRegen }) })).status).toBe(201)
    expect((await call(reportsRoute.POST, { method: 'POST', cookie: driver, body: reportBody(legacy.setId) })).status).toBe(201)
  })

  it('the load case is judged by the set’s parameter version, not by the program’s latest parameters', async () => {
    const ctx = await programWithSet()
    const program = (await getProgram(ctx.programId))!
    // The program gains a semitrailer (parameter version 2); set 1 keeps version 1, which has none.
    const upd = await call(programRoute.PUT, { method: 'PUT', cookie: ctx.cookie, params: { id: String(ctx.programId) }, body: { name: program.name, description: '', params: tractor, releaseConditions: program.releaseConditions, reason: 'Semitrailer added' } })
    expect(upd.status).toBe(200)
    const driver = await sessionCookie(await makeUser('test_driver'))
    const res = await call(reportsRoute.POST, { method: 'POST', cookie: driver, body: reportBody(ctx.setId, { loadCase: 'trailer-laden', trailer: true }) })
    expect(res.status).toBe(400)
    expect(res.body.error.message).toMatch(/^loadCase: set 1 \(parameter version 1\) has the load cases empty, laden$/)
  })
})
