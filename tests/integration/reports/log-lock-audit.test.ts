// Drive logs belong to the report as the lead read it: none is added or removed after the read, and
// every upload, re-analysis and removal leaves an audit row. Analyses run against the report's set.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import * as logsRoute from '@/app/api/reports/[id]/logs/route'
import * as logRoute from '@/app/api/reports/[id]/logs/[logId]/route'
import * as readRoute from '@/app/api/reports/[id]/read/route'
import * as reportSetRoute from '@/app/api/reports/[id]/set/route'
import { startLogWorker, stopLogWorker } from '@/app/_lib/reports/log-worker'
import { objectSize } from '@/app/_lib/storage/object-store'
import { listAudit } from '@/db/queries/audit'
import { getLog, listLogs } from '@/db/queries/logs'
import { call, makeUser, sessionCookie } from '@/tests/support/api'
import { generateLog } from '@/tests/support/log-generator'
import { filedReport, nextDriveSet } from '@/tests/support/report-fixtures'

async function upload(reportId: number, cookie: string, body: BodyInit, name = 'log.csv') {
  const req = new Request(`http://127.0.0.1/api/reports/${reportId}/logs?name=${name}`, { method: 'POST', headers: { cookie, 'content-type': 'text/csv' }, body, duplex: 'half' } as RequestInit)
  const res = await logsRoute.POST(req, { params: Promise.resolve({ id: String(reportId) }) })
  return { status: res.status, body: await res.json() }
}

// This process's log worker, as a server runs one: it analyses what the routes upload or ask for again.
beforeAll(() => void startLogWorker({ pollMs: 100 }))
afterAll(() => stopLogWorker({ graceMs: 0 }))

/** Wait for the worker's analysis of a log to finish (done or failed). */
async function settled(logId: number, after?: Date) {
  for (let i = 0; i < 600; i++) {
    const log = await getLog(logId)
    if (log && (log.status === 'done' || log.status === 'failed') && (!after || (log.analysedAt && log.analysedAt > after))) return log
    await new Promise((r) => setTimeout(r, 50))
  }
  throw new Error(`log ${logId} did not settle`)
}

const CSV = generateLog({ seed: 3, durationS: 60, rateHz: 20 }).csv
/** Five minutes: a wheel spin at launch and two lock-ups at stops. */
const LONG_CSV = generateLog({ seed: 3, durationS: 300, rateHz: 20 }).csv
const logAudit = async (reportId: number) => (await listAudit({ entityType: 'drive_report', entityId: reportId, action: 'report.log' })).map((a) => a.action).reverse()

describe('drive logs of a report', () => {
  it('a log upload after a lead has read the report is refused, and nothing is stored', async () => {
    const r = await filedReport()
    const lead = await sessionCookie(await makeUser('lead_engineer'))
    expect((await call(readRoute.POST, { method: 'POST', cookie: lead, params: { id: String(r.reportId) } })).status).toBe(200)
    const late = await upload(r.reportId, r.driverCookie, CSV)
    expect(late.status).toBe(409)
    expect(late.body.error.message).toBe('A lead engineer has read this report, so no log can be added to it any more. File a new report for the new drive, or ask a lead.')
    expect(await listLogs(r.reportId)).toEqual([])
    expect(await logAudit(r.reportId)).toEqual([])
  })

  it('upload, re-analysis and removal each write an audit row; removal ends with the read', async () => {
    const r = await filedReport()
    const up = await upload(r.reportId, r.driverCookie, CSV, 'first.csv')
    expect(up.status).toBe(201)
    const first = await settled(up.body.log.id)
    expect(first.status).toBe('done')
    const again = await call(logRoute.POST, { method: 'POST', cookie: r.driverCookie, params: { id: String(r.reportId), logId: String(first.id) } })
    expect(again.status).toBe(202)
    await settled(first.id, first.analysedAt!)
    const removed = await call(logRoute.DELETE, { method: 'DELETE', cookie: r.driverCookie, params: { id: String(r.reportId), logId: String(first.id) } })
    expect(removed.status).toBe(200)
    expect(await listLogs(r.reportId)).toEqual([])
    expect(await objectSize(up.body.log.objectKey)).toBeNull()
    expect(await logAudit(r.reportId)).toEqual(['report.log-upload', 'report.log-reanalyse', 'report.log-remove'])
    const [uploadRow] = await listAudit({ entityType: 'drive_report', entityId: r.reportId, action: 'report.log-upload' })
    expect(uploadRow).toMatchObject({ actorId: r.driver.id, details: { logId: first.id, fileName: 'first.csv', sizeBytes: Buffer.byteLength(CSV) } })

    // After the lead's read the driver can no longer remove a log either.
    const kept = await upload(r.reportId, r.driverCookie, CSV, 'kept.csv')
    await settled(kept.body.log.id)
    const lead = await sessionCookie(await makeUser('lead_engineer'))
    await call(readRoute.POST, { method: 'POST', cookie: lead, params: { id: String(r.reportId) } })
    const late = await call(logRoute.DELETE, { method: 'DELETE', cookie: r.driverCookie, params: { id: String(r.reportId), logId: String(kept.body.log.id) } })
    expect(late.status).toBe(409)
    expect((await listLogs(r.reportId)).map((l) => l.fileName)).toEqual(['kept.csv'])
  })

  it('is analysed against the set: occupancy on its drive map, spin predicted on the drive map and lock-up on the regen map', async () => {
    const r = await filedReport()
    const up = await upload(r.reportId, r.driverCookie, LONG_CSV)
    const log = await settled(up.body.log.id)
    expect(log.status).toBe('done')
    const analysis = log.analysis as unknown as { occupancy: { kind: string; rowAxis: number[] }; basis: Record<string, unknown> }
    expect(analysis.occupancy).toMatchObject({ kind: 'drive', rowAxis: [0, 50, 100] })
    expect(analysis.basis).toMatchObject({ setId: r.setId, setNumber: 1, paramVersionId: r.paramVersionId, occupancyRevisionId: r.driveRevisionId })
    const got = await call(logRoute.GET, { cookie: r.driverCookie, params: { id: String(r.reportId), logId: String(log.id) } })
    const kinds = new Set(got.body.predictions.map((p: { kind: string; map: string }) => `${p.kind}:${p.map}`))
    expect(kinds).toEqual(new Set(['spin:drive', 'lock:regen']))
  })

  it('a lead’s set correction analyses the done logs again against the new set, audited', async () => {
    const r = await filedReport()
    const up = await upload(r.reportId, r.driverCookie, CSV)
    const before = await settled(up.body.log.id)
    const other = await nextDriveSet(r)
    const lead = await sessionCookie(await makeUser('lead_engineer'))
    const ok = await call(reportSetRoute.POST, { method: 'POST', cookie: lead, params: { id: String(r.reportId) }, body: { setId: other.setId, reason: 'Flashed with set 2' } })
    expect(ok.status).toBe(200)
    const after = await settled(before.id, before.analysedAt!)
    expect((after.analysis as unknown as { basis: { setId: number } }).basis.setId).toBe(other.setId)
    expect(await logAudit(r.reportId)).toEqual(['report.log-upload', 'report.log-reanalyse'])
  })
})
