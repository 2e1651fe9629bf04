import { describe, expect, it } from 'vitest'
import * as reportRoute from '@/app/api/reports/[id]/route'
import * as readRoute from '@/app/api/reports/[id]/read/route'
import * as commentsRoute from '@/app/api/reports/[id]/comments/route'
import { call, makeUser, sessionCookie } from '@/tests/support/api'
import { filedReport, reportBody } from '@/tests/support/report-fixtures'
import { capturedMail } from '@/tests/support/review-fixtures'

describe('after filing', () => {
  it('a safety concern e-mails the lead engineers and the engineers of the flagged map, naming the set, with a link to the report', async () => {
    const lead = await makeUser('lead_engineer')
    const { reportId, engineer } = await filedReport({ flags: [{ map: 'regen', pedalPct: 0, speedKmh: 50, what: 'drive axle locked on lift-off', severity: 4 }] })
    // The capture is shared by test files running at once, whose databases number reports from 1 too: this engineer's mail only.
    const mail = (await capturedMail()).filter((m) => m.to.includes(engineer.email))
    expect(mail).toHaveLength(1)
    expect(mail[0].raw).toMatch(new RegExp(`/reports/${reportId}(?!\\d)`))
    expect(mail[0].to).toEqual(expect.arrayContaining([lead.email, engineer.email]))
    expect(mail[0].raw).toMatch(/drive axle locked on lift-off/)
    expect(mail[0].raw).toMatch(/set_1_=28Lift-off_r1=29/) // the subject, quoted-printable: "set 1 (Lift-off r1)"
  })

  it('a driver edits until a lead has read the report; engineers comment, and the filing driver answers after the read', async () => {
    const { reportId, setId, driverCookie, cookie: engineerCookie } = await filedReport()
    const lead = await sessionCookie(await makeUser('lead_engineer'))
    expect((await call(readRoute.POST, { method: 'POST', cookie: driverCookie, params: { id: String(reportId) } })).status).toBe(403)
    expect((await call(readRoute.POST, { method: 'POST', cookie: lead, params: { id: String(reportId) } })).status).toBe(200)
    const late = await call(reportRoute.PUT, { method: 'PUT', cookie: driverCookie, params: { id: String(reportId) }, body: reportBody(setId, { comments: 'late edit' }) })
    expect(late.status).toBe(409)
    expect((await call(commentsRoute.POST, { method: 'POST', cookie: engineerCookie, params: { id: String(reportId) }, body: { body: 'Seen; capped launch in r3' } })).status).toBe(201)
    const answer = await call(commentsRoute.POST, { method: 'POST', cookie: driverCookie, params: { id: String(reportId) }, body: { body: 'It spun on wet cobbles at the depot gate' } })
    expect(answer.status).toBe(201)
    // Another driver is not part of this report's conversation.
    const stranger = await sessionCookie(await makeUser('test_driver'))
    const refused = await call(commentsRoute.POST, { method: 'POST', cookie: stranger, params: { id: String(reportId) }, body: { body: 'me too' } })
    expect(refused.status).toBe(403)
    expect(refused.body.error.message).toBe('Only the driver who filed this report may comment on it')
    const list = await call(commentsRoute.GET, { cookie: driverCookie, params: { id: String(reportId) } })
    expect(list.body.comments.map((c: { body: string }) => c.body)).toEqual(['Seen; capped launch in r3', 'It spun on wet cobbles at the depot gate'])
    // The answer leaves the report as the lead read it: still read, still not editable.
    expect((await call(reportRoute.PUT, { method: 'PUT', cookie: driverCookie, params: { id: String(reportId) }, body: reportBody(setId, { comments: 'later' }) })).status).toBe(409)
  })
})
