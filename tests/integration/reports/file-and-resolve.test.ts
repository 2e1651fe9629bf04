import { describe, expect, it } from 'vitest'
import * as reportsRoute from '@/app/api/reports/route'
import * as reportRoute from '@/app/api/reports/[id]/route'
import * as safetyRoute from '@/app/api/reports/[id]/safety/route'
import { call, makeUser, sessionCookie } from '@/tests/support/api'
import { filedReport, reportBody } from '@/tests/support/report-fixtures'

describe('drive reports', () => {
  it('a test driver files a report against a set; it is listed for the set and for each revision it holds', async () => {
    const { reportId, report, setId, driveRevisionId, regenRevisionId, cookie } = await filedReport()
    expect(report).toMatchObject({ setId, setNumber: 1, paramVersion: 1, driveNumber: 1, regenNumber: 1, surface: 'wet-asphalt', safety: 'none' })
    expect(report.driveChecksum).toMatch(/^[0-9a-f]{64}$/)
    expect(report.regenChecksum).toMatch(/^[0-9a-f]{64}$/)
    for (const q of [`setId=${setId}`, `revisionId=${driveRevisionId}`, `revisionId=${regenRevisionId}`]) {
      const list = await call(reportsRoute.GET, { path: `/api/reports?${q}`, cookie })
      expect(list.body.reports.map((r: { id: number }) => r.id)).toEqual([reportId])
    }
  })

  it('only test drivers file reports; bad fields are refused with the field named', async () => {
    const { setId, cookie: engineerCookie, driverCookie } = await filedReport()
    expect((await call(reportsRoute.POST, { method: 'POST', cookie: engineerCookie, body: reportBody(setId) })).status).toBe(403)
    const bad = await call(reportsRoute.POST, { method: 'POST', cookie: driverCookie, body: reportBody(setId, { ratings: { launch: 9, tipIn: 3, steadyPedal: 4, liftOffRegen: 3, brakeBlending: 4 } }) })
    expect(bad.status).toBe(400)
    expect(bad.body.error.message).toBe('ratings.launch: Launch: choose a rating from 1 to 5')
    const trailer = await call(reportsRoute.POST, { method: 'POST', cookie: driverCookie, body: reportBody(setId, { loadCase: 'trailer-laden', trailer: true }) })
    expect(trailer.status).toBe(400)
    expect(trailer.body.error.message).toBe('loadCase: set 1 (parameter version 1) has the load cases empty, laden')
    const ghost = await call(reportsRoute.POST, { method: 'POST', cookie: driverCookie, body: reportBody(999_999) })
    expect(ghost.status).toBe(400)
    expect(ghost.body.error.message).toBe('setId: set 999999 does not exist')
    const noSet = await call(reportsRoute.POST, { method: 'POST', cookie: driverCookie, body: { ...reportBody(setId), setId: undefined } })
    expect(noSet.body.error.message).toBe('setId: Choose the set the vehicle was flashed with')
  })

  it('a driver may edit only their own report', async () => {
    const { reportId, setId, driverCookie } = await filedReport()
    const other = await sessionCookie(await makeUser('test_driver'))
    const denied = await call(reportRoute.PUT, { method: 'PUT', cookie: other, params: { id: String(reportId) }, body: reportBody(setId, { comments: 'not mine' }) })
    expect(denied.status).toBe(403)
    const ok = await call(reportRoute.PUT, { method: 'PUT', cookie: driverCookie, params: { id: String(reportId) }, body: reportBody(setId, { comments: 'corrected' }) })
    expect(ok.status).toBe(200)
    expect(ok.body.report.comments).toBe('corrected')
  })

  it('a severity-4 flag opens a safety concern that editing cannot close and only a lead resolves', async () => {
    const safety = [{ map: 'regen', pedalPct: 0, speedKmh: 40, what: 'drive axle locked on lift-off', severity: 4 }]
    const { reportId, setId, driverCookie } = await filedReport({ flags: safety })
    const get = async () => (await call(reportRoute.GET, { cookie: driverCookie, params: { id: String(reportId) } })).body.report
    expect((await get()).safety).toBe('open')
    await call(reportRoute.PUT, { method: 'PUT', cookie: driverCookie, params: { id: String(reportId) }, body: reportBody(setId, { flags: [] }) })
    expect((await get()).safety).toBe('open')
    expect((await call(safetyRoute.POST, { method: 'POST', cookie: driverCookie, params: { id: String(reportId) }, body: { comment: 'fine' } })).status).toBe(403)
    const lead = await sessionCookie(await makeUser('lead_engineer'))
    expect((await call(safetyRoute.POST, { method: 'POST', cookie: lead, params: { id: String(reportId) }, body: { comment: ' ' } })).status).toBe(400)
    const resolved = await call(safetyRoute.POST, { method: 'POST', cookie: lead, params: { id: String(reportId) }, body: { comment: 'Lift-off regen reduced in r2' } })
    expect(resolved.status).toBe(200)
    expect(resolved.body.report).toMatchObject({ safety: 'resolved', safetyResolution: 'Lift-off regen reduced in r2' })
    expect((await call(safetyRoute.POST, { method: 'POST', cookie: lead, params: { id: String(reportId) }, body: { comment: 'again' } })).status).toBe(409)
  })
})
