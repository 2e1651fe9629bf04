// Fuzzed bodies against the drive-report routes: filing and correcting (the filing driver),
// resolving a safety concern (a lead), and engineers' comments.
import { describe, it } from 'vitest'
import * as reportsRoute from '@/app/api/reports/route'
import * as reportRoute from '@/app/api/reports/[id]/route'
import * as safetyRoute from '@/app/api/reports/[id]/safety/route'
import * as reportCommentsRoute from '@/app/api/reports/[id]/comments/route'
import { reportInputSchema, resolveSafetySchema } from '@/app/_schemas/report'
import { makeUser, sessionCookie } from '@/tests/support/api'
import { filedReport, reportBody } from '@/tests/support/report-fixtures'
import { fuzzRoute } from './harness'

describe('fuzz: drive reports', () => {
  it('POST /api/reports, PUT /api/reports/:id (the filing driver)', async () => {
    const r = await filedReport()
    const valid = reportBody(r.setId)
    await fuzzRoute({ name: 'POST /api/reports', handler: reportsRoute.POST, method: 'POST', cookie: r.driverCookie, schema: reportInputSchema, valid })
    await fuzzRoute({ name: 'PUT /api/reports/:id', handler: reportRoute.PUT, method: 'PUT', cookie: r.driverCookie, params: { id: String(r.reportId) }, schema: reportInputSchema, valid })
  }, 120_000)

  it('POST /api/reports/:id/safety (lead), POST /api/reports/:id/comments (engineer)', async () => {
    const r = await filedReport({ flags: [{ map: 'drive', pedalPct: 80, speedKmh: 5, what: 'trailer pushed the tractor sideways', severity: 4 }] })
    const lead = await sessionCookie(await makeUser('lead_engineer'))
    await fuzzRoute({ name: 'POST /api/reports/:id/safety', handler: safetyRoute.POST, method: 'POST', cookie: lead, params: { id: String(r.reportId) }, schema: resolveSafetySchema, valid: { comment: 'Launch torque lowered in revision 2' } })
    await fuzzRoute({ name: 'POST /api/reports/:id/comments', handler: reportCommentsRoute.POST, method: 'POST', cookie: r.cookie, params: { id: String(r.reportId) }, valid: { body: 'Seen; the spin matches the overlay at 50 %' } })
  }, 120_000)
})
