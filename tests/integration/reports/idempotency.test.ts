// A driver on a bad network sends a report, the answer never arrives, the reload restores the draft
// and the driver files it again: with the draft's id as Idempotency-Key nothing is created twice.
import { randomUUID } from 'node:crypto'
import { describe, expect, it } from 'vitest'
import * as reportsRoute from '@/app/api/reports/route'
import * as reportCommentsRoute from '@/app/api/reports/[id]/comments/route'
import * as revisionsRoute from '@/app/api/maps/[id]/revisions/route'
import * as importRoute from '@/app/api/maps/[id]/import/route'
import * as reviewCommentsRoute from '@/app/api/revisions/[revisionId]/comments/route'
import { listReports } from '@/db/queries/reports'
import { listOutbox } from '@/db/queries/mail'
import { getRevision, listRevisions } from '@/db/queries/revisions'
import { listReviewComments } from '@/db/queries/review'
import { listReportComments } from '@/db/queries/reports'
import { makeUser, sessionCookie } from '@/tests/support/api'
import { programAndMap, withCell, SMALL_DRIVE } from '@/tests/support/fixtures'
import { filedReport, reportBody } from '@/tests/support/report-fixtures'
import { toCsv } from '@/maps'

type Handler<P> = (req: Request, ctx: { params: Promise<P> }) => Promise<Response>

/** POST a JSON body as the browser's api() client does, with an optional Idempotency-Key. */
async function post<P>(handler: Handler<P>, cookie: string, params: P, body: unknown, key?: string) {
  const headers: Record<string, string> = { cookie, 'content-type': 'application/json' }
  if (key !== undefined) headers['idempotency-key'] = key
  const res = await handler(new Request('http://127.0.0.1:3000/api/x', { method: 'POST', headers, body: JSON.stringify(body) }), { params: Promise.resolve(params) })
  return { status: res.status, replayed: res.headers.get('idempotency-replayed'), body: await res.json() }
}

const SAFETY = { flags: [{ map: 'regen', pedalPct: 0, speedKmh: 40, what: 'drive axle locked on lift-off', severity: 4 }] }
const safetyMailsFor = async (reportId: number) => (await listOutbox(1000)).filter((m) => m.text.includes(`/reports/${reportId}`)).length

describe('filing the same draft twice', () => {
  it('creates one report and one safety e-mail; the repeat answers 201 with the first report', async () => {
    const { setId } = await filedReport()
    const driver = await makeUser('test_driver')
    const cookie = await sessionCookie(driver)
    const key = randomUUID()
    const first = await post(reportsRoute.POST, cookie, {}, reportBody(setId, SAFETY), key)
    const again = await post(reportsRoute.POST, cookie, {}, reportBody(setId, SAFETY), key)
    expect(first.status).toBe(201)
    expect(again.status).toBe(201)
    expect(again.replayed).toBe('true')
    expect(again.body).toEqual(first.body)
    expect(await listReports({ driverId: driver.id })).toHaveLength(1)
    expect(await safetyMailsFor(first.body.report.id)).toBe(1)
  })

  it('lets only one of several concurrent repeats create', async () => {
    const { setId } = await filedReport()
    const driver = await makeUser('test_driver')
    const cookie = await sessionCookie(driver)
    const key = randomUUID()
    const all = await Promise.all([1, 2, 3, 4].map(() => post(reportsRoute.POST, cookie, {}, reportBody(setId, SAFETY), key)))
    expect(all.map((r) => r.status)).toEqual([201, 201, 201, 201])
    expect(new Set(all.map((r) => r.body.report.id)).size).toBe(1)
    expect(all.filter((r) => r.replayed !== 'true')).toHaveLength(1)
    expect(await listReports({ driverId: driver.id })).toHaveLength(1)
    expect(await safetyMailsFor(all[0].body.report.id)).toBe(1)
  })

  it('refuses the same key with other content (422) and creates nothing; keys are per user', async () => {
    const { setId } = await filedReport()
    const driver = await makeUser('test_driver')
    const cookie = await sessionCookie(driver)
    const key = randomUUID()
    const first = await post(reportsRoute.POST, cookie, {}, reportBody(setId), key)
    const changed = await post(reportsRoute.POST, cookie, {}, reportBody(setId, { comments: 'changed my mind' }), key)
    expect(changed.status).toBe(422)
    expect(changed.body.error.code).toBe('idempotency_key_reused')
    expect(changed.body.error.details.resultId).toBe(first.body.report.id)
    expect(await listReports({ driverId: driver.id })).toHaveLength(1)
    // Another driver who happens to send the same key files their own report.
    const other = await makeUser('test_driver')
    const theirs = await post(reportsRoute.POST, await sessionCookie(other), {}, reportBody(setId), key)
    expect(theirs.status).toBe(201)
    expect(theirs.body.report.id).not.toBe(first.body.report.id)
  })

  it('refuses a malformed key with a 400 that names the header', async () => {
    const { setId, driverCookie } = await filedReport()
    const res = await post(reportsRoute.POST, driverCookie, {}, reportBody(setId), 'no spaces allowed here')
    expect(res.status).toBe(400)
    expect(res.body.error.message).toMatch(/Idempotency-Key/)
  })
})

describe('saving the same revision twice', () => {
  it('answers the repeat with the revision it made instead of a stale-parent conflict', async () => {
    const { mapId, cookie } = await programAndMap()
    const body = { parentNumber: 1, message: 'Softer launch', table: withCell(SMALL_DRIVE, 1, 1, 55) }
    const key = randomUUID()
    const first = await post(revisionsRoute.POST, cookie, { id: String(mapId) }, body, key)
    const again = await post(revisionsRoute.POST, cookie, { id: String(mapId) }, body, key)
    expect(first.status).toBe(201)
    expect(again.status).toBe(201)
    expect(again.body).toEqual(first.body)
    expect((await listRevisions(mapId)).map((r) => r.number)).toEqual([2, 1])
  })

  it('answers a repeated CSV import with the revision it made', async () => {
    const { mapId, cookie } = await programAndMap()
    const exported = toCsv(withCell(SMALL_DRIVE, 2, 2, 70))
    const body = { parentNumber: 1, message: 'Imported from the bench', csv: exported }
    const key = randomUUID()
    const first = await post(importRoute.POST, cookie, { id: String(mapId) }, body, key)
    const again = await post(importRoute.POST, cookie, { id: String(mapId) }, body, key)
    expect([first.status, again.status]).toEqual([201, 201])
    expect(again.body).toEqual(first.body)
    expect((await listRevisions(mapId)).map((r) => r.number)).toEqual([2, 1])
  })

  it('frees the key when the first send failed, so the corrected save goes through', async () => {
    const { mapId, cookie } = await programAndMap()
    const key = randomUUID()
    const stale = await post(revisionsRoute.POST, cookie, { id: String(mapId) }, { parentNumber: 0, message: 'x', table: SMALL_DRIVE }, key)
    expect(stale.status).toBe(409)
    const ok = await post(revisionsRoute.POST, cookie, { id: String(mapId) }, { parentNumber: 1, message: 'x', table: SMALL_DRIVE }, key)
    expect(ok.status).toBe(201)
    expect(ok.replayed).toBeNull()
  })
})

describe('sending the same comment twice', () => {
  it('adds one comment to a report', async () => {
    const { reportId, cookie } = await filedReport()
    const key = randomUUID()
    const a = await post(reportCommentsRoute.POST, cookie, { id: String(reportId) }, { body: 'Capped launch in r3' }, key)
    const b = await post(reportCommentsRoute.POST, cookie, { id: String(reportId) }, { body: 'Capped launch in r3' }, key)
    expect([a.status, b.status]).toEqual([201, 201])
    expect(b.body).toEqual(a.body)
    expect(await listReportComments(reportId)).toHaveLength(1)
  })

  it('adds one review comment to a revision', async () => {
    const { mapId, cookie } = await programAndMap()
    const rev = await getRevision(mapId, 1)
    const key = randomUUID()
    const body = { body: 'Too steep at 60 %', row: 1, col: 1 }
    const a = await post(reviewCommentsRoute.POST, cookie, { revisionId: String(rev!.id) }, body, key)
    const b = await post(reviewCommentsRoute.POST, cookie, { revisionId: String(rev!.id) }, body, key)
    expect([a.status, b.status]).toEqual([201, 201])
    expect(b.body).toEqual(a.body)
    expect(await listReviewComments({ revisionId: rev!.id })).toHaveLength(1)
  })
})
