import { describe, expect, it } from 'vitest'
import * as logsRoute from '@/app/api/reports/[id]/logs/route'
import * as fileRoute from '@/app/api/reports/[id]/logs/[logId]/file/route'
import { makeUser, sessionCookie } from '@/tests/support/api'
import { filedReport } from '@/tests/support/report-fixtures'

async function upload(reportId: number, cookie: string, body: BodyInit, query = 'name=log.csv', headers: Record<string, string> = {}) {
  const req = new Request(`http://127.0.0.1/api/reports/${reportId}/logs?${query}`, { method: 'POST', headers: { cookie, 'content-type': 'text/csv', ...headers }, body, duplex: 'half' } as RequestInit)
  const res = await logsRoute.POST(req, { params: Promise.resolve({ id: String(reportId) }) })
  return { status: res.status, body: await res.json() }
}

const CSV = 'time_s,road_speed_kmh,wheel_speed_kmh,accel_pedal_pct\n0,0,0,0\n0.02,0.1,0.1,5\n'

describe('log upload', () => {
  it('stores a CSV under a key the server chooses, and only signed-in users can download it', async () => {
    const { reportId, driverCookie } = await filedReport()
    const res = await upload(reportId, driverCookie, CSV, 'name=../../etc/passwd.csv')
    expect(res.status).toBe(201)
    expect(res.body.log.objectKey).toMatch(new RegExp(`^logs/report-${reportId}/[0-9a-f-]{36}\\.csv$`))
    expect(res.body.log.sizeBytes).toBe(Buffer.byteLength(CSV))
    const dl = (cookie?: string) =>
      fileRoute.GET(new Request(`http://127.0.0.1/x`, { headers: cookie ? { cookie } : {} }), { params: Promise.resolve({ id: String(reportId), logId: String(res.body.log.id) }) })
    expect((await dl()).status).toBe(401)
    const ok = await dl(await sessionCookie(await makeUser('calibration_engineer')))
    expect(ok.status).toBe(200)
    expect(await ok.text()).toBe(CSV)
  })

  it('refuses an oversize file with 413 before reading it, when its length is declared', async () => {
    const { reportId, driverCookie } = await filedReport()
    const res = await upload(reportId, driverCookie, CSV, 'name=big.csv', { 'content-length': String(6 * 1024 * 1024) })
    expect(res.status).toBe(413)
  })

  it('refuses a file that grows past the limit while streaming with 413, and keeps nothing', async () => {
    const { reportId, driverCookie } = await filedReport()
    // A stream with no declared length, larger than the limit: the guard stops it mid-way.
    const big = new ReadableStream<Uint8Array>({
      start(c) {
        const line = new TextEncoder().encode('1,2,3,4\n'.repeat(1024))
        c.enqueue(new TextEncoder().encode('time_s,road_speed_kmh,wheel_speed_kmh,accel_pedal_pct\n'))
        for (let i = 0; i < 800; i++) c.enqueue(line) // about 6.5 MB, over the 5 MB test limit
        c.close()
      },
    })
    const res = await upload(reportId, driverCookie, big, 'name=big.csv')
    expect(res.status).toBe(413)
    const list = await logsRoute.GET(new Request('http://127.0.0.1/x', { headers: { cookie: driverCookie } }), { params: Promise.resolve({ id: String(reportId) }) })
    expect((await list.json()).logs).toEqual([])
  })

  it('refuses a non-CSV file (binary, no delimiter, wrong extension) with 415', async () => {
    const { reportId, driverCookie } = await filedReport()
    expect((await upload(reportId, driverCookie, new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0, 0, 1]), 'name=x.csv')).status).toBe(415)
    expect((await upload(reportId, driverCookie, 'just some words\nand more', 'name=x.csv')).status).toBe(415)
    expect((await upload(reportId, driverCookie, CSV, 'name=x.png')).status).toBe(415)
  })

  it('lets only the filing driver attach logs', async () => {
    const { reportId, cookie: engineerCookie } = await filedReport()
    expect((await upload(reportId, engineerCookie, CSV)).status).toBe(403)
    expect((await upload(reportId, await sessionCookie(await makeUser('test_driver')), CSV)).status).toBe(403)
  })
})
