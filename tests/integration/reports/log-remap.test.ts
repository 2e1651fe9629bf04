// A log whose headers are not our column names fails; the driver who filed the report maps the
// columns again and the stored file is analysed again, without uploading it twice. Audited; ends with the read.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import * as logsRoute from '@/app/api/reports/[id]/logs/route'
import * as logRoute from '@/app/api/reports/[id]/logs/[logId]/route'
import * as readRoute from '@/app/api/reports/[id]/read/route'
import { startLogWorker, stopLogWorker } from '@/app/_lib/reports/log-worker'
import { listAudit } from '@/db/queries/audit'
import { getLog } from '@/db/queries/logs'
import { call, makeUser, sessionCookie } from '@/tests/support/api'
import { generateLog } from '@/tests/support/log-generator'
import { filedReport } from '@/tests/support/report-fixtures'

// The file's own header names, in the generator's column order (invented, as a logger might name them).
const THEIRS = ['t', 'VehSpd', 'WhlSpdL', 'WhlSpdR', 'AccPed', 'BrkPed', 'MotTrq', 'MotSpd', 'BatI', 'BatU']
const CSV = generateLog({ seed: 5, durationS: 60, rateHz: 20, header: THEIRS }).csv
const FULL = { time_s: 't', road_speed_kmh: 'VehSpd', wheel_speed_left_kmh: 'WhlSpdL', wheel_speed_right_kmh: 'WhlSpdR', accel_pedal_pct: 'AccPed', brake_pedal_pct: 'BrkPed' }

beforeAll(() => void startLogWorker({ pollMs: 100 }))
afterAll(() => stopLogWorker({ graceMs: 0 }))

async function upload(reportId: number, cookie: string) {
  const req = new Request(`http://127.0.0.1/api/reports/${reportId}/logs?name=theirs.csv`, { method: 'POST', headers: { cookie, 'content-type': 'text/csv' }, body: CSV })
  const res = await logsRoute.POST(req, { params: Promise.resolve({ id: String(reportId) }) })
  return { status: res.status, body: await res.json() }
}

/** Wait until the worker has finished the log's latest analysis (done or failed). */
async function settled(logId: number) {
  for (let i = 0; i < 600; i++) {
    const log = await getLog(logId)
    if (log && (log.status === 'done' || log.status === 'failed')) return log
    await new Promise((r) => setTimeout(r, 50))
  }
  throw new Error(`log ${logId} did not settle`)
}

const remap = (reportId: number, logId: number, cookie: string, mapping: unknown) =>
  call(logRoute.PATCH, { method: 'PATCH', cookie, params: { id: String(reportId), logId: String(logId) }, body: { mapping } })

describe('retrying a failed log with a corrected column mapping', () => {
  it('fails without a mapping, fails again naming what is still missing, then reads with the full mapping', async () => {
    const r = await filedReport()
    const up = await upload(r.reportId, r.driverCookie)
    expect(up.status).toBe(201)
    const logId: number = up.body.log.id
    const first = await settled(logId)
    expect(first.status).toBe('failed')
    expect(first.errorMessage).toMatch(/missing required columns time_s, road_speed_kmh, accel_pedal_pct/)

    const partial = await remap(r.reportId, logId, r.driverCookie, { time_s: 't' })
    expect(partial.status).toBe(202)
    expect(partial.body.log).toMatchObject({ id: logId, status: 'uploaded', errorMessage: null })
    const second = await settled(logId)
    expect(second.status).toBe('failed')
    expect(second.errorMessage).toMatch(/missing required columns road_speed_kmh, accel_pedal_pct/)
    expect(second.mapping).toEqual({ time_s: 't' })

    expect((await remap(r.reportId, logId, r.driverCookie, FULL)).status).toBe(202)
    const third = await settled(logId)
    expect(third.status).toBe('done')
    expect(third.mapping).toEqual(FULL)
    // 60 s at 20 Hz: every line read once the columns are known.
    expect(third.analysis?.samples).toBeGreaterThanOrEqual(1200)

    const audit = await listAudit({ entityType: 'drive_report', entityId: r.reportId, action: 'report.log-remap' })
    expect(audit.map((a) => a.details).reverse()).toEqual([
      { logId, fileName: 'theirs.csv', from: {}, to: { time_s: 't' } },
      { logId, fileName: 'theirs.csv', from: { time_s: 't' }, to: FULL },
    ])
    expect(audit.every((a) => a.actorId === r.driver.id)).toBe(true)
  })

  it('refuses a mapping naming a column we do not read, or one header twice, naming the field', async () => {
    const r = await filedReport()
    const up = await upload(r.reportId, r.driverCookie)
    const unknown = await remap(r.reportId, up.body.log.id, r.driverCookie, { vehicle_speed: 'VehSpd' })
    expect(unknown.status).toBe(400)
    expect(unknown.body.error.message).toMatch(/mapping\.vehicle_speed: vehicle_speed is not a column Mapwright reads/)
    const twice = await remap(r.reportId, up.body.log.id, r.driverCookie, { road_speed_kmh: 'VehSpd', wheel_speed_kmh: 'VehSpd' })
    expect(twice.status).toBe(400)
    expect(twice.body.error.message).toMatch(/header "VehSpd" is already mapped to road_speed_kmh/)
    expect(await listAudit({ entityType: 'drive_report', entityId: r.reportId, action: 'report.log-remap' })).toEqual([])
  })

  it('only the filing driver may remap, and only until a lead has read the report', async () => {
    const r = await filedReport()
    const up = await upload(r.reportId, r.driverCookie)
    await settled(up.body.log.id)
    const other = await sessionCookie(await makeUser('test_driver'))
    expect((await remap(r.reportId, up.body.log.id, other, FULL)).status).toBe(403)
    const lead = await sessionCookie(await makeUser('lead_engineer'))
    expect((await remap(r.reportId, up.body.log.id, lead, FULL)).status).toBe(403)
    expect((await call(readRoute.POST, { method: 'POST', cookie: lead, params: { id: String(r.reportId) } })).status).toBe(200)
    const late = await remap(r.reportId, up.body.log.id, r.driverCookie, FULL)
    expect(late.status).toBe(409)
    expect(late.body.error.message).toMatch(/can no longer be mapped again/)
    expect((await getLog(up.body.log.id))?.mapping).toEqual({})
  })
})
